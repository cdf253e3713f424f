// System demand: sprinkler pressure + friction + elevation + device losses back to the source.
// The design below is invented (a Larkhaven Homes plan in Juniper Flats); the listing numbers in it are
// sample values, not any real sprinkler's. Expected values are recomputed here from the published
// formulas (Q = K√P; Hazen-Williams 4.52; 0.433 psi/ft) with mathjs, independently of the library.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { evaluate, unit } from "mathjs";
import { HydraulicsInputError, calculatorReport, fromUs, pipeInsideDiameterIn, systemDemand, type SystemDemandInput } from "../../../lib/hydraulics";

const kFactorUsToSi = (k: number) => fromUs("k", k, "si");
// the SI system demand as the calculator computes it (neutral keys, SI units)
const systemDemandSi = (input: unknown) => {
  const r = calculatorReport("system-demand", input);
  const v = (label: string) => r.results.find((x) => x.label.startsWith(label))!.value;
  return { pressureBar: v("Pressure needed"), flowLpm: v("Flow needed") };
};

const hw = (q: number, c: number, d: number) => evaluate("4.52 * q^1.85 / (c^1.85 * d^4.87)", { q, c, d }) as number;
const PSI_PER_FT = 62.37 / 144;

const oneHead: SystemDemandInput = {
  sprinklers: [{ label: "Bedroom 2", kFactor: 4.9, minFlowGpm: 13 }],
  supplyPath: [
    { label: "Service, 1 in copper L", material: "copper-l", nominalSize: "1", lengthFt: 30, fittings: [{ kind: "elbow-90", count: 2 }] },
    {
      label: "Riser and main, 1 in CPVC",
      material: "cpvc",
      nominalSize: "1",
      lengthFt: 60,
      elevationChangeFt: 10,
      fittings: [{ label: "Listed 90° elbow (sample)", equivalentLengthFt: 7, count: 3 }],
    },
  ],
  deviceLosses: [
    { label: "Water meter", lossPsi: 4 },
    { label: "Backflow preventer", lossPsi: 6 },
  ],
};

describe("one design sprinkler", () => {
  it("adds each step to the sprinkler's pressure, as a hand calculation would", () => {
    const r = systemDemand(oneHead);
    const pSprinkler = (13 / 4.9) ** 2;
    const dCopper = pipeInsideDiameterIn("copper-l", "1"); // ASTM B88: 1.025 in
    const dCpvc = pipeInsideDiameterIn("cpvc", "1"); // ASTM F442 SDR 13.5 average bore: 1.101 in (pipe-data.test.ts)
    const elbowCopper = 2 * 1.51 * (dCopper / 1.049) ** 4.87; // NFPA 13 chart, C 150 and ID adjusted
    const expected =
      pSprinkler +
      hw(13, 150, dCpvc) * (60 + 21) +
      10 * PSI_PER_FT +
      hw(13, 150, dCopper) * (30 + 2 * elbowCopper) +
      4 +
      6;
    expect(r.pressurePsi).toBeCloseTo(expected, 9);
    expect(r.flowGpm).toBe(13);
    expect(r.steps.map((s) => s.kind)).toEqual(["sprinkler", "pipe", "pipe", "device", "device"]);
    expect(r.steps.at(-1)!.pressureRequiredPsi).toBeCloseTo(r.pressurePsi, 12);
  });

  it("adds an entered additional flow (e.g. domestic, where the adopted code requires it) to the supply path only", () => {
    const r = systemDemand({ ...oneHead, additionalFlowGpm: 5 });
    expect(r.flowGpm).toBe(18);
    const pipeSteps = r.steps.filter((s) => s.kind === "pipe");
    expect(pipeSteps.every((s) => s.flowGpm === 18)).toBe(true);
  });
  it("the additional-flow step shows the flow added (5 gpm), not the total (18 gpm)", () => {
    const r = systemDemand({ ...oneHead, additionalFlowGpm: 5 });
    const step = r.steps.find((s) => s.kind === "additional-flow")!;
    expect(step.flowGpm).toBe(5);
    const report = calculatorReport("system-demand", {
      units: "us",
      sprinklers: [{ k: 4.9, minFlow: 13 }],
      segments: [{ material: "copper-l", nominalSize: "1", length: 30 }],
      additionalFlow: 5,
    });
    const shown = report.steps.find((s) => s.label.startsWith("Additional flow"))!;
    expect(shown.label).toBe("Additional flow: 5.0 gpm");
    expect(shown.work).toContain("= 18.0 gpm");
  });
  it("each pipe step carries its velocity, flow ÷ bore area", () => {
    const r = systemDemand(oneHead);
    const pipe = r.steps.find((s) => s.kind === "pipe")!.segment!;
    expect(pipe.velocityFtPerS).toBeCloseTo(((13 * 231) / 60 / ((Math.PI * pipe.insideDiameterIn ** 2) / 4)) / 12, 9);
  });
});

