/**
 * Riser's hydraulics library: the public face. Pure TypeScript (no React, no Node-only APIs), used
 * by the calculators in the browser, the quiz grader and the PDF summary on the server. Forms and
 * pages that need only the catalog, schemas and types import `@/lib/hydraulics/shared`.
 *
 * A teaching and checking aid, not a stamped design: the sprinkler's listing, the adopted code with
 * its local amendments and the authority having jurisdiction govern.
 */
export * from "./shared";
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
  toUs,
  fromUs,
} from "./units";
export {
  sprinklerFlowGpm,
  sprinklerPressurePsi,
  designSprinklerPoint,
  designSprinklerPressurePsi,
  type DesignPointGovernor,
} from "./sprinkler";
export { pipeDimensions, pipeInsideDiameterIn, hazenWilliamsC, type PipeMaterialInfo, type PipeDimensions } from "./pipe-data";
export {
  HAZEN_WILLIAMS_US_CONSTANT,
  HAZEN_WILLIAMS_SI_CONSTANT,
  frictionLossPsiPerFt,
  frictionLossBarPerM,
  frictionLossPsi,
  pipeVelocityFtPerS,
} from "./friction";
export {
  FITTING_KINDS,
  FITTING_LABELS,
  STEEL_40_EQUIVALENT_LENGTH_FT,
  C_FACTOR_MULTIPLIERS,
  cFactorMultiplier,
  fittingsEquivalentLength,
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
  elevationChangePsi,
} from "./elevation";
export {
  flowTestAvailablePsi,
  flowAtResidualGpm,
  supplyMargin,
  type FlowTest,
  type AvailablePressure,
  type DemandPoint,
  type SupplyMarginResult,
} from "./flow-test";
export { storedWaterGal } from "./storage";
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
  type PipeSegmentInput,
  type DesignSprinklerInput,
  type DeviceLossInput,
  type SystemDemandInput,
  type SystemDemandResult,
  type DemandStep,
  type SegmentDetail,
} from "./demand";
export { calculatorReport, parseCalculatorInput, englishReportT, FITTING_NAMES, NOMINAL_BORE_NOTE, type ReportT } from "./reports";
export { shownMargin } from "./reports/common";
export { calculatorFormSchema, fieldLabel } from "./form-schema";
export { INPUT_FIELD_NAMES, inputErrorSentence } from "./input-error-text";

/** the caution every calculator shows */
export { CALCULATOR_CAUTION_TEXT as CALCULATOR_CAUTION } from "./catalog";
