// Q = K√P, the discharge relation in NFPA 13 and NFPA 13D (hydraulic calculation provisions).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { evaluate, unit } from "mathjs";
import {
  CODE_FLOORS,
  HydraulicsInputError,
  calculatorReport,
  designSprinklerPoint,
  designSprinklerPressurePsi,
  fromUs,
  sprinklerFlowGpm,
  sprinklerPressurePsi,
} from "../../../lib/hydraulics";

const kFactorUsToSi = (k: number) => fromUs("k", k, "si");
const resultValue = (r: ReturnType<typeof calculatorReport>) => r.results[0]!.value;

describe("Q = K√P (NFPA 13 discharge formula)", () => {
  it.each([
    // [K, P psi] — hand arithmetic of the formula, evaluated independently with mathjs
    [5.6, 7],
    [4.9, 10],
    [4.2, 16],
    [3.0, 25],
  ])("K %s at %s psi", (k, p) => {
    const expected = evaluate("k * sqrt(p)", { k, p }) as number;
    expect(sprinklerFlowGpm(k, p)).toBeCloseTo(expected, 10);
  });
  it("K 4.2 at 16 psi is exactly 16.8 gpm (√16 = 4)", () => {
    expect(sprinklerFlowGpm(4.2, 16)).toBeCloseTo(16.8, 12);
  });
  it("K 4.9 needs (13/4.9)² = 7.04 psi for 13 gpm", () => {
    expect(sprinklerPressurePsi(4.9, 13)).toBeCloseTo((13 / 4.9) ** 2, 12);
    expect(sprinklerPressurePsi(4.9, 13)).toBeCloseTo(7.04, 2);
  });
  it("flow and pressure invert each other (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 50, noNaN: true }), fc.double({ min: 0.1, max: 500, noNaN: true }), (k, p) => {
        const q = sprinklerFlowGpm(k, p);
        return Math.abs(sprinklerPressurePsi(k, q) - p) < 1e-9 * p;
      }),
    );
  });
  it("US and SI agree after conversion (property, conversions by mathjs), through the calculator's SI path", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 50, noNaN: true }), fc.double({ min: 0.1, max: 500, noNaN: true }), (k, p) => {
        const qUs = sprinklerFlowGpm(k, p);
        const qSi = resultValue(calculatorReport("sprinkler-flow", { units: "si", solveFor: "flow", k: kFactorUsToSi(k), pressure: unit(p, "psi").toNumber("bar") }));
        const qUsInLpm = unit(qUs, "gal/min").toNumber("L/min");
        expect(Math.abs(qSi - qUsInLpm) / qUsInLpm).toBeLessThan(1e-9);
        // solving back for pressure gives p again (or the code's 7 psi floor, which the SI report shows in bar)
        const pSi = resultValue(calculatorReport("sprinkler-flow", { units: "si", solveFor: "pressure", k: kFactorUsToSi(k), flow: qSi }));
        const expectedBar = unit(Math.max(p, 7), "psi").toNumber("bar");
        expect(Math.abs(pSi - expectedBar) / pSi).toBeLessThan(1e-9);
      }),
    );
  });
});

describe("design sprinkler point (listed flow vs listed minimum pressure)", () => {
  it("listed flow governs when its pressure is above the listed minimum", () => {
    const r = designSprinklerPoint(4.9, 13, 7);
    expect(r.governedBy).toBe("listed flow");
    expect(r.pressurePsi).toBeCloseTo((13 / 4.9) ** 2, 12);
  });
  it("the listed minimum pressure governs when higher, raising the flow to K√Pmin", () => {
    const r = designSprinklerPoint(5.6, 8, 7);
    expect(r.governedBy).toBe("listed minimum pressure");
    expect(r.flowGpm).toBeCloseTo(5.6 * Math.sqrt(7), 12);
  });
});

