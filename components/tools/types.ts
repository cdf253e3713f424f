import type { CalculatorId, CalculatorReport } from "@/lib/hydraulics/browser";

/** a calculator's first form values and their report, from the server (./initial-state.ts) */
export interface InitialCalculator {
  values: object;
  report: CalculatorReport | null;
  input: unknown;
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
