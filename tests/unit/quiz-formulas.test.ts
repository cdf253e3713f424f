// Each parametric quiz formula (lib/content/schema.ts `parametricFormula`) computes through
// lib/hydraulics; expected values are recomputed from the published formulas with mathjs.
import { describe, expect, it } from "vitest";
import { evaluate } from "mathjs";
import { parametricFormula } from "../../lib/content/schema";
import { FORMULA_PARAMS, computeFormula, formulas } from "../../lib/quiz/formulas";
import { HydraulicsInputError } from "../../lib/hydraulics";

describe("parametric quiz formulas", () => {
  it("implements every formula the content schema names", () => {
    expect(Object.keys(formulas).sort()).toEqual([...parametricFormula.options].sort());
    expect(Object.keys(FORMULA_PARAMS).sort()).toEqual([...parametricFormula.options].sort());
  });
  it("sprinklerFlowGpm: Q = K√P (NFPA 13 discharge formula)", () => {
    expect(computeFormula("sprinklerFlowGpm", { kFactor: 5.6, pressurePsi: 7 })).toBeCloseTo(evaluate("5.6 * sqrt(7)") as number, 12);
  });
  it("sprinklerPressurePsi: P = (Q/K)²", () => {
    expect(computeFormula("sprinklerPressurePsi", { kFactor: 4.9, flowGpm: 13 })).toBeCloseTo(evaluate("(13 / 4.9)^2") as number, 12);
  });
  it("elevationPsi: 0.4331 psi per foot (62.37 lb/ft³ ÷ 144)", () => {
    expect(computeFormula("elevationPsi", { heightFt: 18 })).toBeCloseTo(evaluate("18 * 62.37 / 144") as number, 12);
  });
  it("frictionLossPsi: Hazen-Williams 4.52 form × length, with cFactor and insideDiameterIn used directly", () => {
    const expected = evaluate("4.52 * 20^1.85 / (150^1.85 * 1.025^4.87) * 75") as number;
    expect(computeFormula("frictionLossPsi", { flowGpm: 20, lengthFt: 75, cFactor: 150, insideDiameterIn: 1.025 })).toBeCloseTo(expected, 12);
  });
  it("flowTestAvailablePsi: NFPA 291 P = Ps − (Ps − Pr)(Q/Qt)^1.85", () => {
    const expected = evaluate("70 - (70 - 52) * (40 / 900)^1.85") as number;
    expect(
      computeFormula("flowTestAvailablePsi", { staticPsi: 70, residualPsi: 52, testFlowGpm: 900, demandFlowGpm: 40 }),
    ).toBeCloseTo(expected, 12);
  });
  it("storedWaterGal: flow × duration", () => {
    expect(computeFormula("storedWaterGal", { flowGpm: 26, durationMin: 10 })).toBe(260);
  });
  it("sprinklersNeeded: the room coverage check (24 × 14 ft, 16 ft / 256 ft² sample listing → 2)", () => {
    expect(computeFormula("sprinklersNeeded", { lengthFt: 24, widthFt: 14, maxSpacingFt: 16, maxAreaSqFt: 256 })).toBe(2);
  });
  it("a missing param throws HydraulicsInputError naming it", () => {
    expect(() => computeFormula("frictionLossPsi", { flowGpm: 20, lengthFt: 75, cFactor: 150 })).toThrowError(
      expect.objectContaining({ field: "insideDiameterIn" }),
    );
    expect(() => computeFormula("sprinklerFlowGpm", { kFactor: 5.6, pressurePsi: -7 })).toThrowError(HydraulicsInputError);
  });
  it("fixed params can ride along unused (extra keys are ignored)", () => {
    expect(computeFormula("elevationPsi", { heightFt: 10, unused: 3 })).toBeCloseTo(10 * (62.37 / 144), 12);
  });
});
