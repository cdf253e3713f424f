// Calculator reports (what the pages and the PDF show) agree with the library functions they wrap,
// in both unit systems, and name the form field at fault.
import { readFileSync, readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { unit } from "mathjs";
import {
  CALCULATOR_IDS,
  HydraulicsInputError,
  calculatorReport,
  convertInputUnits,
  flowTestAvailablePsi,
  frictionLossPsiPerFt,
  inputFromPreset,
  pipeInsideDiameterIn,
  roundForDisplay,
  sprinklerFlowGpm,
  systemDemand,
} from "../../../lib/hydraulics";

const value = (r: ReturnType<typeof calculatorReport>, label: string) => r.results.find((x) => x.label.startsWith(label))!.value;

describe("every calculator's default report", () => {
  it.each(CALCULATOR_IDS)("%s has a formula, steps, a finite result and the caution", (id) => {
    const r = calculatorReport(id, inputFromPreset(id));
    expect(r.formula.length).toBeGreaterThan(0);
    expect(r.steps.length).toBeGreaterThan(0);
    expect(r.results.length).toBeGreaterThan(0);
    for (const res of r.results) expect(Number.isFinite(res.value)).toBe(true);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
    expect(r.caution).toMatch(/not a stamped design/);
    expect(r.notes.length).toBeGreaterThan(0);
  });
});

describe("reports match the library", () => {
  it("sprinkler flow: Q = K√P (NFPA 13) for the lesson preset K 4.9 at 10 psi", () => {
    const r = calculatorReport("sprinkler-flow", inputFromPreset("sprinkler-flow", { kFactor: 4.9, pressurePsi: 10 }));
    expect(value(r, "Flow")).toBeCloseTo(sprinklerFlowGpm(4.9, 10), 12);
    expect(r.results[0]!.text).toBe("15.5 gpm");
  });
  it("sprinkler pressure for a flow is shown rounded up", () => {
    const r = calculatorReport("sprinkler-flow", inputFromPreset("sprinkler-flow", { kFactor: 4.9, flowGpm: 13 }));
    expect(r.results[0]!.text).toBe(`${roundForDisplay((13 / 4.9) ** 2, "psi", "up").toFixed(1)} psi`);
  });
  it("friction loss equals the Hazen-Williams 4.52 form × length for 1 in Type L (ASTM B88 ID 1.025 in)", () => {
    const r = calculatorReport("friction-loss", { units: "us", material: "copper-l", nominalSize: "1", flow: 26, length: 25 });
    expect(value(r, "Friction loss")).toBeCloseTo(frictionLossPsiPerFt(26, 150, 1.025) * 25, 12);
  });
  it("friction loss in SI agrees with US after conversion (mathjs), within the constants' 0.1%", () => {
    const us = calculatorReport("friction-loss", { units: "us", material: "steel-40", nominalSize: "1", flow: 20, length: 100, elbows: 3 });
    const si = calculatorReport("friction-loss", {
      units: "si",
      material: "steel-40",
      nominalSize: "1",
      flow: unit(20, "gal/min").toNumber("L/min"),
      length: unit(100, "ft").toNumber("m"),
      elbows: 3,
    });
    const usPsi = value(us, "Friction loss");
    expect(Math.abs(unit(value(si, "Friction loss"), "bar").toNumber("psi") - usPsi) / usPsi).toBeLessThan(0.002);
  });
  it("flow test available pressure equals NFPA 291's formula", () => {
    const r = calculatorReport("flow-test", inputFromPreset("flow-test", { staticPsi: 62, residualPsi: 48, testFlowGpm: 850, demandFlowGpm: 26 }));
    expect(value(r, "Pressure available")).toBeCloseTo(flowTestAvailablePsi({ staticPsi: 62, residualPsi: 48, testFlowGpm: 850 }, 26).pressurePsi, 12);
    expect(r.chart?.supply.length).toBeGreaterThan(2);
  });
  it("flow test with a demand pressure gives pass/short", () => {
    const base = { units: "us", staticPressure: 62, residualPressure: 48, testFlow: 850, demandFlow: 26 };
    expect(calculatorReport("flow-test", { ...base, demandPressure: 45 }).verdict?.result).toBe("pass");
    const short = calculatorReport("flow-test", { ...base, demandPressure: 70 });
    expect(short.verdict?.result).toBe("short");
    expect(short.results.find((x) => x.label === "Shortfall")!.value).toBeGreaterThan(0);
  });
  it("system demand equals systemDemand() on the same example", () => {
    const input = inputFromPreset("system-demand");
    const r = calculatorReport("system-demand", input);
    const direct = systemDemand({
      sprinklers: input.sprinklers.map((s) => ({
        label: s.label,
        kFactor: s.k,
        minFlowGpm: s.minFlow,
        coverageAreaSqFt: s.coverageArea,
        branch: s.branch
          ? [
              {
                material: s.branch.material,
                nominalSize: s.branch.nominalSize,
                lengthFt: s.branch.length,
                fittings: s.branch.listedFittingsLength ? [{ label: "listed", equivalentLengthFt: s.branch.listedFittingsLength }] : [],
              },
            ]
          : undefined,
      })),
      supplyPath: input.segments.map((s) => ({
        material: s.material,
        nominalSize: s.nominalSize,
        lengthFt: s.length,
        elevationChangeFt: s.elevation ?? 0,
        fittings: [
          ...(s.elbows ? [{ kind: "elbow-90" as const, count: s.elbows }] : []),
          ...(s.listedFittingsLength ? [{ label: "listed", equivalentLengthFt: s.listedFittingsLength }] : []),
        ],
      })),
      deviceLosses: (input.devices ?? []).map((d) => ({ label: d.label ?? "", lossPsi: d.loss })),
    });
    expect(value(r, "Pressure needed")).toBeCloseTo(direct.pressurePsi, 12);
    expect(value(r, "Flow needed")).toBeCloseTo(direct.flowGpm, 12);
    expect(r.verdict).toBeDefined();
    expect(r.chart?.demand?.pressure).toBeCloseTo(direct.pressurePsi, 12);
  });
  it("room coverage in SI gives the same count as in US for the same room (mathjs conversion)", () => {
    const us = calculatorReport("room-coverage", { units: "us", length: 30, width: 14, maxSpacing: 16, maxArea: 256 });
    const si = calculatorReport("room-coverage", {
      units: "si",
      length: unit(30, "ft").toNumber("m"),
      width: unit(14, "ft").toNumber("m"),
      maxSpacing: unit(16, "ft").toNumber("m"),
      maxArea: unit(256, "ft^2").toNumber("m^2"),
    });
    expect(value(si, "Sprinklers")).toBe(value(us, "Sprinklers"));
  });
  it("stored water rounds the tank up (never understates it)", () => {
    const r = calculatorReport("stored-water", { units: "us", flow: 26.04, duration: 10 });
    expect(r.results[0]!.text).toBe("261 gal");
  });
});

describe("margins never read larger than the difference of the figures shown", () => {
  it("flow test: 61.9 psi available (61.98 rounded down) against 60.1 needed (60.05) shows a 1.8 psi margin, not 1.9", () => {
    // at zero flow the available pressure is the static pressure (NFPA 291 formula)
    const r = calculatorReport("flow-test", { units: "us", staticPressure: 61.98, residualPressure: 50, testFlow: 1000, demandFlow: 0, demandPressure: 60.05 });
    expect(r.results.find((x) => x.label.startsWith("Pressure available"))!.text).toBe("61.9 psi");
    expect(r.results.find((x) => x.label === "Margin")!.text).toBe("1.8 psi");
    expect(r.verdict?.text).toContain("1.8 psi");
  });
  const shownNumber = (text: string) => Number(text.split(" ")[0]);
  it("system demand: margin = shown supply − shown demand for the default example", () => {
    const r = calculatorReport("system-demand", inputFromPreset("system-demand"));
    const supply = shownNumber(r.results.find((x) => x.label.startsWith("Pressure the supply offers"))!.text);
    const demand = shownNumber(r.results.find((x) => x.label.startsWith("Pressure needed"))!.text);
    const margin = shownNumber(r.results.find((x) => x.label === "Margin")!.text);
    expect(margin).toBeCloseTo(supply - demand, 9);
  });
  it("for any flow test and demand, a shown margin ≤ shown supply − shown demand, and pass only when the shown supply covers it (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 120, noNaN: true }),
        fc.double({ min: 0.05, max: 0.9, noNaN: true }),
        fc.double({ min: 5, max: 60, noNaN: true }),
        fc.double({ min: 5, max: 120, noNaN: true }),
        (ps, drop, qd, pd) => {
          const r = calculatorReport("flow-test", { units: "us", staticPressure: ps, residualPressure: ps * (1 - drop), testFlow: 1000, demandFlow: qd, demandPressure: pd });
          const available = shownNumber(r.results.find((x) => x.label.startsWith("Pressure available"))!.text);
          const needed = roundForDisplay(pd, "psi", "up");
          const margin = r.results.find((x) => x.label === "Margin");
          if (margin) {
            expect(shownNumber(margin.text)).toBeLessThanOrEqual(available - needed + 1e-9);
            expect(r.verdict?.result).toBe("pass");
          } else {
            expect(r.verdict?.result).toBe("short");
          }
        },
      ),
    );
  });
});

