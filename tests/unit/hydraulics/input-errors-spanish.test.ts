// Calculator pages in Spanish: the reasons lib/hydraulics raises for a bad input, the system-demand
// example's labels and the pipe materials in the forms' dropdowns. Outside references: the library's
// documented input limits (lib/hydraulics/errors.ts INPUT_LIMITS: K-factor at most 100, 10,000 ft of
// elevation), the sentence the English form has always shown ("<Field> <reason>."), and the Spanish
// catalog as written in messages/es. Numbers must come through unchanged in both languages.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { EXAMPLE_SYSTEM_DEMAND, HydraulicsInputError, PIPE_DATA, PIPE_MATERIALS, INPUT_FIELD_NAMES, INPUT_LIMITS, calculatorFormSchema, fieldLabel, inputErrorSentence, inputFromPreset, type ReportT } from "../../../lib/hydraulics";
import { catalogTranslator } from "../../../lib/i18n/translator";
import { loadMessages } from "../../../lib/i18n/messages";
import { calculatorWords, systemDemandFormValues, type LabelT } from "../../../components/tools/form-values";
import { useMaterialOptions } from "../../../components/tools/friction-loss";
import { summaryPdfResponse } from "../../../lib/tools/summary-pdf";

const esT = catalogTranslator("es", "calcReports") as unknown as ReportT;
const enT = catalogTranslator("en", "calcReports") as unknown as ReportT;
const es = loadMessages("es");

/** the first message the form's resolver gives for these inputs */
function formError(id: "sprinkler-flow" | "friction-loss" | "flow-test" | "elevation", input: Record<string, unknown>, t?: ReportT): string {
  const r = calculatorFormSchema(id, t).safeParse({ units: "us", ...input });
  expect(r.success).toBe(false);
  return r.error!.issues[0]!.message;
}

