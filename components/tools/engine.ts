/**
 * The calculators' working part in the browser: the input schemas (zod), the form resolver and the
 * reports from lib/hydraulics. Loaded on its own (./engine-loader.ts) once the page is idle or a
 * form is first edited, so it is not parsed, run or hydrated with the page; the first result
 * comes worked out from the server (./initial-state.ts) with the same library.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import type { FieldValues, Resolver } from "react-hook-form";
import { createTranslator } from "use-intl/core";
import { FORMATS } from "@/lib/i18n/browser";
import { calculatorFormSchema, calculatorReport, parseCalculatorInput, type CalculatorId, type CalculatorReport, type ReportT } from "@/lib/hydraulics";

/**
 * The calcReports translator for the browser, made from the catalog that loads with this code
 * (./engine-loader.ts) with the locale, time zone and formats the page's own translators use.
 */
export function reportTranslator(locale: string, timeZone: string | undefined, messages: Record<string, unknown>): ReportT {
  return createTranslator({ locale, timeZone, formats: FORMATS, messages: { calcReports: messages } as never, namespace: "calcReports" as never }) as unknown as ReportT;
}

const resolvers = new Map<CalculatorId, WeakMap<ReportT, Resolver<FieldValues>>>();

/** the form's resolver for one calculator in one language, built once */
export function formResolver(id: CalculatorId, t: ReportT): Resolver<FieldValues> {
  let byT = resolvers.get(id);
  if (!byT) resolvers.set(id, (byT = new WeakMap()));
  let r = byT.get(t);
  if (!r) byT.set(t, (r = zodResolver(calculatorFormSchema(id, t) as never) as unknown as Resolver<FieldValues>));
  return r;
}

/** the report for the form values (as JSON), or nulls when they do not make a valid input */
export function formReport(id: CalculatorId, valuesJson: string, t: ReportT): { report: CalculatorReport | null; input: unknown } {
  try {
    const parsed = parseCalculatorInput(id, JSON.parse(valuesJson));
    return { report: calculatorReport(id, parsed, t), input: parsed as unknown };
  } catch {
    return { report: null, input: null };
  }
}
