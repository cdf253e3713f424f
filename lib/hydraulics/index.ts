/**
 * Riser's hydraulics library: the public face. Pure TypeScript (no React, no Node-only APIs), used
 * by the calculators in the browser, the quiz grader and the PDF summary on the server.
 *
 * A teaching and checking aid, not a stamped design: the sprinkler's listing, the adopted code with
 * its local amendments and the authority having jurisdiction govern.
 */
export { HydraulicsInputError, isHydraulicsInputError, INPUT_LIMITS } from "./errors";
export {
  M_PER_FT,
  MM_PER_IN,
  L_PER_GAL,
  KG_PER_LB,
  STANDARD_GRAVITY_M_PER_S2,
  PA_PER_PSI,
  PA_PER_BAR,
  PSI_PER_BAR,
  SQ_M_PER_SQ_FT,
  K_SI_PER_K_US,
  gpmToLpm,
  lpmToGpm,
  galToL,
  lToGal,
  psiToBar,
  barToPsi,
  ftToM,
  mToFt,
  inToMm,
  mmToIn,
  sqFtToSqM,
  sqMToSqFt,
  psiPerFtToBarPerM,
  barPerMToPsiPerFt,
  kFactorUsToSi,
  kFactorSiToUs,
} from "./units";
export {
  sprinklerFlowGpm,
  sprinklerPressurePsi,
  sprinklerFlowLpm,
  sprinklerPressureBar,
  designSprinklerPoint,
} from "./sprinkler";
export {
  PIPE_MATERIALS,
  NOMINAL_SIZES,
  PIPE_DATA,
  isPipeMaterial,
  isNominalSize,
  pipeDimensions,
  pipeInsideDiameterIn,
  pipeInsideDiameterMm,
  hazenWilliamsC,
  sizesFor,
  type PipeMaterial,
  type NominalSize,
  type PipeMaterialInfo,
  type PipeDimensions,
} from "./pipe-data";
export {
  HAZEN_WILLIAMS_US_CONSTANT,
  HAZEN_WILLIAMS_SI_CONSTANT,
  frictionLossPsiPerFt,
  frictionLossBarPerM,
  frictionLossPsi,
  frictionLossBar,
  pipeFrictionLoss,
  type PipeFrictionResult,
} from "./friction";
export {
  FITTING_KINDS,
  FITTING_LABELS,
  STEEL_40_EQUIVALENT_LENGTH_FT,
  C_FACTOR_MULTIPLIERS,
  cFactorMultiplier,
  fittingsEquivalentLength,
  chartSizesFor,
  type FittingKind,
  type FittingInput,
  type FittingLengthItem,
} from "./fittings";
export {
  WATER_DENSITY_LB_PER_CU_FT,
  WATER_DENSITY_KG_PER_CU_M,
  PSI_PER_FT_OF_WATER,
  BAR_PER_M_OF_WATER,
  headPressurePsi,
  headPressureBar,
  elevationChangePsi,
} from "./elevation";
export {
  flowTestAvailablePsi,
  flowTestAvailableBar,
  flowAtResidualGpm,
  flowAtResidualLpm,
  supplyCurve,
  supplyMargin,
  type FlowTest,
  type FlowTestSi,
  type AvailablePressure,
  type DemandPoint,
  type SupplyMarginResult,
} from "./flow-test";
export { storedWaterGal, storedWaterL } from "./storage";
export {
  roomCoverage,
  sprinklersNeeded,
  type RoomCoverageInput,
  type RoomCoverageResult,
  type CoverageCheck,
  type CoverageCheckStatus,
} from "./coverage";
export {
  systemDemand,
  systemDemandSi,
  siFieldName,
  type PipeSegmentInput,
  type DesignSprinklerInput,
  type DeviceLossInput,
  type SystemDemandInput,
  type SystemDemandResult,
  type DemandStep,
  type SegmentDetail,
  type PipeSegmentInputSi,
  type DesignSprinklerInputSi,
  type FittingInputSi,
  type SystemDemandInputSi,
  type SystemDemandResultSi,
} from "./demand";
export {
  DISPLAY_STEPS,
  displayDecimals,
  roundForDisplay,
  formatForDisplay,
  type DisplayUnit,
  type RoundingDirection,
} from "./rounding";

/** the caution every calculator shows */
export { CALCULATOR_CAUTION_TEXT as CALCULATOR_CAUTION } from "./reports";

export {
  CALCULATOR_IDS,
  CALCULATOR_INFO,
  CALCULATOR_CAUTION_TEXT,
  EXAMPLE_SYSTEM_DEMAND,
  FITTING_NAMES,
  calculatorReport,
  inputFromPreset,
  isCalculatorId,
  convertInputUnits,
  INPUT_QUANTITY,
  type CalculatorId,
  type CalculatorInputs,
  type CalculatorReport,
  type ReportChart,
  type ReportLine,
  type ReportResult,
  type ReportStep,
  type Units,
  type SprinklerFlowReportInput,
  type FrictionLossReportInput,
  type ElevationReportInput,
  type FlowTestReportInput,
  type StoredWaterReportInput,
  type RoomCoverageReportInput,
  type SegmentReportInput,
  type SystemDemandReportInput,
} from "./reports";
