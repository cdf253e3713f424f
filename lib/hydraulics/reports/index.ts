/** `calculatorReport`: parse the input with its calculator's schema, then build that calculator's report. */
import { isCalculatorId, type CalculatorId } from "../catalog";
import { HydraulicsInputError } from "../errors";
import { CALCULATOR_SCHEMAS, fieldName, type CalculatorInputs } from "../schemas";
import type { CalculatorReport } from "./common";
import { elevationReport } from "./elevation";
import { flowTestReport } from "./flow-test";
import { frictionLossReport } from "./friction-loss";
import { roomCoverageReport } from "./room-coverage";
import { sprinklerFlowReport } from "./sprinkler-flow";
import { storedWaterReport } from "./stored-water";
import { systemDemandReport } from "./system-demand";
import { englishReportT, type ReportT } from "./text";

const BUILDERS: { [K in CalculatorId]: (input: CalculatorInputs[K], t: ReportT) => CalculatorReport } = {
  "sprinkler-flow": sprinklerFlowReport,
  "friction-loss": frictionLossReport,
  elevation: elevationReport,
  "flow-test": flowTestReport,
  "stored-water": storedWaterReport,
  "room-coverage": roomCoverageReport,
  "system-demand": systemDemandReport,
};

/** the calculator's parsed input; throws HydraulicsInputError naming the first field at fault */
export function parseCalculatorInput<I extends CalculatorId>(id: I, input: unknown): CalculatorInputs[I] {
  if (!isCalculatorId(id)) throw new HydraulicsInputError("id", `unknown calculator ${String(id)}`);
  if (typeof input !== "object" || input === null || Array.isArray(input)) throw new HydraulicsInputError("input", "must be an object");
  const parsed = CALCULATOR_SCHEMAS[id].safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new HydraulicsInputError(issue ? fieldName(issue.path) || "input" : "input", issue?.message ?? "is not valid");
  }
  return parsed.data as CalculatorInputs[I];
}

/**
 * The whole report for a calculator; throws HydraulicsInputError naming the input field. `t` is a
 * calcReports translator in the reader's language (English when left out); the numbers do not
 * depend on it.
 */
export function calculatorReport(id: CalculatorId, input: unknown, t: ReportT = englishReportT): CalculatorReport {
  const parsed = parseCalculatorInput(id, input);
  return (BUILDERS[id] as (i: typeof parsed, t: ReportT) => CalculatorReport)(parsed, t);
}

export type { CalculatorReport, ReportChart, ReportLine, ReportResult, ReportStep } from "./common";
export { englishReportT, type ReportT } from "./text";
export { FITTING_NAMES, NOMINAL_BORE_NOTE } from "./fittings";
