import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import { BAR_PER_M_OF_WATER, PSI_PER_FT_OF_WATER, WATER_DENSITY_LB_PER_CU_FT } from "../elevation";
import { HydraulicsInputError, INPUT_LIMITS } from "../errors";
import type { ElevationReportInput } from "../schemas";
import { toUs } from "../units";
import { f, g, unitSet, type CalculatorReport } from "./common";

export function elevationReport({ units, height: h }: ElevationReportInput): CalculatorReport {
  const u = unitSet(units);
  if (toUs("length", h, units) > INPUT_LIMITS.elevationFt) throw new HydraulicsInputError("height", "is beyond the range this calculator handles");
  const rate = units === "si" ? BAR_PER_M_OF_WATER : PSI_PER_FT_OF_WATER;
  const p = h * rate;
  return {
    id: "elevation",
    title: CALCULATOR_INFO.elevation.title,
    units,
    formula: [units === "si" ? "P = 0.098 bar per metre × h" : "P = 0.433 psi per foot × h"],
    inputs: [{ label: "Height of the sprinkler above the gauge", text: f(h, u.length) }],
    steps: [
      units === "si"
        ? { label: "Weight of water per metre of height", work: "999.1 kg/m³ × 9.80665 m/s² ÷ 100 000", text: `${g(rate)} bar/m` }
        : { label: "Weight of water per foot of height", work: `${WATER_DENSITY_LB_PER_CU_FT} lb/ft³ ÷ 144 in²/ft²`, text: `${g(rate)} psi/ft` },
      { label: "Elevation pressure", work: `${g(rate)} × ${g(h)}`, text: f(p, u.pressure, "up") },
    ],
    results: [{ label: "Pressure to lift the water", text: f(p, u.pressure, "up"), value: p, unit: u.pressure }],
    checks: [],
    notes: [
      "Water at about 60 °F weighs 62.37 lb/ft³ (water-property tables; from memory), which gives the 0.433 psi per foot the sprinkler standards use.",
      "A rise from the gauge to the sprinkler costs this pressure; a drop gives it back.",
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}
