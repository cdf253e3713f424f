// Water supply from a hydrant flow test, NFPA 291 (flow testing; calculation of results):
//   P(Q) = Ps − (Ps − Pr)(Q/Qt)^1.85     and     Q_R = Q_F (H_R/H_F)^0.54
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { evaluate, unit } from "mathjs";
import { HydraulicsInputError, calculatorReport, flowAtResidualGpm, flowTestAvailablePsi, supplyMargin } from "../../../lib/hydraulics";

const result = (r: ReturnType<typeof calculatorReport>, label: string) => r.results.find((x) => x.label.startsWith(label))!.value;

// An NFPA 291-style worked example with invented readings (Juniper Flats, hydrant on the test main):
// static 72 psi, residual 58 psi while flowing 1,040 gpm. Expected values are computed here
// independently from the formulas with mathjs.
const juniper = { staticPsi: 72, residualPsi: 58, testFlowGpm: 1040 };

describe("NFPA 291 worked example (invented readings)", () => {
  it("flow available at 20 psi residual: Q_R = 1040 × (52/14)^0.54 ≈ 2,112 gpm (hand arithmetic: 1040 × 2.031)", () => {
    const expected = evaluate("qf * ((ps - 20) / (ps - pr))^0.54", { qf: 1040, ps: 72, pr: 58 }) as number;
    expect(flowAtResidualGpm(juniper, 20)).toBeCloseTo(expected, 9);
    expect(Math.round(expected)).toBe(2112);
  });
  it("pressure available at a home's 30 gpm demand: 72 − 14 × (30/1040)^1.85", () => {
    const expected = evaluate("ps - (ps - pr) * (q / qt)^1.85", { ps: 72, pr: 58, q: 30, qt: 1040 }) as number;
    const r = flowTestAvailablePsi(juniper, 30);
    expect(r.pressurePsi).toBeCloseTo(expected, 9);
    expect(r.beyondSupply).toBe(false);
    expect(r.extrapolated).toBe(false);
  });
  it("the two forms agree: the pressure at Q_R is back near 20 psi (0.54 ≈ 1/1.85)", () => {
    const qR = flowAtResidualGpm(juniper, 20);
    expect(Math.abs(flowTestAvailablePsi(juniper, qR).pressurePsi - 20)).toBeLessThan(0.5);
  });
  it("at zero flow the static pressure is available; at the test flow, the residual", () => {
    expect(flowTestAvailablePsi(juniper, 0).pressurePsi).toBe(72);
    expect(flowTestAvailablePsi(juniper, 1040).pressurePsi).toBeCloseTo(58, 12);
  });
});

describe("a supply that cannot deliver", () => {
  it("returns 0 psi and flags beyond supply instead of a negative pressure", () => {
    const weak = { staticPsi: 60, residualPsi: 20, testFlowGpm: 500 };
    const r = flowTestAvailablePsi(weak, 1000); // formula: 60 − 40 × 2^1.85 < 0
    expect(60 - 40 * 2 ** 1.85).toBeLessThan(0);
    expect(r.pressurePsi).toBe(0);
    expect(r.beyondSupply).toBe(true);
    expect(r.extrapolated).toBe(true);
  });
});

describe("supplyMargin", () => {
  it("passes with the margin when the supply exceeds the demand", () => {
    const m = supplyMargin({ flowGpm: 30, pressurePsi: 48.2 }, juniper);
    const available = flowTestAvailablePsi(juniper, 30).pressurePsi;
    expect(m.result).toBe("pass");
    expect(m.marginPsi).toBeCloseTo(available - 48.2, 9);
    expect(m.shortfallPsi).toBe(0);
  });
  it("is short with the shortfall, never a negative margin", () => {
    const m = supplyMargin({ flowGpm: 30, pressurePsi: 80 }, juniper);
    expect(m.result).toBe("short");
    expect(m.marginPsi).toBe(0);
    expect(m.shortfallPsi).toBeCloseTo(80 - flowTestAvailablePsi(juniper, 30).pressurePsi, 9);
  });
  it("is short when the demand flow is beyond the supply", () => {
    const m = supplyMargin({ flowGpm: 5000, pressurePsi: 10 }, { staticPsi: 50, residualPsi: 20, testFlowGpm: 500 });
    expect(m.result).toBe("short");
    expect(m.availablePsi).toBe(0);
    expect(m.beyondSupply).toBe(true);
  });
  it("accepts a known available pressure instead of a flow test", () => {
    expect(supplyMargin({ flowGpm: 26, pressurePsi: 40 }, { availablePsi: 45 }).marginPsi).toBe(5);
  });
});

