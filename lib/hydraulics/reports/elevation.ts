import { BAR_PER_M_OF_WATER, PSI_PER_FT_OF_WATER, WATER_DENSITY_LB_PER_CU_FT } from "../elevation";
import { HydraulicsInputError, INPUT_LIMITS } from "../errors";
import type { ElevationReportInput } from "../schemas";
import { toUs } from "../units";
import { f, g, unitSet, type CalculatorReport } from "./common";
import { englishReportT, type ReportT } from "./text";

export function elevationReport({ units, height: h }: ElevationReportInput, t: ReportT = englishReportT): CalculatorReport {
  const u = unitSet(units);
  if (toUs("length", h, units) > INPUT_LIMITS.elevationFt) throw new HydraulicsInputError("height", "is beyond the range this calculator handles");
  const rate = units === "si" ? BAR_PER_M_OF_WATER : PSI_PER_FT_OF_WATER;
  const p = h * rate;
  return {
    id: "elevation",
    title: t("title.elevation"),
    units,
    formula: [units === "si" ? t("elevation.formulaSi") : t("elevation.formulaUs")],
    inputs: [{ label: t("elevation.height"), text: f(h, u.length) }],
    steps: [
      units === "si"
        ? { label: t("elevation.weightSi"), work: "999.1 kg/m³ × 9.80665 m/s² ÷ 100 000", text: `${g(rate)} bar/m` }
        : { label: t("elevation.weightUs"), work: `${WATER_DENSITY_LB_PER_CU_FT} lb/ft³ ÷ 144 in²/ft²`, text: `${g(rate)} psi/ft` },
      { label: t("elevation.elevationPressure"), work: `${g(rate)} × ${g(h)}`, text: f(p, u.pressure, "up") },
    ],
    results: [{ label: t("elevation.pressureToLift"), text: f(p, u.pressure, "up"), value: p, unit: u.pressure }],
    checks: [],
    notes: [
      t("elevation.noteWeight"),
      t("elevation.noteRise"),
    ],
    caution: t("common.caution"),
  };
}
