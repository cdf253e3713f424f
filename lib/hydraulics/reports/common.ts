/** What every calculator report holds, and the small helpers the report builders share. */
import type { CalculatorId } from "../catalog";
import { HydraulicsInputError } from "../errors";
import { displayDecimals, formatForDisplay, roundForDisplay, type DisplayUnit, type RoundingDirection } from "../rounding";
import type { Units } from "../units";
import { englishReportT, type ReportT } from "./text";

export interface ReportLine {
  label: string;
  text: string;
}
export interface ReportResult extends ReportLine {
  value: number;
  unit: DisplayUnit | null;
}
export interface ReportStep {
  label: string;
  /** the arithmetic with the numbers put in */
  work: string;
  /** the step's result, rounded for display */
  text: string;
}
export interface ReportChart {
  flowUnit: "gpm" | "L/min";
  pressureUnit: "psi" | "bar";
  /** the flow axis runs from 0 to this */
  flowMax: number;
  supply: { flow: number; pressure: number }[];
  demand: { flow: number; pressure: number } | null;
  /** the test reading, when it lies on the chart's flow range */
  test: { flow: number; pressure: number } | null;
}
export interface CalculatorReport {
  id: CalculatorId;
  title: string;
  units: Units;
  formula: string[];
  inputs: ReportLine[];
  steps: ReportStep[];
  results: ReportResult[];
  verdict?: { result: "pass" | "short"; text: string };
  checks: { status: "ok" | "check" | "fails"; text: string }[];
  notes: string[];
  chart?: ReportChart;
  caution: string;
}

export interface UnitSet {
  pressure: "psi" | "bar";
  flow: "gpm" | "L/min";
  length: "ft" | "m";
  diameter: "in" | "mm";
  volume: "gal" | "L";
  area: "ft²" | "m²";
  lossPerLength: "psi/ft" | "bar/m";
  velocity: "ft/s" | "m/s";
  k: "K-US" | "K-SI";
  kLabel: string;
}
const US: UnitSet = {
  pressure: "psi",
  flow: "gpm",
  length: "ft",
  diameter: "in",
  volume: "gal",
  area: "ft²",
  lossPerLength: "psi/ft",
  velocity: "ft/s",
  k: "K-US",
  kLabel: "gpm/psi^½",
};
const SI: UnitSet = {
  pressure: "bar",
  flow: "L/min",
  length: "m",
  diameter: "mm",
  volume: "L",
  area: "m²",
  lossPerLength: "bar/m",
  velocity: "m/s",
  k: "K-SI",
  kLabel: "L/min/bar^½",
};
export const unitSet = (u: Units): UnitSet => (u === "si" ? SI : US);

/** a value rounded by the display rule, with its unit */
export const f = (value: number, unit: DisplayUnit, dir: RoundingDirection = "nearest") => formatForDisplay(value, unit, dir);

/** an intermediate number without a unit, to 4 significant figures */
export const g = (v: number) =>
  v === 0 ? "0" : Math.abs(v) >= 1e-3 && Math.abs(v) < 1e6 ? String(Number(v.toPrecision(4))) : v.toExponential(3);

/**
 * Margin between a supply and a demand as the page shows them: the available pressure rounded down
 * minus the required pressure rounded up. Computed from the shown numbers, so a margin never reads
 * larger than the difference of the two figures beside it (rounding never flatters a supply).
 */
export function shownMargin(availablePsiOrBar: number, requiredPsiOrBar: number, unit: "psi" | "bar") {
  const available = roundForDisplay(availablePsiOrBar, unit, "down");
  const required = roundForDisplay(requiredPsiOrBar, unit, "up");
  const margin = roundForDisplay(available - required, unit, "nearest");
  return { available, required, margin, pass: margin >= 0 };
}

/**
 * Pass or short between a supply and a demand, as shown: passes only when the exact figures pass AND
 * the rounded figures do; the margin is the difference of the rounded figures, a shortfall is never
 * shown smaller than either the exact or the rounded difference.
 */
export function supplyComparison(availableExact: number, requiredExact: number, exactPass: boolean, unit: "psi" | "bar", t: ReportT = englishReportT) {
  const shown = shownMargin(availableExact, requiredExact, unit);
  const d = displayDecimals(unit);
  const work = t("common.marginWork", { available: shown.available.toFixed(d), required: shown.required.toFixed(d) });
  if (exactPass && shown.pass) return { pass: true as const, work, value: shown.margin, text: f(shown.margin, unit) };
  const short = Math.max(-shown.margin, requiredExact - availableExact, 0);
  return { pass: false as const, work, value: short, text: f(short, unit, "up") };
}

/** run a library call, renaming its error fields to the report's input names */
export function mapErrors<T>(names: Record<string, string>, run: () => T, prefix = ""): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof HydraulicsInputError) {
      const mapped = e.field.replace(/([A-Za-z]+)$/, (name) => names[name] ?? name);
      throw new HydraulicsInputError(`${prefix}${mapped}`, e.reason);
    }
    throw e;
  }
}
