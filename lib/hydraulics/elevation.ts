/**
 * Pressure from a height of water (head).
 *
 * Water at about 60 °F weighs 62.37 lb/ft³ (standard water-property tables; from memory — 999.0
 * kg/m³ at 15.6 °C). A column 1 ft high over 1 in² holds 62.37/144 lb, so
 *   0.4331 psi per foot — the 0.433 psi/ft the sprinkler standards use;
 * in SI the same density gives ρ·g₀ = 999.07 kg/m³ × 9.80665 m/s² = 0.09798 bar per metre (≈ 0.098).
 * Colder water is very slightly heavier; the difference is far below the rounding of any gauge.
 */
import { INPUT_LIMITS, requireInRange, requireNonNegative } from "./errors";
import { CU_M_PER_CU_FT, KG_PER_LB, PA_PER_BAR, STANDARD_GRAVITY_M_PER_S2 } from "./units";

export const WATER_DENSITY_LB_PER_CU_FT = 62.37;
export const WATER_DENSITY_KG_PER_CU_M = (WATER_DENSITY_LB_PER_CU_FT * KG_PER_LB) / CU_M_PER_CU_FT;
/** lb per ft³ spread over 144 in² per ft² */
export const PSI_PER_FT_OF_WATER = WATER_DENSITY_LB_PER_CU_FT / 144;
export const BAR_PER_M_OF_WATER = (WATER_DENSITY_KG_PER_CU_M * STANDARD_GRAVITY_M_PER_S2) / PA_PER_BAR;

/** pressure in psi of a water column heightFt tall (height zero or more) */
export function headPressurePsi(heightFt: number): number {
  return requireNonNegative("heightFt", heightFt, INPUT_LIMITS.elevationFt) * PSI_PER_FT_OF_WATER;
}

/**
 * Pressure change along a path that rises elevationChangeFt in the direction of flow: positive is
 * pressure lost climbing, negative is pressure gained going down.
 */
export function elevationChangePsi(elevationChangeFt: number, field = "elevationChangeFt"): number {
  const h = requireInRange(field, elevationChangeFt, -INPUT_LIMITS.elevationFt, INPUT_LIMITS.elevationFt);
  return h * PSI_PER_FT_OF_WATER;
}
