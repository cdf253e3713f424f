/**
 * The hydraulics library's browser-safe face for forms and pages: the calculator catalog, the input
 * schemas and their inferred types, presets, the unit switch, display rounding, the pipe table's
 * choices and the code floors. Pure TypeScript and zod; nothing here touches Node or the server.
 */
export { CALCULATOR_CAUTION_TEXT, CALCULATOR_IDS, CALCULATOR_INFO, isCalculatorId, type CalculatorId } from "./catalog";
export {
  CALCULATOR_SCHEMAS,
  INPUT_CAPS,
  elevationInput,
  fieldName,
  fieldPath,
  flowTestInput,
  frictionLossInput,
  roomCoverageInput,
  segmentInput,
  sprinklerFlowInput,
  storedWaterInput,
  systemDemandInput,
  type CalculatorFormValues,
  type CalculatorInputs,
  type ElevationReportInput,
  type FlowTestReportInput,
  type FrictionLossReportInput,
  type RoomCoverageReportInput,
  type SegmentReportInput,
  type SprinklerFlowReportInput,
  type StoredWaterReportInput,
  type SystemDemandReportInput,
} from "./schemas";
export { EXAMPLE_SYSTEM_DEMAND, inputFromPreset } from "./presets";
export { INPUT_QUANTITY, convertInputUnits } from "./unit-switch";
export { DISPLAY_STEPS, displayDecimals, roundForDisplay, formatForDisplay, type DisplayUnit, type RoundingDirection } from "./rounding";
export { NOMINAL_SIZES, PIPE_DATA, PIPE_MATERIALS, isNominalSize, isPipeMaterial, sizesFor, type NominalSize, type PipeMaterial } from "./pipe-data";
export { CODE_FLOORS } from "./sprinkler";
export type { Units, Quantity } from "./units";
export type { CalculatorReport, ReportChart, ReportLine, ReportResult, ReportStep } from "./reports/common";
