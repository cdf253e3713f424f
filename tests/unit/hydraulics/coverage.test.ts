// Room coverage: least sprinklers in a regular grid against a listing's maximum spacing and area.
// The listing values used here (16 ft / 256 ft², 20 ft / 400 ft²) are invented sample listings.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { HydraulicsInputError, roomCoverage, sprinklersNeeded } from "../../../lib/hydraulics";

/** brute force over every grid up to 30×30: the least count meeting the limits (independent of the library's search) */
function bruteForceLeast(L: number, W: number, S: number, A: number): number {
  let best = Infinity;
  for (let c = 1; c <= 30; c++)
    for (let r = 1; r <= 30; r++) {
      const sL = L / c;
      const sW = W / r;
      if (sL <= S + 1e-9 && sW <= S + 1e-9 && sL * sW <= A * (1 + 1e-9)) best = Math.min(best, c * r);
    }
  return best;
}

describe("room coverage examples", () => {
  it("a 14 × 12 ft bedroom fits one 16 ft / 256 ft² sprinkler, 7 ft and 6 ft to the walls", () => {
    const r = roomCoverage({ lengthFt: 14, widthFt: 12, maxSpacingFt: 16, maxAreaSqFt: 256 });
    expect(r.sprinklers).toBe(1);
    expect(r.wallDistanceLengthFt).toBe(7);
    expect(r.wallDistanceWidthFt).toBe(6);
    expect(r.areaPerSprinklerSqFt).toBe(168);
  });
  it("a 24 × 14 ft family room needs two at 12 ft spacing (24/16 rounds up to 2)", () => {
    const r = roomCoverage({ lengthFt: 24, widthFt: 14, maxSpacingFt: 16, maxAreaSqFt: 256 });
    expect(r.sprinklers).toBe(2);
    expect([r.columns, r.rows]).toEqual([2, 1]);
    expect(r.spacingAlongLengthFt).toBe(12);
    expect(r.wallDistanceLengthFt).toBe(6);
  });
  it("area governs when spacing alone would allow fewer: 20 × 20 ft with 20 ft / 256 ft² needs 2", () => {
    // one sprinkler would cover 400 ft² > 256 ft²
    expect(sprinklersNeeded({ lengthFt: 20, widthFt: 20, maxSpacingFt: 20, maxAreaSqFt: 256 })).toBe(2);
  });
  it("handles sides that divide exactly despite floating point (14.7 ft with 4.9 ft spacing → 3)", () => {
    expect(roomCoverage({ lengthFt: 14.7, widthFt: 4.9, maxSpacingFt: 4.9, maxAreaSqFt: 100 }).columns).toBe(3);
  });
  it("a listed maximum wall distance tightens the spacing to twice that distance", () => {
    const r = roomCoverage({ lengthFt: 15, widthFt: 10, maxSpacingFt: 16, maxAreaSqFt: 256, maxWallDistanceFt: 7 });
    expect(r.spacingLimitFt).toBe(14);
    expect(r.sprinklers).toBe(2);
  });
  it("flags a regular grid that breaks a listed minimum spacing", () => {
    const r = roomCoverage({ lengthFt: 17, widthFt: 8, maxSpacingFt: 16, maxAreaSqFt: 256, minSpacingFt: 9 });
    expect(r.spacingAlongLengthFt).toBe(8.5);
    expect(r.checks.find((c) => c.id === "min-spacing")?.status).toBe("fails");
  });
  it("always lists what must be checked against the listing", () => {
    const ids = roomCoverage({ lengthFt: 12, widthFt: 12, maxSpacingFt: 16, maxAreaSqFt: 256 }).checks.map((c) => c.id);
    for (const id of ["obstructions", "sloped-ceiling", "beams-soffits", "wall-distance", "listed-flow"]) expect(ids).toContain(id);
  });
});

describe("properties (fast-check)", () => {
  const input = fc.record({
    lengthFt: fc.double({ min: 1, max: 60, noNaN: true }),
    widthFt: fc.double({ min: 1, max: 60, noNaN: true }),
    maxSpacingFt: fc.double({ min: 6, max: 24, noNaN: true }),
    maxAreaSqFt: fc.double({ min: 60, max: 576, noNaN: true }),
  });

  it("never leaves spacing or area above the limits", () => {
    fc.assert(
      fc.property(input, (i) => {
        const r = roomCoverage(i);
        expect(r.spacingAlongLengthFt).toBeLessThanOrEqual(i.maxSpacingFt * (1 + 1e-9));
        expect(r.spacingAlongWidthFt).toBeLessThanOrEqual(i.maxSpacingFt * (1 + 1e-9));
        expect(r.areaPerSprinklerSqFt).toBeLessThanOrEqual(i.maxAreaSqFt * (1 + 1e-9));
        expect(r.wallDistanceLengthFt * 2).toBeCloseTo(r.spacingAlongLengthFt, 12);
        expect(r.columns * r.rows).toBe(r.sprinklers);
      }),
    );
  });

  it("uses the least number a regular grid allows (checked by brute force)", () => {
    fc.assert(fc.property(input, (i) => roomCoverage(i).sprinklers === bruteForceLeast(i.lengthFt, i.widthFt, i.maxSpacingFt, i.maxAreaSqFt)));
  });

  it("a bigger room never needs fewer sprinklers", () => {
    fc.assert(
      fc.property(input, fc.double({ min: 0, max: 30, noNaN: true }), (i, extra) => {
        return sprinklersNeeded({ ...i, lengthFt: i.lengthFt + extra }) >= sprinklersNeeded(i);
      }),
    );
  });
});

describe("bad input", () => {
  it.each([
    [{ lengthFt: 0, widthFt: 10, maxSpacingFt: 16, maxAreaSqFt: 256 }, "lengthFt"],
    [{ lengthFt: 10, widthFt: Number.NaN, maxSpacingFt: 16, maxAreaSqFt: 256 }, "widthFt"],
    [{ lengthFt: 10, widthFt: 10, maxSpacingFt: 0, maxAreaSqFt: 256 }, "maxSpacingFt"],
    [{ lengthFt: 10, widthFt: 10, maxSpacingFt: 16, maxAreaSqFt: -4 }, "maxAreaSqFt"],
  ])("throws HydraulicsInputError naming the field (%#)", (i, field) => {
    expect(() => roomCoverage(i)).toThrowError(HydraulicsInputError);
    expect(() => roomCoverage(i)).toThrowError(expect.objectContaining({ field }));
  });
});