describe("chart range shows the demand point", () => {
  it("the flow axis runs to 1.5 × the demand flow, not to the hydrant's 2,000+ gpm", () => {
    const r = calculatorReport("system-demand", inputFromPreset("system-demand"));
    const chart = r.chart!;
    expect(chart.demand!.flow).toBeGreaterThan(0.5 * chart.flowMax);
    expect(chart.flowMax).toBeCloseTo(1.5 * chart.demand!.flow, 9);
    expect(chart.supply.at(-1)!.flow).toBeCloseTo(chart.flowMax, 9);
  });
});

describe("the default system-demand example", () => {
  it("runs its ~27 gpm through a meter rated for it (1 in meter: AWWA C700 safe maximum operating capacity 50 gpm; 5/8 × 3/4 in: 20 gpm — from memory, verify)", () => {
    const r = calculatorReport("system-demand", inputFromPreset("system-demand"));
    const flow = r.results.find((x) => x.label.startsWith("Flow needed"))!.value;
    expect(flow).toBeGreaterThan(20); // more than a 5/8 × 3/4 in meter's rating
    const meter = inputFromPreset("system-demand").devices!.find((d) => /meter/i.test(d.label ?? ""))!;
    expect(meter.label).toMatch(/1 in/);
    expect(flow).toBeLessThan(50);
    // loss grows with flow squared: at most 15 psi × (Q ÷ 50)² at the C700 rating point (from memory — verify)
    expect(meter.loss).toBeGreaterThanOrEqual(15 * (flow / 50) ** 2);
  });
  it("shows velocity beside friction on every pipe step", () => {
    const r = calculatorReport("system-demand", inputFromPreset("system-demand"));
    const pipeSteps = r.steps.filter((s) => /in, \d/.test(s.label));
    expect(pipeSteps.length).toBeGreaterThan(0);
    for (const s of pipeSteps) expect(s.work).toMatch(/velocity \d+(\.\d+)? ft\/s/);
  });
});

