import type { CalculatorId, CalculatorReport } from "@/lib/hydraulics/browser";

/**
 * The few words of the calcReports catalog the form itself shows before its engine has loaded, in
 * the reader's language (the rest of that catalog loads with the engine: ./engine-loader.ts).
 */
export interface CalculatorWords {
  /** each pipe material's name, by material id */
  materials: Record<string, string>;
  /** the report's labels for the margin and the shortfall (the summary bar finds them by label) */
  margin: string;
  shortfall: string;
}

/** a calculator's first form values and their report, from the server (./initial-state.ts) */
export interface InitialCalculator {
  values: object;
  report: CalculatorReport | null;
  input: unknown;
  words: CalculatorWords;
}

export interface CalculatorProps {
  /** inside a lesson: smaller heading */
  embedded?: boolean;
  initial: InitialCalculator;
}

export interface CalculatorEmbedProps {
  id: CalculatorId | string;
  /** a lesson's worked example, with the content contract's US keys (e.g. { kFactor: 4.9, pressurePsi: 10 }) */
  preset?: Record<string, unknown>;
  /** inside a lesson: smaller heading */
  embedded?: boolean;
}
