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
import { L_PER_GAL, MM_PER_IN } from "./units";

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

/**
 * Mean water velocity in a pipe, ft/s: flow (gpm × 231 in³ per gallon ÷ 60 s) over the bore's area
 * (π d² ÷ 4 in²), turned into ft/s — about 0.4085 × Q ÷ d². Shown beside friction because a high
 * velocity means noise, wear and water hammer in the pipe.
 */
export function pipeVelocityFtPerS(flowGpm: number, insideDiameterIn: number): number {
  const q = requireNonNegative("flowGpm", flowGpm, INPUT_LIMITS.flowGpm);
  const d = requireInRange("insideDiameterIn", insideDiameterIn, INPUT_LIMITS.insideDiameterIn.min, INPUT_LIMITS.insideDiameterIn.max);
  const cubicInchesPerSecond = (q * 231) / 60;
  return cubicInchesPerSecond / ((Math.PI * d * d) / 4) / 12;
}
