/**
 * Sprinkler discharge from the K-factor: Q = K·√P (the discharge relation NFPA 13 and NFPA 13D use).
 * US: Q in gpm, P in psi, K in gpm/psi^0.5. SI: Q in L/min, P in bar, K in L/min/bar^0.5.
 * The K-factor, the minimum flow and the minimum pressure for a coverage area come from the
 * sprinkler's listing; this only does the arithmetic.
 */
import { INPUT_LIMITS, requireFiniteResult, requirePositive } from "./errors";
import { K_SI_PER_K_US, L_PER_GAL, PSI_PER_BAR } from "./units";

const K_SI_MAX = INPUT_LIMITS.kFactorUs * K_SI_PER_K_US;
const LPM_MAX = INPUT_LIMITS.flowGpm * L_PER_GAL;
const BAR_MAX = INPUT_LIMITS.pressurePsi / PSI_PER_BAR;

/** Q = K·√P: flow in gpm from K (gpm/psi^0.5) and pressure at the sprinkler in psi */
export function sprinklerFlowGpm(kFactor: number, pressurePsi: number): number {
  const k = requirePositive("kFactor", kFactor, INPUT_LIMITS.kFactorUs);
  const p = requirePositive("pressurePsi", pressurePsi, INPUT_LIMITS.pressurePsi);
  return requireFiniteResult("flowGpm", k * Math.sqrt(p));
}

/** P = (Q/K)²: pressure in psi needed at the sprinkler for a flow in gpm */
export function sprinklerPressurePsi(kFactor: number, flowGpm: number): number {
  const k = requirePositive("kFactor", kFactor, INPUT_LIMITS.kFactorUs);
  const q = requirePositive("flowGpm", flowGpm, INPUT_LIMITS.flowGpm);
  return requireFiniteResult("pressurePsi", (q / k) ** 2);
}

/** SI form: flow in L/min from K_SI (L/min/bar^0.5) and pressure in bar */
export function sprinklerFlowLpm(kFactorSi: number, pressureBar: number): number {
  const k = requirePositive("kFactorSi", kFactorSi, K_SI_MAX);
  const p = requirePositive("pressureBar", pressureBar, BAR_MAX);
  return requireFiniteResult("flowLpm", k * Math.sqrt(p));
}

/** SI form: pressure in bar needed for a flow in L/min */
export function sprinklerPressureBar(kFactorSi: number, flowLpm: number): number {
  const k = requirePositive("kFactorSi", kFactorSi, K_SI_MAX);
  const q = requirePositive("flowLpm", flowLpm, LPM_MAX);
  return requireFiniteResult("pressureBar", (q / k) ** 2);
}

/**
 * What a design sprinkler needs: the listing gives a minimum flow for the chosen coverage and may give
 * a minimum pressure. Flow is the larger of the listed flow and K·√(listed pressure); pressure follows
 * from that flow.
 */
export function designSprinklerPoint(
  kFactor: number,
  minFlowGpm: number,
  minPressurePsi?: number,
): { flowGpm: number; pressurePsi: number; governedBy: "listed flow" | "listed minimum pressure" } {
  const k = requirePositive("kFactor", kFactor, INPUT_LIMITS.kFactorUs);
  const q = requirePositive("minFlowGpm", minFlowGpm, INPUT_LIMITS.flowGpm);
  const pFromFlow = (q / k) ** 2;
  if (minPressurePsi === undefined) return { flowGpm: q, pressurePsi: pFromFlow, governedBy: "listed flow" };
  const pMin = requirePositive("minPressurePsi", minPressurePsi, INPUT_LIMITS.pressurePsi);
  if (pMin > pFromFlow) {
    return { flowGpm: k * Math.sqrt(pMin), pressurePsi: pMin, governedBy: "listed minimum pressure" };
  }
  return { flowGpm: q, pressurePsi: pFromFlow, governedBy: "listed flow" };
}
