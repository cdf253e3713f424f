/**
 * Input checking shared by every calculator function. A bad value throws HydraulicsInputError naming
 * the field, so a form can put the message next to the right input. Nothing here returns NaN or
 * Infinity: the ranges below keep every formula in the library finite.
 */

export class HydraulicsInputError extends Error {
  /** the input's name as the caller passed it, e.g. "pressurePsi" or "segments[2].lengthFt" */
  readonly field: string;
  readonly reason: string;

  constructor(field: string, reason: string) {
    super(`${field}: ${reason}`);
    this.name = "HydraulicsInputError";
    this.field = field;
    this.reason = reason;
  }
}

export function isHydraulicsInputError(error: unknown): error is HydraulicsInputError {
  return error instanceof HydraulicsInputError;
}

/**
 * Accepted ranges. They are deliberately wide (any water-based fire-sprinkler system fits inside
 * them); they exist to catch typos and to keep every formula finite, not to judge a design.
 */
export const INPUT_LIMITS = {
  flowGpm: 100_000,
  pressurePsi: 10_000,
  kFactorUs: 100,
  insideDiameterIn: { min: 0.1, max: 100 },
  cFactor: { min: 1, max: 200 },
  lengthFt: 1_000_000,
  elevationFt: 10_000,
  durationMin: 100_000,
  roomSideFt: 1_000,
  spacingFt: { min: 1, max: 1_000 },
  areaSqFt: { min: 1, max: 100_000 },
  fittingCount: 1_000,
} as const;

function describe(value: unknown): string {
  if (typeof value === "number") return String(value);
  if (value === undefined) return "missing";
  return `not a number (${typeof value})`;
}

/** a finite number */
export function requireFinite(field: string, value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new HydraulicsInputError(field, `must be a finite number, got ${describe(value)}`);
  }
  return value;
}

/** a finite number greater than zero and at most `max` */
export function requirePositive(field: string, value: unknown, max: number): number {
  const v = requireFinite(field, value);
  if (v <= 0) throw new HydraulicsInputError(field, `must be greater than 0, got ${v}`);
  if (v > max) throw new HydraulicsInputError(field, `must be at most ${max}, got ${v}`);
  return v;
}

/** a finite number of zero or more, at most `max` */
export function requireNonNegative(field: string, value: unknown, max: number): number {
  const v = requireFinite(field, value);
  if (v < 0) throw new HydraulicsInputError(field, `must not be negative, got ${v}`);
  if (v > max) throw new HydraulicsInputError(field, `must be at most ${max}, got ${v}`);
  return v;
}

/** a finite number in [min, max] */
export function requireInRange(field: string, value: unknown, min: number, max: number): number {
  const v = requireFinite(field, value);
  if (v < min || v > max) {
    throw new HydraulicsInputError(field, `must be between ${min} and ${max}, got ${v}`);
  }
  return v;
}

/** a whole number in [min, max] */
export function requireInteger(field: string, value: unknown, min: number, max: number): number {
  const v = requireInRange(field, value, min, max);
  if (!Number.isInteger(v)) throw new HydraulicsInputError(field, `must be a whole number, got ${v}`);
  return v;
}

/**
 * Last line of defence: a computed value that is not finite means the inputs together left the
 * range the formulas handle, which the per-field checks should already prevent.
 */
export function requireFiniteResult(field: string, value: number): number {
  if (!Number.isFinite(value)) {
    throw new HydraulicsInputError(field, "the inputs together are outside the range this calculator handles");
  }
  return value;
}