describe("SI reports speak SI", () => {
  it.each(CALCULATOR_IDS)("no step or result of the SI %s report shows psi or gpm", (id) => {
    const si = calculatorReport(id, convertInputUnits(inputFromPreset(id), "us", "si"));
    for (const s of si.steps) expect(`${s.label} ${s.work} ${s.text}`).not.toMatch(/\b(psi|gpm)\b/);
    for (const r of si.results) expect(`${r.label} ${r.text}`).not.toMatch(/\b(psi|gpm)\b/);
  });
});

describe("errors name the form field", () => {
  it.each([
    ["flow-test", { units: "us", staticPressure: 50, residualPressure: 60, testFlow: 500, demandFlow: 20 }, "residualPressure"],
    ["flow-test", { units: "us", staticPressure: 50, residualPressure: 30, testFlow: "", demandFlow: 20 }, "testFlow"],
    ["sprinkler-flow", { units: "us", solveFor: "flow", k: "abc", pressure: 10 }, "k"],
    ["friction-loss", { units: "us", material: "pex", nominalSize: "1", flow: 20, length: 10, elbows: 2 }, "elbows"],
    ["friction-loss", { units: "us", material: "cpvc", nominalSize: "1/2", flow: 20, length: 10 }, "nominalSize"],
    ["room-coverage", { units: "si", length: -3, width: 4, maxSpacing: 4.8, maxArea: 20 }, "length"],
    ["elevation", { units: "us", height: -2 }, "height"],
  ] as const)("%s → %s", (id, input, field) => {
    expect(() => calculatorReport(id, input)).toThrowError(HydraulicsInputError);
    expect(() => calculatorReport(id, input)).toThrowError(expect.objectContaining({ field }));
  });
  it("system demand names nested fields", () => {
    const input = inputFromPreset("system-demand");
    input.segments[1] = { ...input.segments[1]!, material: "pex", elbows: 2 };
    expect(() => calculatorReport("system-demand", input)).toThrowError(expect.objectContaining({ field: "segments[1].elbows" }));
    const bad = inputFromPreset("system-demand");
    bad.sprinklers[0]!.k = 0;
    expect(() => calculatorReport("system-demand", bad)).toThrowError(expect.objectContaining({ field: "sprinklers[0].k" }));
    const badSupply = inputFromPreset("system-demand");
    badSupply.supply = { staticPressure: 40, residualPressure: 45, testFlow: 500 };
    expect(() => calculatorReport("system-demand", badSupply)).toThrowError(expect.objectContaining({ field: "supply.residualPressure" }));
  });
});

