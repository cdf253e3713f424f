/**
 * The words of the calculator reports come from the `calcReports` message catalog, in the reader's
 * language; the numbers, units and citations are put in as arguments, already formatted, so a
 * language never changes a figure. Builders take a translator for that namespace (the server's
 * getTranslations, the browser's made from the catalog that loads with the calculators' engine —
 * components/tools/engine-loader.ts — and the PDF's catalogTranslator(language, …)); without one
 * they speak English.
 */
import { createTranslator } from "use-intl/core";
import en from "@/messages/en/calcReports.json";

/** a translator for the calcReports namespace; values are passed as text so no number is reformatted */
export type ReportT = (key: string, values?: Record<string, string>) => string;

const english = createTranslator({ locale: "en-US", messages: { calcReports: en }, namespace: "calcReports" });

export const englishReportT: ReportT = (key, values) => (english as unknown as ReportT)(key, values);