describe("NFPA 13D floors (CODE_FLOORS: 7 psi at a sprinkler; 0.05 gpm/ft² over its coverage)", () => {
  it("exports the floors with their provisions", () => {
    expect(CODE_FLOORS.minPressurePsi).toBe(7);
    expect(CODE_FLOORS.minDensityGpmPerSqFt).toBe(0.05);
    expect(CODE_FLOORS.source.minDensityGpmPerSqFt).toMatch(/NFPA 13D/);
    expect(CODE_FLOORS.source.minPressurePsi).toMatch(/NFPA 13D/);
  });
  it("a listing whose flow needs less than 7 psi is raised to 7 psi (K 5.6, 10 gpm → (10/5.6)² = 3.2 psi → 7 psi, 14.8 gpm)", () => {
    const r = designSprinklerPoint(5.6, 10);
    expect(r.governedBy).toBe("code minimum pressure");
    expect(r.pressurePsi).toBe(7);
    expect(r.flowGpm).toBeCloseTo(5.6 * Math.sqrt(7), 12);
  });
  it("a large coverage raises the flow to 0.05 gpm/ft² × area (K 4.9, 13 gpm listed, 20 × 20 ft → 20 gpm)", () => {
    const r = designSprinklerPoint(4.9, 13, undefined, 400);
    expect(r.governedBy).toBe("code minimum density");
    expect(r.flowGpm).toBeCloseTo(20, 12);
    expect(r.pressurePsi).toBeCloseTo((20 / 4.9) ** 2, 12);
  });
  it("the listed flow still governs when it is above both floors (K 4.9, 13 gpm, 16 × 16 ft: 12.8 gpm by density, 7.04 psi)", () => {
    expect(designSprinklerPoint(4.9, 13, undefined, 256).governedBy).toBe("listed flow");
  });
  it("never returns a design point below either floor (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 25, noNaN: true }),
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.option(fc.double({ min: 0.5, max: 60, noNaN: true }), { nil: undefined }),
        fc.option(fc.double({ min: 1, max: 1000, noNaN: true }), { nil: undefined }),
        (k, q, pMin, area) => {
          const r = designSprinklerPoint(k, q, pMin, area);
          expect(r.pressurePsi).toBeGreaterThanOrEqual(7);
          expect(r.flowGpm).toBeGreaterThanOrEqual(q);
          if (area !== undefined) expect(r.flowGpm).toBeGreaterThanOrEqual(0.05 * area * (1 - 1e-12));
          if (pMin !== undefined) expect(r.pressurePsi).toBeGreaterThanOrEqual(pMin * (1 - 1e-12));
          expect(r.pressurePsi).toBeCloseTo(Math.max(7, (r.flowGpm / k) ** 2), 9);
        },
      ),
    );
  });
  it("designSprinklerPressurePsi is (Q/K)², never below 7 psi", () => {
    expect(designSprinklerPressurePsi(4.9, 18)).toBeCloseTo((18 / 4.9) ** 2, 12);
    expect(designSprinklerPressurePsi(5.6, 10)).toBe(7);
  });
  it("the calculator shows 7 psi needed and a check when (Q/K)² is lower; a pressure below 7 psi fails", () => {
    const r = calculatorReport("sprinkler-flow", { units: "us", solveFor: "pressure", k: 5.6, flow: 10 });
    expect(r.results[0]!.text).toBe("7.0 psi");
    expect(r.checks.some((c) => /7\.0 psi/.test(c.text))).toBe(true);
    const low = calculatorReport("sprinkler-flow", { units: "us", solveFor: "flow", k: 5.6, pressure: 5 });
    expect(low.checks[0]?.status).toBe("fails");
  });
});

describe("bad input", () => {
  it.each([
    [() => sprinklerFlowGpm(0, 10), "kFactor"],
    [() => sprinklerFlowGpm(5.6, -1), "pressurePsi"],
    [() => sprinklerFlowGpm(5.6, Number.NaN), "pressurePsi"],
    [() => sprinklerPressurePsi(5.6, Number.POSITIVE_INFINITY), "flowGpm"],
    [() => designSprinklerPoint(4.9, 13, -2), "minPressurePsi"],
    [() => calculatorReport("sprinkler-flow", { units: "si", solveFor: "flow", k: 80, pressure: 0 }), "pressure"],
  ])("throws HydraulicsInputError naming the field (%#)", (fn, field) => {
    expect(fn).toThrow(HydraulicsInputError);
    try {
      fn();
    } catch (e) {
      expect((e as HydraulicsInputError).field).toBe(field);
    }
  });
});
