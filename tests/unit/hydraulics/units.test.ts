// Unit conversions checked against mathjs's unit system (used only here, as an outside reference).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unit } from "mathjs";
import { K_SI_PER_K_US, L_PER_GAL, PA_PER_PSI, PSI_PER_BAR, fromUs, toUs, HydraulicsInputError, type Quantity } from "../../../lib/hydraulics";

// the product's one conversion path (lib/hydraulics/units.ts toUs/fromUs), used by every report,
// the unit switch and the PDF
const kFactorUsToSi = (k: number) => fromUs("k", k, "si");
const kFactorSiToUs = (k: number) => toUs("k", k, "si");

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("unit constants against mathjs", () => {
  it("US gallon = 3.785411784 L (231 in³)", () => {
    expect(rel(L_PER_GAL, unit(1, "gal").toNumber("L"))).toBeLessThan(1e-12);
  });
  it("psi in pascals (lbf/in²)", () => {
    expect(rel(PA_PER_PSI, unit(1, "psi").toNumber("Pa"))).toBeLessThan(1e-9);
  });
  it("psi per bar", () => {
    expect(rel(PSI_PER_BAR, unit(1, "bar").toNumber("psi"))).toBeLessThan(1e-9);
  });
});

describe("conversions against mathjs (property)", () => {
  const value = fc.double({ min: -1e5, max: 1e5, noNaN: true });
  // [quantity, US unit, SI unit] in mathjs's names
  const cases: [Quantity, string, string][] = [
    ["flow", "gal/min", "L/min"],
    ["volume", "gal", "L"],
    ["pressure", "psi", "bar"],
    ["length", "ft", "m"],
    ["diameter", "in", "mm"],
    ["area", "ft^2", "m^2"],
    ["lossPerLength", "psi/ft", "bar/m"],
    ["velocity", "ft/s", "m/s"],
  ];
  for (const [q, us, si] of cases) {
    it(`${q}: ${us} → ${si} and back`, () => {
      fc.assert(
        fc.property(value, (v) => {
          const toSi = unit(v, us).toNumber(si);
          expect(Math.abs(fromUs(q, v, "si") - toSi)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(toSi)));
          const toUsExpected = unit(v, si).toNumber(us);
          expect(Math.abs(toUs(q, v, "si") - toUsExpected)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(toUsExpected)));
        }),
      );
    });
  }
  it("US to US is the value itself", () => {
    fc.assert(fc.property(value, (v) => toUs("pressure", v, "us") === v && fromUs("flow", v, "us") === v));
  });
});

describe("K-factor conversion", () => {
  it("K_SI = K_US × 14.4163… derived from the gallon and the bar (mathjs)", () => {
    const expected = unit(1, "gal").toNumber("L") * Math.sqrt(unit(1, "bar").toNumber("psi"));
    expect(rel(K_SI_PER_K_US, expected)).toBeLessThan(1e-9);
    expect(K_SI_PER_K_US).toBeGreaterThan(14.416);
    expect(K_SI_PER_K_US).toBeLessThan(14.4165);
  });
  it("matches the paired nominal K designations of NFPA 13's K-factor table within 1% (pairs from memory)", () => {
    const pairs: [number, number][] = [
      [2.8, 40],
      [4.2, 60],
      [5.6, 80],
      [8.0, 115],
      [11.2, 160],
      [14.0, 200],
      [16.8, 240],
      [25.2, 360],
    ];
    for (const [us, si] of pairs) expect(rel(kFactorUsToSi(us), si)).toBeLessThan(0.01);
  });
  it("round-trips", () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), (k) => rel(kFactorSiToUs(kFactorUsToSi(k)), k) < 1e-12));
  });
  it("a K in one system gives the same flow at the same pressure in the other (Q = K√P, checked with mathjs)", () => {
    const kUs = 5.6;
    const pressure = unit(10, "psi");
    const qUs = kUs * Math.sqrt(pressure.toNumber("psi")); // gpm
    const qSi = kFactorUsToSi(kUs) * Math.sqrt(pressure.toNumber("bar")); // L/min
    expect(rel(unit(qUs, "gal/min").toNumber("L/min"), qSi)).toBeLessThan(1e-9);
  });
});

describe("conversion input checks", () => {
  it("reject non-finite values naming the field", () => {
    expect(() => fromUs("flow", Number.NaN, "si")).toThrow(HydraulicsInputError);
    expect(() => toUs("pressure", Number.POSITIVE_INFINITY, "si")).toThrowError(expect.objectContaining({ field: "pressure" }));
  });
});
