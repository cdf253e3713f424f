// The display rounding rule (stated in lib/hydraulics/rounding.ts): fixed steps per unit; requirements
// round up, supplies down, so display never flatters a design.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DISPLAY_STEPS, HydraulicsInputError, formatForDisplay, roundForDisplay, type DisplayUnit } from "../../../lib/hydraulics";

describe("roundForDisplay", () => {
  it("rounds to each unit's step", () => {
    expect(roundForDisplay(7.0387, "psi")).toBe(7);
    expect(roundForDisplay(15.4919, "gpm")).toBe(15.5);
    expect(roundForDisplay(184.8, "gal")).toBe(185);
    expect(roundForDisplay(0.78549, "in")).toBe(0.785);
    expect(roundForDisplay(0.0213456, "psi/ft")).toBe(0.0213);
  });
  it("rounds decimal halves away from zero without binary error (1.005 → 1.01 bar)", () => {
    expect(roundForDisplay(1.005, "bar")).toBe(1.01);
    expect(roundForDisplay(-0.05, "psi")).toBe(-0.1);
  });
  it("up for requirements, down for supplies, and exact values stay put", () => {
    expect(roundForDisplay(48.21, "psi", "up")).toBe(48.3);
    expect(roundForDisplay(48.29, "psi", "down")).toBe(48.2);
    expect(roundForDisplay(130, "gal", "up")).toBe(130);
    expect(roundForDisplay(0.1 + 0.2, "psi", "up")).toBe(0.3);
  });
  it("never shows −0", () => {
    expect(Object.is(roundForDisplay(-0.00001, "psi"), 0)).toBe(true);
  });
  it("formats with fixed decimals", () => {
    expect(formatForDisplay(12, "psi")).toBe("12.0 psi");
    expect(formatForDisplay(259.6, "gal", "up")).toBe("260 gal");
    expect(formatForDisplay(4.9, "K-US")).toBe("4.9");
  });
  it("rejects non-finite values", () => {
    expect(() => roundForDisplay(Number.NaN, "psi")).toThrowError(HydraulicsInputError);
  });
  it("stays within half a step, and up ≥ value ≥ down (property)", () => {
    const units = Object.keys(DISPLAY_STEPS) as DisplayUnit[];
    fc.assert(
      fc.property(fc.constantFrom(...units), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (u, v) => {
        const step = DISPLAY_STEPS[u];
        const tol = 1e-9 * Math.max(1, Math.abs(v));
        expect(Math.abs(roundForDisplay(v, u) - v)).toBeLessThanOrEqual(step / 2 + tol);
        expect(roundForDisplay(v, u, "up")).toBeGreaterThanOrEqual(v - step * 1e-6 - tol);
        expect(roundForDisplay(v, u, "down")).toBeLessThanOrEqual(v + step * 1e-6 + tol);
      }),
    );
  });
});
