// Stored water for a tank supply: design flow × design duration (volume = rate × time).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unit } from "mathjs";
import { HydraulicsInputError, calculatorReport, storedWaterGal } from "../../../lib/hydraulics";

// the SI figure as the calculator computes it
const storedWaterL = (flowLpm: number, durationMin: number) =>
  calculatorReport("stored-water", { units: "si", flow: flowLpm, duration: durationMin }).results[0]!.value;

describe("stored water", () => {
  it("26 gpm for 10 minutes is 260 gal (rate × time)", () => {
    expect(storedWaterGal(26, 10)).toBe(260);
  });
  it("the same tank in litres matches mathjs's conversion of gpm × min", () => {
    const gal = storedWaterGal(26, 10);
    const litres = storedWaterL(unit(26, "gal/min").toNumber("L/min"), 10);
    expect(litres).toBeCloseTo(unit(gal, "gal").toNumber("L"), 9);
  });
  it("US and SI agree for any flow and duration (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 500, noNaN: true }), fc.double({ min: 1, max: 120, noNaN: true }), (q, t) => {
        const l = storedWaterL(unit(q, "gal/min").toNumber("L/min"), t);
        return Math.abs(unit(l, "L").toNumber("gal") - storedWaterGal(q, t)) < 1e-9 * q * t;
      }),
    );
  });
  it("rejects zero, negative or missing values naming the field", () => {
    expect(() => storedWaterGal(0, 10)).toThrowError(expect.objectContaining({ field: "flowGpm" }));
    expect(() => storedWaterGal(26, -10)).toThrowError(expect.objectContaining({ field: "durationMin" }));
    expect(() => storedWaterL(100, Number.NaN)).toThrowError(HydraulicsInputError);
    expect(() => storedWaterL(100, Number.NaN)).toThrowError(expect.objectContaining({ field: "duration" }));
  });
});