describe("the library's reasons on a calculator form", () => {
  it("a K-factor above the library's limit: the English sentence as before, the Spanish one from the catalog, same numbers", () => {
    expect(INPUT_LIMITS.kFactorUs).toBe(100);
    const input = { solveFor: "flow", k: 1000, pressure: 10 };
    expect(formError("sprinkler-flow", input)).toBe("K-factor must be at most 100, got 1000.");
    expect(formError("sprinkler-flow", input, enT)).toBe("K-factor must be at most 100, got 1000.");
    expect(formError("sprinkler-flow", input, esT)).toBe("Factor K: debe ser como máximo 100; se recibió 1000.");
  });

  it("a plastic pipe with chart fittings names the material in the reader's language", () => {
    const input = { material: "cpvc", nominalSize: "1", flow: 20, length: 50, elbows: 2 };
    const en = formError("friction-loss", input);
    expect(en).toMatch(/^CPVC sprinkler pipe, SDR 13\.5 fittings use the pipe maker's listed equivalent lengths/);
    expect(formError("friction-loss", input, enT)).toBe(en);
    const spanish = formError("friction-loss", input, esT);
    expect(spanish).toContain((es.calcReports as { material: Record<string, string> }).material.cpvc);
    expect(spanish).toMatch(/^Las conexiones de Tubo de CPVC para rociadores, SDR 13\.5 usan/);
  });

  it("every reason the library words has a Spanish sentence; unknown reasons pass through", () => {
    const cases: [string, string, RegExp][] = [
      ["pressure", "must be greater than 0, got -7", /^Presión: debe ser mayor que 0; se recibió -7\.$/],
      ["height", "must not be negative, got -4", /^Altura: no puede ser negativo; se recibió -4\.$/],
      ["cFactor", "must be between 1 and 200, got 500", /^Factor C: debe estar entre 1 y 200; se recibió 500\.$/],
      ["elbows", "must be a whole number, got 1.5", /^Codos: debe ser un número entero; se recibió 1\.5\.$/],
      ["flow", "must be a finite number, got missing", /^Caudal: falta el número\.$/],
      ["nominalSize", "for CPVC sprinkler pipe, SDR 13.5 must be one of 3/4, 1", /^Diámetro nominal: para Tubo de CPVC para rociadores, SDR 13\.5 debe ser uno de 3\/4, 1\.$/],
      ["residualTarget", "must be below the static pressure", /^Residual para el caudal nominal: debe ser menor que la presión estática\.$/],
      ["height", "is beyond the range this calculator handles", /^Altura: está fuera del rango que maneja esta calculadora\.$/],
      ["elbows", "the chart gives no 90° standard elbow value at 3/4 in: enter the maker's equivalent length", /^Codos: la tabla no da valor para codo estándar de 90° de 3\/4 in/],
    ];
    for (const [field, reason, spanish] of cases) {
      const e = new HydraulicsInputError(field, reason);
      expect(inputErrorSentence(e, esT)).toMatch(spanish);
      expect(inputErrorSentence(e, enT)).toBe(`${fieldLabel(field)} ${reason}.`);
      expect(inputErrorSentence(e)).toBe(`${fieldLabel(field)} ${reason}.`);
    }
    expect(inputErrorSentence(new HydraulicsInputError("flow", "something new"), esT)).toBe("Flow something new.");
  });

  it("the English catalog names every field exactly as the English form always did", () => {
    const en = loadMessages("en").calcReports as { inputFields: Record<string, string> };
    for (const name of INPUT_FIELD_NAMES) expect(en.inputFields[name], name).toBe(fieldLabel(name));
  });

  it("the PDF summary's refusal is in Spanish for a Spanish reader and unchanged in English", async () => {
    expect(INPUT_LIMITS.elevationFt).toBe(10_000);
    const req = () => new Request("http://x/api/tools/summary", { method: "POST", body: JSON.stringify({ id: "elevation", input: { units: "us", height: 20_000 } }) });
    const enRes = await summaryPdfResponse(req(), { language: "en" });
    expect(enRes.status).toBe(400);
    expect(((await enRes.json()) as { error: string }).error).toBe("height: is beyond the range this calculator handles");
    const esRes = await summaryPdfResponse(req(), { language: "es" });
    expect(esRes.status).toBe(400);
    expect(((await esRes.json()) as { error: string }).error).toBe("Altura: está fuera del rango que maneja esta calculadora.");
  });
});

describe("the system-demand form in Spanish", () => {
  const toolsT = (lang: "en" | "es") => catalogTranslator(lang, "tools") as unknown as LabelT;
  const labels = (v: ReturnType<typeof systemDemandFormValues>) => [
    ...v.sprinklers.flatMap((s) => [s.label, s.branch.label]),
    ...v.segments.map((s) => s.label),
    ...v.devices.map((d) => d.label),
  ];

  it("shows the example's labels from the Spanish catalog, the English ones unchanged, the figures the same", () => {
    const input = inputFromPreset("system-demand");
    const english = systemDemandFormValues(input);
    expect(labels(english)).toEqual([
      ...EXAMPLE_SYSTEM_DEMAND.sprinklers.flatMap((s) => [s.label, s.branch!.label]),
      ...EXAMPLE_SYSTEM_DEMAND.segments.map((s) => s.label),
      ...EXAMPLE_SYSTEM_DEMAND.devices!.map((d) => d.label),
    ]);
    expect(systemDemandFormValues(input, toolsT("en"))).toEqual(english);
    const spanish = systemDemandFormValues(input, toolsT("es"));
    const ex = (es.tools as { demandExample: Record<string, string> }).demandExample;
    expect(labels(spanish)).toEqual([ex.farSprinkler, ex.farBranch, ex.nearSprinkler, ex.nearBranch, ex.waterService, ex.riserMain, ex.meter, ex.backflow]);
    expect(labels(spanish).some((l) => labels(english).includes(l))).toBe(false);
    // only the words change
    const figures = (v: typeof english) => JSON.stringify(v, (k, x) => (k === "label" ? undefined : x));
    expect(figures(spanish)).toBe(figures(english));
  });

  it("names default runs and sprinklers in Spanish; a label someone wrote stays as written", () => {
    const input = { units: "us" as const, sprinklers: [{ k: 4.9, minFlow: 13 }], segments: [{ label: "Tramo del sótano", material: "cpvc" as const, nominalSize: "1" as const, length: 10 }, { material: "cpvc" as const, nominalSize: "1" as const, length: 5 }] };
    const v = systemDemandFormValues(input as never, toolsT("es"));
    expect(v.sprinklers[0]!.label).toBe("Rociador A");
    expect(v.sprinklers[0]!.branch.label).toBe("Ramal A");
    expect(v.segments.map((s) => s.label)).toEqual(["Tramo del sótano", "Tramo de tubería 2"]);
    expect(systemDemandFormValues(input as never).segments[1]!.label).toBe("Pipe run 2");
  });

  it("lists the pipe materials in the reader's language", () => {
    // the names come with the page (components/tools/initial-state.ts: calculatorWords of the reader's calcReports)
    function Options({ tr }: { tr: ReportT }) {
      return createElement("ul", null, ...useMaterialOptions(calculatorWords(tr)).map((o) => createElement("li", { key: o.value }, o.label)));
    }
    const render = (locale: "en" | "es") => renderToStaticMarkup(createElement(Options, { tr: locale === "es" ? esT : enT }));
    const materials = (es.calcReports as { material: Record<string, string> }).material;
    const spanish = render("es");
    for (const name of Object.values(materials)) expect(spanish).toContain(name);
    expect(spanish).not.toContain("Copper tube, Type L");
    // English: the names the dropdown always showed (the library's pipe data labels)
    const english = render("en");
    for (const m of PIPE_MATERIALS) expect(english).toContain(`<li>${PIPE_DATA[m].label}</li>`);
  });
});
