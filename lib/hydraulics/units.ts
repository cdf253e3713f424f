/**
 * Unit constants and conversions between US customary and SI.
 *
 * Every constant is an exact definition, so nothing here is rounded:
 * - international foot and inch (1959 agreement): 1 ft = 0.3048 m, 1 in = 25.4 mm
 * - US liquid gallon = 231 in³ = 3.785411784 L
 * - avoirdupois pound = 0.45359237 kg; standard gravity g₀ = 9.80665 m/s² (CGPM 1901)
 * - pound-force per square inch = 0.45359237 kg × g₀ / (0.0254 m)²; 1 bar = 100 000 Pa
 */
import { requireFinite } from "./errors";

export const M_PER_FT = 0.3048;
export const MM_PER_IN = 25.4;
export const L_PER_GAL = 3.785411784;
export const KG_PER_LB = 0.45359237;
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
export const PA_PER_PSI = (KG_PER_LB * STANDARD_GRAVITY_M_PER_S2) / (MM_PER_IN / 1000) ** 2; // 6894.757…
export const PA_PER_BAR = 100_000;
export const PSI_PER_BAR = PA_PER_BAR / PA_PER_PSI; // 14.5037…
export const SQ_M_PER_SQ_FT = M_PER_FT ** 2;
export const CU_M_PER_CU_FT = M_PER_FT ** 3;

/**
 * K-factor conversion. Q = K·√P in both systems, so
 * K_SI [L/min/bar^0.5] = K_US [gpm/psi^0.5] × (L per gal) × √(psi per bar) = K_US × 14.4163…
 */
export const K_SI_PER_K_US = L_PER_GAL * Math.sqrt(PSI_PER_BAR);

/* ---------- the one conversion path: reports, the form's unit switch and the PDF all use it ---------- */

export type Units = "us" | "si";
export type Quantity = "pressure" | "flow" | "length" | "diameter" | "area" | "volume" | "k" | "lossPerLength" | "velocity";

const US_PER_SI: Record<Quantity, number> = {
  pressure: PSI_PER_BAR, // psi per bar
  flow: 1 / L_PER_GAL, // gpm per L/min
  length: 1 / M_PER_FT, // ft per m
  diameter: 1 / MM_PER_IN, // in per mm
  area: 1 / SQ_M_PER_SQ_FT, // ft² per m²
  volume: 1 / L_PER_GAL, // gal per L
  k: 1 / K_SI_PER_K_US, // K_US per K_SI
  lossPerLength: PSI_PER_BAR * M_PER_FT, // psi/ft per bar/m
  velocity: 1 / M_PER_FT, // ft/s per m/s
};

/** a value in `units` to US customary */
export const toUs = (quantity: Quantity, value: number, units: Units): number =>
  units === "si" ? requireFinite(quantity, value) * US_PER_SI[quantity] : requireFinite(quantity, value);

/** a US customary value to `units` */
export const fromUs = (quantity: Quantity, value: number, units: Units): number =>
  units === "si" ? requireFinite(quantity, value) / US_PER_SI[quantity] : requireFinite(quantity, value);
