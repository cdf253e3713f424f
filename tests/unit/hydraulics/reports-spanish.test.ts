// Calculator reports in Spanish. Outside references: the English report of the same input (its
// figures come from lib/hydraulics, not from the words) and the message catalogs as written in
// messages/<lang>/calcReports.json. A Spanish report must carry the same figures, units, citations
// and "from memory" flags, and its words must be the Spanish catalog's.
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { CALCULATOR_IDS, PIPE_MATERIALS, calculatorReport, convertInputUnits, inputFromPreset, type CalculatorId, type CalculatorReport } from "../../../lib/hydraulics";
import { catalogTranslator } from "../../../lib/i18n/translator";

type Tree = { [key: string]: string | Tree };
const readCatalog = (lang: string) => JSON.parse(readFileSync(path.join(process.cwd(), "messages", lang, "calcReports.json"), "utf8")) as Tree;
const flat = (tree: Tree, prefix = ""): [string, string][] =>
  Object.entries(tree).flatMap(([k, v]) => (typeof v === "string" ? [[`${prefix}${k}`, v] as [string, string]] : flat(v, `${prefix}${k}.`)));
const EN = new Map(flat(readCatalog("en")));
const ES = new Map(flat(readCatalog("es")));
const es = (key: string) => ES.get(key)!;

// one input per calculator, in both unit systems, picked to reach the checks and the verdict
const INPUTS: Record<CalculatorId, Record<string, unknown>> = {
  "sprinkler-flow": { solveFor: "pressure", k: 4.9, flow: 10 },
  "friction-loss": { material: "steel-40", nominalSize: "1", flow: 20, length: 100, elbows: 3, teeBranches: 2 },
  elevation: {},
  "flow-test": { staticPressure: 62, residualPressure: 48, testFlow: 850, demandFlow: 26, demandPressure: 70 },
  "stored-water": {},
  "room-coverage": { length: 30, width: 14, maxSpacing: 16, maxArea: 256, minSpacing: 15.5 },
  "system-demand": { additionalFlow: 5 },
};
const HEADLINE: Record<CalculatorId, string> = {
  "sprinkler-flow": "sprinklerFlow.pressureNeededAt",
  "friction-loss": "frictionLoss.frictionLoss",
  elevation: "elevation.pressureToLift",
  "flow-test": "flowTest.available",
  "stored-water": "storedWater.waterToStore",
  "room-coverage": "roomCoverage.sprinklers",
  "system-demand": "systemDemand.pressureAtSource",
};

/** every piece of text in a report, in a fixed order */
const texts = (r: CalculatorReport) => [
  r.title,
  ...r.formula,
  ...r.inputs.flatMap((l) => [l.label, l.text]),
  ...r.steps.flatMap((s) => [s.label, s.work, s.text]),
  ...r.results.flatMap((l) => [l.label, l.text]),
  ...(r.verdict ? [r.verdict.text] : []),
  ...r.checks.map((c) => c.text),
  ...r.notes,
  r.caution,
];
const numbers = (r: CalculatorReport) => texts(r).flatMap((s) => s.match(/\d+(?:\.\d+)?/g) ?? []).sort();
const citations = (r: CalculatorReport) =>
  texts(r).flatMap((s) => s.match(/NFPA \d+D?|ASTM [A-Z]\d+|ASME B[\d.]+M|AWWA C\d+/g) ?? []).sort();
const count = (r: CalculatorReport, phrase: string) => texts(r).join("\n").split(phrase).length - 1;

const spanish = catalogTranslator("es", "calcReports");

/** builds the report in both languages and checks the Spanish one against the English one and the catalog */
function compareLanguages(id: CalculatorId, input: Record<string, unknown>) {
  const en = calculatorReport(id, input);
  const sp = calculatorReport(id, input, spanish);

    // the figures: values, units, chart, verdict and check outcomes are the library's, whatever the language
    expect(sp.results.map((x) => [x.value, x.unit])).toEqual(en.results.map((x) => [x.value, x.unit]));
    expect(sp.chart).toEqual(en.chart);
    expect(sp.verdict?.result).toEqual(en.verdict?.result);
    expect(sp.checks.map((c) => c.status)).toEqual(en.checks.map((c) => c.status));
    // every number written in the English report is written in the Spanish one, and no other
    expect(numbers(sp)).toEqual(numbers(en));
    // standards and their sections stay; each "from memory" flag stays (translated or in the library's English)
    expect(citations(sp)).toEqual(citations(en));
    // (elevation and room coverage cite no standard by name: their sources are tables and the listing)
    if (id !== "elevation" && id !== "room-coverage") expect(citations(en).length).toBeGreaterThan(0);
    expect(count(sp, "de memoria") + count(sp, "from memory")).toBe(count(en, "from memory"));

    // the words: where the English report shows a catalog message, the Spanish report shows that key's Spanish
    const enText = texts(en);
    const spText = texts(sp);
    expect(spText).toHaveLength(enText.length);
    const keyOf = new Map([...EN].filter(([, v]) => !v.includes("{")).map(([k, v]) => [v, k]));
    let matched = 0;
    enText.forEach((line, i) => {
      const key = keyOf.get(line);
      if (key === undefined) return;
      matched++;
      expect(spText[i], key).toBe(es(key));
    });
    expect(matched).toBeGreaterThan(3);
    expect(sp.title).toBe(es(`title.${id}`));
    expect(sp.caution).toBe(es("common.caution"));
    expect(sp.results[0]!.label).toBe(es(HEADLINE[id]));
    // no line of the Spanish report is an English catalog message that has a Spanish wording
    const englishOnly = new Set([...EN].filter(([k, v]) => ES.get(k) !== v).map(([, v]) => v));
    expect(spText.filter((line) => englishOnly.has(line))).toEqual([]);
}

describe.each(["us", "si"] as const)("Spanish calculator reports (%s units)", (units) => {
  it.each(CALCULATOR_IDS)("%s: same figures as the English report, words from the Spanish catalog", (id) => {
    const usInput = { ...inputFromPreset(id), ...INPUTS[id], units: "us" };
    compareLanguages(id, units === "si" ? { ...convertInputUnits(usInput, "us", "si"), units } : usInput);
  });
  it.each(PIPE_MATERIALS)("friction loss in %s: the pipe's sources and notes keep their figures in Spanish", (material) => {
    const usInput = { units: "us", material, nominalSize: "1", flow: 20, length: 60 };
    compareLanguages("friction-loss", units === "si" ? { ...convertInputUnits(usInput, "us", "si"), units } : usInput);
  });
});

describe("the calcReports translator", () => {
  it("builds the English report from the English catalog exactly as the default does", () => {
    const english = catalogTranslator("en", "calcReports");
    for (const id of CALCULATOR_IDS) {
      const input = { ...inputFromPreset(id), ...INPUTS[id] };
      expect(calculatorReport(id, input, english)).toEqual(calculatorReport(id, input));
    }
  });
  it("keeps the calculators' caution and titles the same as the tools catalog's, in both languages", () => {
    for (const lang of ["en", "es"]) {
      const tools = JSON.parse(readFileSync(path.join(process.cwd(), "messages", lang, "tools.json"), "utf8"));
      const reports = readCatalog(lang) as { common: Tree; title: Tree };
      expect(reports.common.caution).toBe(tools.caution);
      for (const id of CALCULATOR_IDS) expect(reports.title[id]).toBe(tools.info[id].title);
    }
  });
});
