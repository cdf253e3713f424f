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

export const gpmToLpm = (flowGpm: number, field = "flowGpm") => requireFinite(field, flowGpm) * L_PER_GAL;
export const lpmToGpm = (flowLpm: number, field = "flowLpm") => requireFinite(field, flowLpm) / L_PER_GAL;
export const galToL = (volumeGal: number, field = "volumeGal") => requireFinite(field, volumeGal) * L_PER_GAL;
export const lToGal = (volumeL: number, field = "volumeL") => requireFinite(field, volumeL) / L_PER_GAL;
export const psiToBar = (pressurePsi: number, field = "pressurePsi") =>
  requireFinite(field, pressurePsi) / PSI_PER_BAR;
export const barToPsi = (pressureBar: number, field = "pressureBar") =>
  requireFinite(field, pressureBar) * PSI_PER_BAR;
export const ftToM = (lengthFt: number, field = "lengthFt") => requireFinite(field, lengthFt) * M_PER_FT;
export const mToFt = (lengthM: number, field = "lengthM") => requireFinite(field, lengthM) / M_PER_FT;
export const inToMm = (lengthIn: number, field = "lengthIn") => requireFinite(field, lengthIn) * MM_PER_IN;
export const mmToIn = (lengthMm: number, field = "lengthMm") => requireFinite(field, lengthMm) / MM_PER_IN;
export const sqFtToSqM = (areaSqFt: number, field = "areaSqFt") => requireFinite(field, areaSqFt) * SQ_M_PER_SQ_FT;
export const sqMToSqFt = (areaSqM: number, field = "areaSqM") => requireFinite(field, areaSqM) / SQ_M_PER_SQ_FT;
export const psiPerFtToBarPerM = (lossPsiPerFt: number, field = "lossPsiPerFt") =>
  requireFinite(field, lossPsiPerFt) / PSI_PER_BAR / M_PER_FT;
export const barPerMToPsiPerFt = (lossBarPerM: number, field = "lossBarPerM") =>
  requireFinite(field, lossBarPerM) * PSI_PER_BAR * M_PER_FT;
export const kFactorUsToSi = (kFactorUs: number, field = "kFactor") => requireFinite(field, kFactorUs) * K_SI_PER_K_US;
export const kFactorSiToUs = (kFactorSi: number, field = "kFactorSi") =>
  requireFinite(field, kFactorSi) / K_SI_PER_K_US;