describe("unit switch conversion", () => {
  it("converts each quantity by its kind (mathjs) and leaves text it cannot read", () => {
    const si = convertInputUnits({ units: "us", staticPressure: "60", testFlow: "1000", demandFlow: "", height: "abc" }, "us", "si");
    expect(si.units).toBe("si");
    expect(Number(si.staticPressure)).toBeCloseTo(unit(60, "psi").toNumber("bar"), 3);
    expect(Number(si.testFlow)).toBeCloseTo(unit(1000, "gal/min").toNumber("L/min"), 0);
    expect(si.demandFlow).toBe("");
    expect(si.height).toBe("abc");
  });
  it("round-trips to 4 significant figures (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 5000, noNaN: true }), (v) => {
        const back = convertInputUnits(convertInputUnits({ units: "us", length: v, k: v }, "us", "si"), "si", "us");
        return Math.abs(back.length - v) / v < 2e-3 && Math.abs(back.k - v) / v < 2e-3;
      }),
    );
  });
  it("walks nested lists (system demand)", () => {
    const si = convertInputUnits(inputFromPreset("system-demand"), "us", "si");
    expect(si.segments[0]!.length).toBeCloseTo(unit(55, "ft").toNumber("m"), 2);
    expect(si.devices![0]!.loss).toBeCloseTo(unit(inputFromPreset("system-demand").devices![0]!.loss, "psi").toNumber("bar"), 3);
    expect(si.segments[0]!.material).toBe("copper-k");
  });
});

// Every <Calculator … preset={{…}} /> in the lessons must compute (the embed shows the lesson's worked example).
function mdxFiles(dir: string): string[] {
  let out: string[] = [];
  let entries: string[] = [];
  try {
    entries = readdirSync(dir);
  } catch {
    return out;
  }
  for (const e of entries) {
    const p = path.join(dir, e);
    if (statSync(p).isDirectory()) out = out.concat(mdxFiles(p));
    else if (p.endsWith(".mdx")) out.push(p);
  }
  return out;
}
const embeds = mdxFiles(path.resolve(__dirname, "../../../content")).flatMap((file) =>
  [...readFileSync(file, "utf8").matchAll(/<Calculator\s+id="([a-z-]+)"(?:\s+preset=\{(\{[^}]*\})\})?\s*\/>/g)].map((m) => ({
    file: path.basename(file),
    id: m[1]!,
    preset: m[2] ? (new Function(`return (${m[2]});`)() as Record<string, unknown>) : undefined,
  })),
);

describe.skipIf(embeds.length === 0)("lesson embeds compute", () => {
  it.each(embeds.map((e) => [e.file, e.id, e.preset] as const))("%s: %s %j", (_file, id, preset) => {
    expect(CALCULATOR_IDS as readonly string[]).toContain(id);
    const r = calculatorReport(id as (typeof CALCULATOR_IDS)[number], inputFromPreset(id as (typeof CALCULATOR_IDS)[number], preset));
    expect(Number.isFinite(r.results[0]!.value)).toBe(true);
  });
});

// keep the table's ID in view: the report shows the ASTM B88 ID for 1 in Type L
it("friction report's first step shows the pipe standard's ID (ASTM B88, 1 in Type L = 1.025 in)", () => {
  const r = calculatorReport("friction-loss", { units: "us", material: "copper-l", nominalSize: "1", flow: 26, length: 25 });
  expect(r.steps[0]!.text).toBe(`${pipeInsideDiameterIn("copper-l", "1").toFixed(3)} in`);
  expect(r.steps[0]!.label).toMatch(/ASTM B88/);
});
