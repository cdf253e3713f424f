/**
 * What a calculator form needs before its first input: the catalog, the caps, the unit switch,
 * display rounding and the pipe table's choices, with the types. No zod and no calculation: the
 * schemas and the reports (index.ts) load in the browser only once someone edits a form
 * (components/tools/engine.ts); the first result is worked out on the server.
 */
export { CALCULATOR_IDS, isCalculatorId, type CalculatorId } from "./catalog";
export { INPUT_CAPS } from "./caps";
export { convertInputUnits } from "./unit-switch";
export { formatForDisplay } from "./rounding";
export { PIPE_MATERIALS, sizesFor, type NominalSize, type PipeMaterial } from "./pipe-data";
export type { Units } from "./units";
export type { CalculatorFormValues, CalculatorInputs, SegmentReportInput } from "./schemas";
export type { CalculatorReport, ReportChart } from "./reports/common";
export type { ReportT } from "./reports/text";
