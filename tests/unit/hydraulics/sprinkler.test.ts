// Q = K√P, the discharge relation in NFPA 13 and NFPA 13D (hydraulic calculation provisions).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { evaluate, unit } from "mathjs";
import {
  HydraulicsInputError,
  designSprinklerPoint,
  kFactorUsToSi,
  sprinklerFlowGpm,
  sprinklerFlowLpm,
  sprinklerPressureBar,
  sprinklerPressurePsi,
} from "../../../lib/hydraulics";

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
  it("US and SI agree after conversion (property, conversions by mathjs)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 50, noNaN: true }), fc.double({ min: 0.1, max: 500, noNaN: true }), (k, p) => {
        const qUs = sprinklerFlowGpm(k, p);
        const qSi = sprinklerFlowLpm(kFactorUsToSi(k), unit(p, "psi").toNumber("bar"));
        const qUsInLpm = unit(qUs, "gal/min").toNumber("L/min");
        expect(Math.abs(qSi - qUsInLpm) / qUsInLpm).toBeLessThan(1e-9);
        const pSi = sprinklerPressureBar(kFactorUsToSi(k), qSi);
        expect(Math.abs(pSi - unit(p, "psi").toNumber("bar")) / pSi).toBeLessThan(1e-9);
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

describe("bad input", () => {
  it.each([
    [() => sprinklerFlowGpm(0, 10), "kFactor"],
    [() => sprinklerFlowGpm(5.6, -1), "pressurePsi"],
    [() => sprinklerFlowGpm(5.6, Number.NaN), "pressurePsi"],
    [() => sprinklerPressurePsi(5.6, Number.POSITIVE_INFINITY), "flowGpm"],
    [() => sprinklerFlowLpm(80, 0), "pressureBar"],
    [() => designSprinklerPoint(4.9, 13, -2), "minPressurePsi"],
  ])("throws HydraulicsInputError naming the field (%#)", (fn, field) => {
    expect(fn).toThrow(HydraulicsInputError);
    try {
      fn();
    } catch (e) {
      expect((e as HydraulicsInputError).field).toBe(field);
    }
  });
});
