/**
 * Friction loss by the Hazen-Williams formula in the form the sprinkler standards print
 * (NFPA 13, hydraulic calculation procedures; NFPA 13D uses the same relation):
 *
 *   US: p = 4.52 · Q^1.85 / (C^1.85 · d^4.87)       p psi per foot, Q gpm, d inside diameter in inches
 *   SI: p = 6.05×10⁵ · Q^1.85 / (C^1.85 · d^4.87)   p bar per metre, Q L/min, d inside diameter in mm
 *
 * The SI constant is the US one carried through the unit conversions (the tests check this); each
 * function uses its own standard's printed constant, so the two agree to about 0.1 %.
 */
import { INPUT_LIMITS, requireFiniteResult, requireInRange, requireNonNegative } from "./errors";
import { pipeDimensions, hazenWilliamsC, type NominalSize, type PipeMaterial } from "./pipe-data";
import { L_PER_GAL, MM_PER_IN, M_PER_FT } from "./units";

export const HAZEN_WILLIAMS_US_CONSTANT = 4.52;
export const HAZEN_WILLIAMS_SI_CONSTANT = 6.05e5;
export const HAZEN_WILLIAMS_FLOW_EXPONENT = 1.85;
export const HAZEN_WILLIAMS_DIAMETER_EXPONENT = 4.87;

/** friction loss in psi per foot of pipe */
export function frictionLossPsiPerFt(flowGpm: number, cFactor: number, insideDiameterIn: number): number {
  const q = requireNonNegative("flowGpm", flowGpm, INPUT_LIMITS.flowGpm);
  const c = requireInRange("cFactor", cFactor, INPUT_LIMITS.cFactor.min, INPUT_LIMITS.cFactor.max);
  const d = requireInRange(
    "insideDiameterIn",
    insideDiameterIn,
    INPUT_LIMITS.insideDiameterIn.min,
    INPUT_LIMITS.insideDiameterIn.max,
  );
  const p =
    (HAZEN_WILLIAMS_US_CONSTANT * q ** HAZEN_WILLIAMS_FLOW_EXPONENT) /
    (c ** HAZEN_WILLIAMS_FLOW_EXPONENT * d ** HAZEN_WILLIAMS_DIAMETER_EXPONENT);
  return requireFiniteResult("lossPsiPerFt", p);
}

/** friction loss in bar per metre of pipe (SI form) */
export function frictionLossBarPerM(flowLpm: number, cFactor: number, insideDiameterMm: number): number {
  const q = requireNonNegative("flowLpm", flowLpm, INPUT_LIMITS.flowGpm * L_PER_GAL);
  const c = requireInRange("cFactor", cFactor, INPUT_LIMITS.cFactor.min, INPUT_LIMITS.cFactor.max);
  const d = requireInRange(
    "insideDiameterMm",
    insideDiameterMm,
    INPUT_LIMITS.insideDiameterIn.min * MM_PER_IN,
    INPUT_LIMITS.insideDiameterIn.max * MM_PER_IN,
  );
  const p =
    (HAZEN_WILLIAMS_SI_CONSTANT * q ** HAZEN_WILLIAMS_FLOW_EXPONENT) /
    (c ** HAZEN_WILLIAMS_FLOW_EXPONENT * d ** HAZEN_WILLIAMS_DIAMETER_EXPONENT);
  return requireFiniteResult("lossBarPerM", p);
}

/** total friction loss in psi over a length of pipe (length may include fitting equivalent lengths) */
export function frictionLossPsi(input: {
  flowGpm: number;
  lengthFt: number;
  cFactor: number;
  insideDiameterIn: number;
}): number {
  const length = requireNonNegative("lengthFt", input.lengthFt, INPUT_LIMITS.lengthFt);
  return requireFiniteResult(
    "lossPsi",
    frictionLossPsiPerFt(input.flowGpm, input.cFactor, input.insideDiameterIn) * length,
  );
}

/** total friction loss in bar over a length in metres */
export function frictionLossBar(input: {
  flowLpm: number;
  lengthM: number;
  cFactor: number;
  insideDiameterMm: number;
}): number {
  const length = requireNonNegative("lengthM", input.lengthM, INPUT_LIMITS.lengthFt * M_PER_FT);
  return requireFiniteResult(
    "lossBar",
    frictionLossBarPerM(input.flowLpm, input.cFactor, input.insideDiameterMm) * length,
  );
}

export interface PipeFrictionResult {
  material: PipeMaterial;
  nominalSize: NominalSize;
  insideDiameterIn: number;
  cFactor: number;
  flowGpm: number;
  lengthFt: number;
  lossPsiPerFt: number;
  lossPsi: number;
  /** where the ID and C came from */
  insideDiameterSource: string;
  cFactorSource: "table" | "entered";
}

/** friction loss in a run of a tabulated pipe, with optional overrides from the maker's listing */
export function pipeFrictionLoss(input: {
  material: PipeMaterial;
  nominalSize: NominalSize;
  flowGpm: number;
  lengthFt: number;
  cFactor?: number;
  insideDiameterIn?: number;
}): PipeFrictionResult {
  const dims = pipeDimensions(input.material, input.nominalSize);
  const cFactor = input.cFactor ?? hazenWilliamsC(input.material);
  const insideDiameterIn = input.insideDiameterIn ?? dims.insideDiameterIn;
  const lossPsiPerFt = frictionLossPsiPerFt(input.flowGpm, cFactor, insideDiameterIn);
  const lengthFt = requireNonNegative("lengthFt", input.lengthFt, INPUT_LIMITS.lengthFt);
  return {
    material: input.material,
    nominalSize: input.nominalSize,
    insideDiameterIn,
    cFactor,
    flowGpm: input.flowGpm,
    lengthFt,
    lossPsiPerFt,
    lossPsi: requireFiniteResult("lossPsi", lossPsiPerFt * lengthFt),
    insideDiameterSource: input.insideDiameterIn === undefined ? dims.source : "entered (maker's listed ID)",
    cFactorSource: input.cFactor === undefined ? "table" : "entered",
  };
}
