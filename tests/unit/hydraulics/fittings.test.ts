// Equivalent lengths: NFPA 13 equivalent schedule 40 steel pipe length chart (C = 120) and its
// C-factor multipliers (values from memory, matched against a reproduction of the 2013 table).
import { describe, expect, it } from "vitest";
import {
  C_FACTOR_MULTIPLIERS,
  HydraulicsInputError,
  STEEL_40_EQUIVALENT_LENGTH_FT,
  cFactorMultiplier,
  fittingsEquivalentLength,
  pipeInsideDiameterIn,
} from "../../../lib/hydraulics";

describe("NFPA 13 chart values (schedule 40 steel, C = 120)", () => {
  it.each([
    // [fitting, size, feet] as printed in the chart (from memory, checked against a reproduction)
    ["elbow-90", "1", 2],
    ["elbow-90", "2", 5],
    ["elbow-45", "1-1/2", 2],
    ["elbow-90-long-turn", "1-1/4", 2],
    ["tee-branch", "3/4", 4],
    ["tee-branch", "1", 5],
    ["tee-branch", "2", 10],
    ["swing-check", "1", 5],
    ["swing-check", "2", 11],
    ["gate-valve", "2", 1],
    ["butterfly-valve", "2", 6],
  ] as const)("%s at %s in = %s ft", (kind, size, ft) => {
    expect(STEEL_40_EQUIVALENT_LENGTH_FT[kind][size]).toBe(ft);
    expect(fittingsEquivalentLength("steel-40", size, [{ kind }]).totalFt).toBe(ft);
  });

  it("sums counts: four 90° elbows and a tee branch at 1 in = 4×2 + 5 = 13 ft", () => {
    const r = fittingsEquivalentLength("steel-40", "1", [{ kind: "elbow-90", count: 4 }, { kind: "tee-branch" }]);
    expect(r.totalFt).toBe(13);
    expect(r.items).toHaveLength(2);
  });

  it("charges nothing extra for flow through a tee's run (common practice)", () => {
    expect(fittingsEquivalentLength("steel-40", "1", [{ kind: "tee-run", count: 3 }]).totalFt).toBe(0);
  });

  it("refuses a size the chart leaves blank, naming the fitting", () => {
    expect(() => fittingsEquivalentLength("steel-40", "1", [{ kind: "gate-valve" }])).toThrowError(
      expect.objectContaining({ field: "fittings[0].kind" }),
    );
  });
});

describe("C-factor multipliers", () => {
  it("the chart's multipliers equal (C/120)^1.85 to the printed precision — an independent check of the remembered values", () => {
    for (const { cFactor, multiplier } of C_FACTOR_MULTIPLIERS) {
      expect(Math.abs(multiplier - (cFactor / 120) ** 1.85)).toBeLessThan(0.002);
    }
  });
  it("uses the chart value where listed and (C/120)^1.85 otherwise", () => {
    expect(cFactorMultiplier(150)).toEqual({ multiplier: 1.51, source: "table" });
    expect(cFactorMultiplier(100)).toEqual({ multiplier: 0.713, source: "table" });
    const r = cFactorMultiplier(110);
    expect(r.source).toBe("computed");
    expect(r.multiplier).toBeCloseTo((110 / 120) ** 1.85, 12);
  });
});

describe("copper tube: C and inside-diameter adjustments (NFPA 13 chart notes, from memory)", () => {
  it("1 in Type L elbow = 2 ft × 1.51 × (1.025/1.049)^4.87", () => {
    const r = fittingsEquivalentLength("copper-l", "1", [{ kind: "elbow-90" }]);
    const expected = 2 * 1.51 * (pipeInsideDiameterIn("copper-l", "1") / pipeInsideDiameterIn("steel-40", "1")) ** 4.87;
    expect(r.totalFt).toBeCloseTo(expected, 12);
    expect(r.items[0]!.cMultiplier).toBe(1.51);
  });
});

describe("CPVC and PEX use the pipe maker's listed equivalent lengths", () => {
  it("refuses a chart fitting on CPVC, asking for the listed value", () => {
    expect(() => fittingsEquivalentLength("cpvc", "1", [{ kind: "elbow-90" }])).toThrowError(
      expect.objectContaining({ field: "fittings[0].equivalentLengthFt" }),
    );
    expect(() => fittingsEquivalentLength("pex", "3/4", [{ kind: "tee-branch" }])).toThrowError(HydraulicsInputError);
  });
  it("accepts listed lengths (invented sample values) and multiplies by count", () => {
    const r = fittingsEquivalentLength("cpvc", "1", [
      { label: "Listed 90° elbow", equivalentLengthFt: 7, count: 3 },
      { label: "Listed tee, branch", equivalentLengthFt: 6 },
    ]);
    expect(r.totalFt).toBe(27);
  });
  it("rejects a negative listed length or a fractional count", () => {
    expect(() => fittingsEquivalentLength("pex", "1", [{ label: "x", equivalentLengthFt: -1 }])).toThrowError(
      expect.objectContaining({ field: "fittings[0].equivalentLengthFt" }),
    );
    expect(() => fittingsEquivalentLength("steel-40", "1", [{ kind: "elbow-90", count: 1.5 }])).toThrowError(
      expect.objectContaining({ field: "fittings[0].count" }),
    );
  });
});