describe("properties", () => {
  const test = fc
    .record({
      staticPsi: fc.double({ min: 20, max: 200, noNaN: true }),
      dropFraction: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
      testFlowGpm: fc.double({ min: 50, max: 3000, noNaN: true }),
    })
    .map(({ staticPsi, dropFraction, testFlowGpm }) => ({ staticPsi, residualPsi: staticPsi * (1 - dropFraction), testFlowGpm }));

  it("available pressure never rises with flow and is never negative", () => {
    fc.assert(
      fc.property(test, fc.double({ min: 0, max: 10000, noNaN: true }), fc.double({ min: 0, max: 10000, noNaN: true }), (t, a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const pLo = flowTestAvailablePsi(t, lo).pressurePsi;
        const pHi = flowTestAvailablePsi(t, hi).pressurePsi;
        return pHi <= pLo && pHi >= 0 && Number.isFinite(pHi);
      }),
    );
  });
  it("US and SI agree after conversion (mathjs), through the calculator's SI path", () => {
    fc.assert(
      fc.property(test, fc.double({ min: 0, max: 2000, noNaN: true }), (t, q) => {
        const si = calculatorReport("flow-test", {
          units: "si",
          staticPressure: unit(t.staticPsi, "psi").toNumber("bar"),
          residualPressure: unit(t.residualPsi, "psi").toNumber("bar"),
          testFlow: unit(t.testFlowGpm, "gal/min").toNumber("L/min"),
          demandFlow: unit(q, "gal/min").toNumber("L/min"),
          residualTarget: unit(t.residualPsi / 2, "psi").toNumber("bar"),
        });
        const us = flowTestAvailablePsi(t, q).pressurePsi;
        const bar = result(si, "Pressure available");
        expect(Math.abs(unit(bar, "bar").toNumber("psi") - us)).toBeLessThan(1e-7 * Math.max(1, us));
        const qR = flowAtResidualGpm(t, t.residualPsi / 2);
        const qRSi = result(si, "Flow available");
        expect(Math.abs(unit(qRSi, "L/min").toNumber("gal/min") - qR) / qR).toBeLessThan(1e-9);
      }),
    );
  });
  it("the chart's supply curve starts at static pressure and falls", () => {
    const r = calculatorReport("flow-test", { units: "us", staticPressure: 72, residualPressure: 58, testFlow: 1040, demandFlow: 30, demandPressure: 50 });
    const pts = r.chart!.supply;
    expect(pts[0]).toEqual({ flow: 0, pressure: 72 });
    for (let i = 1; i < pts.length; i++) expect(pts[i]!.pressure).toBeLessThanOrEqual(pts[i - 1]!.pressure);
  });
});

describe("bad input", () => {
  it.each([
    [() => flowTestAvailablePsi({ staticPsi: 0, residualPsi: 0, testFlowGpm: 100 }, 10), "staticPsi"],
    [() => flowTestAvailablePsi({ staticPsi: 60, residualPsi: 60, testFlowGpm: 100 }, 10), "residualPsi"],
    [() => flowTestAvailablePsi({ staticPsi: 60, residualPsi: 70, testFlowGpm: 100 }, 10), "residualPsi"],
    [() => flowTestAvailablePsi({ staticPsi: 60, residualPsi: 40, testFlowGpm: 0 }, 10), "testFlowGpm"],
    [() => flowTestAvailablePsi({ staticPsi: 60, residualPsi: 40, testFlowGpm: 500 }, -3), "demandFlowGpm"],
    [() => flowAtResidualGpm({ staticPsi: 60, residualPsi: 40, testFlowGpm: 500 }, 65), "residualTargetPsi"],
    [() => calculatorReport("flow-test", { units: "si", staticPressure: 4, residualPressure: 5, testFlow: 2000, demandFlow: 100 }), "residualPressure"],
    [() => supplyMargin({ flowGpm: Number.NaN, pressurePsi: 10 }, { availablePsi: 40 }), "demandFlowGpm"],
    [() => supplyMargin({ flowGpm: 20, pressurePsi: -1 }, { availablePsi: 40 }), "demandPressurePsi"],
  ])("throws HydraulicsInputError naming the field (%#)", (fn, field) => {
    expect(fn).toThrowError(HydraulicsInputError);
    expect(fn).toThrowError(expect.objectContaining({ field }));
  });
});
