// Elevation pressure from the weight of water: 62.37 lb/ft³ at about 60 °F (water-property tables,
// from memory) ÷ 144 in²/ft² = 0.4331 psi/ft, the 0.433 psi/ft of the sprinkler standards.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unit } from "mathjs";
import {
  BAR_PER_M_OF_WATER,
  HydraulicsInputError,
  PSI_PER_FT_OF_WATER,
  WATER_DENSITY_KG_PER_CU_M,
  calculatorReport,
  elevationChangePsi,
  headPressurePsi,
} from "../../../lib/hydraulics";

// the SI figure as the calculator computes it
const headPressureBar = (heightM: number) => calculatorReport("elevation", { units: "si", height: heightM }).results[0]!.value;

const gravity = unit(9.80665, "m/s^2"); // standard gravity (CGPM)

describe("psi per foot of water", () => {
  it("62.37 lb/ft³ × g, converted by mathjs, gives the library's psi/ft", () => {
    const expected = unit(62.37, "lbm/ft^3").multiply(gravity).toNumber("psi/ft");
    expect(Math.abs(PSI_PER_FT_OF_WATER - expected)).toBeLessThan(1e-9);
  });
  it("rounds to the 0.433 psi/ft the sprinkler standards use", () => {
    expect(PSI_PER_FT_OF_WATER).toBeCloseTo(0.433, 3);
    expect(PSI_PER_FT_OF_WATER).toBeCloseTo(62.37 / 144, 12);
  });
  it("the same water in SI: 999.1 kg/m³ and 0.098 bar/m (mathjs)", () => {
    expect(WATER_DENSITY_KG_PER_CU_M).toBeCloseTo(unit(62.37, "lbm/ft^3").toNumber("kg/m^3"), 9);
    expect(WATER_DENSITY_KG_PER_CU_M).toBeGreaterThan(998.9); // 999.0 kg/m³ at 15.6 °C (water tables, from memory)
    expect(WATER_DENSITY_KG_PER_CU_M).toBeLessThan(999.2);
    expect(BAR_PER_M_OF_WATER).toBeCloseTo(unit(62.37, "lbm/ft^3").multiply(gravity).toNumber("bar/m"), 9);
    expect(BAR_PER_M_OF_WATER).toBeCloseTo(0.098, 3);
  });
  it("a 2-storey climb of 20 ft costs 20 × 0.4331 = 8.66 psi", () => {
    expect(headPressurePsi(20)).toBeCloseTo(20 * (62.37 / 144), 12);
    expect(headPressurePsi(20)).toBeCloseTo(8.66, 2);
  });
});

describe("properties", () => {
  it("US and SI agree after conversion (mathjs)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3000, noNaN: true }), (h) => {
        const psi = headPressurePsi(h);
        const bar = headPressureBar(unit(h, "ft").toNumber("m"));
        expect(Math.abs(unit(bar, "bar").toNumber("psi") - psi)).toBeLessThanOrEqual(1e-9 * Math.max(1, psi));
      }),
    );
  });
  it("a drop gains what a rise loses", () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1000, noNaN: true }), (h) => elevationChangePsi(-h) === -elevationChangePsi(h)));
  });
});

describe("bad input", () => {
  it("head height must not be negative or non-finite", () => {
    expect(() => headPressurePsi(-1)).toThrowError(expect.objectContaining({ field: "heightFt" }));
    expect(() => headPressurePsi(Number.NaN)).toThrowError(HydraulicsInputError);
    expect(() => headPressureBar(Number.POSITIVE_INFINITY)).toThrowError(expect.objectContaining({ field: "height" }));
    expect(() => elevationChangePsi(1e9)).toThrowError(expect.objectContaining({ field: "elevationChangeFt" }));
  });
});
