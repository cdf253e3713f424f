import { getTranslations } from "next-intl/server";
import { inputFromPreset, type CalculatorId, type ReportT } from "@/lib/hydraulics";
import { formReport } from "./engine";
import { calculatorWords, flatFormValues, systemDemandFormValues } from "./form-values";
import type { InitialCalculator } from "./types";

/**
 * A calculator's first state, worked out on the server: the form values of the preset (or the
 * calculator's example) and the report for exactly those values, made as the browser makes every
 * later one (the form values as JSON → the calculator's schema → lib/hydraulics, words from the
 * reader's calcReports catalog). The page shows it as HTML; the browser recomputes only once the
 * inputs change. With them, the few words of the calcReports catalog the form shows before its
 * engine has loaded (the catalog itself travels with the engine).
 */
export async function initialCalculator(id: CalculatorId, preset?: Record<string, unknown>): Promise<InitialCalculator> {
  const [t, tr] = await Promise.all([getTranslations("tools"), getTranslations("calcReports")]);
  const values =
    id === "system-demand" ? systemDemandFormValues(inputFromPreset("system-demand", preset), t) : flatFormValues(id, inputFromPreset(id, preset));
  const { report, input } = formReport(id, JSON.stringify(values), tr as unknown as ReportT);
  return { values, report, input, words: calculatorWords(tr as unknown as ReportT) };
}