describe("two design sprinklers, balanced at the split point", () => {
  const twoHeads: SystemDemandInput = {
    sprinklers: [
      {
        label: "Living room A",
        kFactor: 4.9,
        minFlowGpm: 13,
        branch: [{ material: "cpvc", nominalSize: "3/4", lengthFt: 25, fittings: [{ label: "Listed tee", equivalentLengthFt: 3 }] }],
      },
      { label: "Living room B", kFactor: 4.9, minFlowGpm: 13, branch: [{ material: "cpvc", nominalSize: "3/4", lengthFt: 8 }] },
    ],
    supplyPath: [{ material: "cpvc", nominalSize: "1", lengthFt: 70, elevationChangeFt: 9 }],
    deviceLosses: [{ label: "Water meter", lossPsi: 5 }],
  };

  it("the farther sprinkler governs; the nearer one flows more until both branches need the same split pressure", () => {
    const r = systemDemand(twoHeads);
    const dBranch = pipeInsideDiameterIn("cpvc", "3/4");
    const nodeA = (13 / 4.9) ** 2 + hw(13, 150, dBranch) * 28;
    const b = r.sprinklers.find((s) => s.label === "Living room B")!;
    expect(b.flowGpm).toBeGreaterThan(13);
    // branch B at its balanced flow needs exactly the split-point pressure set by branch A
    expect(b.pressurePsi + hw(b.flowGpm, 150, dBranch) * 8).toBeCloseTo(nodeA, 6);
    expect(r.flowGpm).toBeCloseTo(13 + b.flowGpm, 12);
    const dMain = pipeInsideDiameterIn("cpvc", "1");
    expect(r.pressurePsi).toBeCloseTo(nodeA + hw(r.flowGpm, 150, dMain) * 70 + 9 * PSI_PER_FT + 5, 6);
  });
});

