/**
 * Display rounding. The rule: each unit has a fixed step (table below), chosen to be finer than the
 * field can read it (a gauge reads about 1 psi; a tape 1 in) but no finer than the inputs justify.
 *   psi 0.1 · bar 0.01 · gpm 0.1 · L/min 1 · ft 0.1 · m 0.01 · in 0.001 · mm 0.1 · gal 1 · L 1 ·
 *   ft² 1 · m² 0.1 · psi/ft 0.0001 · bar/m 0.00001 · min 0.1 · K (US and SI) 0.1 · count 1
 * "nearest" rounds half away from zero. For a requirement (pressure or flow needed, tank volume)
 * display "up"; for what a supply offers display "down" — so rounding never flatters a design.
 * Computation always carries full precision; only display rounds.
 */
import { HydraulicsInputError, requireFinite } from "./errors";

export const DISPLAY_STEPS = {
  psi: 0.1,
  bar: 0.01,
  gpm: 0.1,
  "L/min": 1,
  ft: 0.1,
  m: 0.01,
  in: 0.001,
  mm: 0.1,
  gal: 1,
  L: 1,
  "ft²": 1,
  "m²": 0.1,
  "psi/ft": 0.0001,
  "bar/m": 0.00001,
  min: 0.1,
  "K-US": 0.1,
  "K-SI": 0.1,
  count: 1,
} as const;
export type DisplayUnit = keyof typeof DISPLAY_STEPS;
export type RoundingDirection = "nearest" | "up" | "down";

/** decimals for a unit's step */
export const displayDecimals = (unit: DisplayUnit): number => Math.max(0, -Math.round(Math.log10(DISPLAY_STEPS[unit])));

/** shift a decimal exponent exactly, through the number's decimal text (avoids 1.005 → 1.00) */
const shift = (x: number, places: number) => Number(`${x}e${places}`);

export function roundForDisplay(value: number, unit: DisplayUnit, direction: RoundingDirection = "nearest"): number {
  const v = requireFinite("value", value);
  if (!(unit in DISPLAY_STEPS)) throw new HydraulicsInputError("unit", `unknown display unit ${String(unit)}`);
  if (Math.abs(v) >= 1e15) return v;
  const d = displayDecimals(unit);
  // values written in exponent form (tiny numbers) go through plain multiplication instead
  const scaled = /e/i.test(String(v)) ? v * 10 ** d : shift(v, d);
  let r: number;
  if (direction === "up") r = Math.ceil(scaled - 1e-7);
  else if (direction === "down") r = Math.floor(scaled + 1e-7);
  else r = Math.sign(scaled) * Math.round(Math.abs(scaled));
  const out = /e/i.test(String(r)) ? r / 10 ** d : shift(r, -d);
  return out + 0; // turns −0 into 0
}

/** rounded value as text with the unit's fixed decimals, e.g. "12.0 psi" */
export function formatForDisplay(
  value: number,
  unit: DisplayUnit,
  direction: RoundingDirection = "nearest",
  withUnit = true,
): string {
  const text = roundForDisplay(value, unit, direction).toFixed(displayDecimals(unit));
  if (!withUnit) return text;
  const label = unit === "K-US" || unit === "K-SI" || unit === "count" ? "" : ` ${unit}`;
  return `${text}${label}`;
}