describe("properties (fast-check)", () => {
  const design = fc.record({
    k: fc.double({ min: 3, max: 8, noNaN: true }),
    q: fc.double({ min: 8, max: 30, noNaN: true }),
    length: fc.double({ min: 5, max: 200, noNaN: true }),
    rise: fc.double({ min: -30, max: 40, noNaN: true }),
    meter: fc.double({ min: 0, max: 15, noNaN: true }),
  });
  const build = (d: { k: number; q: number; length: number; rise: number; meter: number }): SystemDemandInput => ({
    sprinklers: [{ kFactor: d.k, minFlowGpm: d.q }],
    supplyPath: [{ material: "copper-m", nominalSize: "1", lengthFt: d.length, elevationChangeFt: d.rise, fittings: [{ kind: "elbow-90", count: 3 }] }],
    deviceLosses: [{ label: "Meter", lossPsi: d.meter }],
  });

  // Strictly rising unless a steep drop held the requirement at 0 psi (then it never falls).
  const rises = (low: ReturnType<typeof systemDemand>, high: ReturnType<typeof systemDemand>) =>
    low.clampedAtZero ? high.pressurePsi >= low.pressurePsi : high.pressurePsi > low.pressurePsi;

  it("demand rises with elevation", () => {
    fc.assert(
      fc.property(design, fc.double({ min: 0.5, max: 20, noNaN: true }), (d, more) =>
        rises(systemDemand(build(d)), systemDemand(build({ ...d, rise: d.rise + more }))),
      ),
    );
  });
  it("demand rises with elevation by 0.433 psi per foot when nothing is held at zero", () => {
    fc.assert(
      fc.property(design, fc.double({ min: 0.5, max: 20, noNaN: true }), (d, more) => {
        const low = systemDemand(build({ ...d, rise: Math.abs(d.rise) }));
        const high = systemDemand(build({ ...d, rise: Math.abs(d.rise) + more }));
        expect(high.pressurePsi - low.pressurePsi).toBeCloseTo(more * (62.37 / 144), 9);
      }),
    );
  });
  it("demand rises with the sprinkler's flow (never falls while NFPA 13D's 7 psi floor holds the flow at K√7)", () => {
    fc.assert(
      fc.property(design, fc.double({ min: 0.5, max: 10, noNaN: true }), (d, more) => {
        const low = systemDemand(build(d));
        const high = systemDemand(build({ ...d, q: d.q + more }));
        const floorFlow = d.k * Math.sqrt(7);
        if (d.q + more <= floorFlow) return high.pressurePsi === low.pressurePsi && low.sprinklers[0]!.pressurePsi === 7;
        return rises(low, high);
      }),
    );
  });
  it("never returns a negative or non-finite pressure, even downhill", () => {
    fc.assert(
      fc.property(design, fc.double({ min: -400, max: 0, noNaN: true }), (d, drop) => {
        const r = systemDemand(build({ ...d, rise: drop }));
        return r.pressurePsi >= 0 && Number.isFinite(r.pressurePsi) && r.steps.every((s) => s.pressureRequiredPsi >= 0);
      }),
    );
  });
  it("US and SI agree after conversion (mathjs)", () => {
    fc.assert(
      fc.property(design, (d) => {
        const us = systemDemand(build(d));
        const si = systemDemandSi({
          units: "si",
          sprinklers: [{ k: kFactorUsToSi(d.k), minFlow: unit(d.q, "gal/min").toNumber("L/min") }],
          segments: [
            {
              material: "copper-m",
              nominalSize: "1",
              length: unit(d.length, "ft").toNumber("m"),
              elevation: unit(d.rise, "ft").toNumber("m"),
              elbows: 3,
            },
          ],
          devices: [{ label: "Meter", loss: unit(d.meter, "psi").toNumber("bar") }],
        });
        expect(unit(si.pressureBar, "bar").toNumber("psi")).toBeCloseTo(us.pressurePsi, 6);
        expect(unit(si.flowLpm, "L/min").toNumber("gal/min")).toBeCloseTo(us.flowGpm, 9);
      }),
    );
  });
});

describe("bad input names the field", () => {
  it.each([
    [{ ...oneHead, sprinklers: [] }, "sprinklers"],
    [{ ...oneHead, sprinklers: [{ kFactor: 0, minFlowGpm: 13 }] }, "sprinklers[0].kFactor"],
    [{ ...oneHead, sprinklers: [{ kFactor: 4.9, minFlowGpm: Number.NaN }] }, "sprinklers[0].minFlowGpm"],
    [{ ...oneHead, supplyPath: [{ material: "copper-l" as const, nominalSize: "1" as const, lengthFt: -1 }] }, "supplyPath[0].lengthFt"],
    [{ ...oneHead, supplyPath: [{ material: "cpvc" as const, nominalSize: "1/2" as const, lengthFt: 10 }] }, "supplyPath[0].nominalSize"],
    [
      { ...oneHead, supplyPath: [{ material: "pex" as const, nominalSize: "1" as const, lengthFt: 10, fittings: [{ kind: "elbow-90" as const }] }] },
      "supplyPath[0].fittings[0].equivalentLengthFt",
    ],
    [{ ...oneHead, deviceLosses: [{ label: "Meter", lossPsi: -2 }] }, "deviceLosses[0].lossPsi"],
  ])("(%#)", (input, field) => {
    expect(() => systemDemand(input as SystemDemandInput)).toThrowError(HydraulicsInputError);
    expect(() => systemDemand(input as SystemDemandInput)).toThrowError(expect.objectContaining({ field }));
  });
  it("the SI calculator reports its own field names", () => {
    expect(() =>
      systemDemandSi({ units: "si", sprinklers: [{ k: 70, minFlow: 50 }], segments: [{ material: "pex", nominalSize: "1", length: -3 }] }),
    ).toThrowError(expect.objectContaining({ field: "segments[0].length" }));
  });
});
