/**
 * Sprinkler discharge from the K-factor: Q = K·√P (the discharge relation NFPA 13 and NFPA 13D use).
 * US: Q in gpm, P in psi, K in gpm/psi^0.5. SI: Q in L/min, P in bar, K in L/min/bar^0.5.
 * The K-factor, the minimum flow and the minimum pressure for a coverage area come from the
 * sprinkler's listing; this only does the arithmetic.
 */
import { INPUT_LIMITS, requireFiniteResult, requireInRange, requirePositive } from "./errors";

/**
 * Floors NFPA 13D sets under every design sprinkler, whatever its listing says.
 * - Minimum design density 0.05 gpm/ft² over the sprinkler's coverage area, or the listed flow,
 *   whichever is greater: NFPA 13D (2025), Section 10.2, discharge design criteria (confirmed in a
 *   public summary of Section 10.2; same figure in the 2016–2022 editions, from memory — verify).
 * - Minimum operating pressure 7 psi at any sprinkler: NFPA 13D (2022/2025), discharge design
 *   provisions beside Section 10.2 (section number from memory — verify against the adopted edition).
 * The adopted edition with its local amendments and the sprinkler's listing govern.
 */
export const CODE_FLOORS = {
  minPressurePsi: 7,
  minDensityGpmPerSqFt: 0.05,
  source: {
    minPressurePsi: "NFPA 13D (2022/2025), minimum operating pressure at a sprinkler: 7 psi (section number from memory — verify)",
    minDensityGpmPerSqFt: "NFPA 13D (2025) Section 10.2: at least 0.05 gpm/ft² over the coverage area, or the listed flow if greater",
  },
} as const;

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

export type DesignPointGovernor = "listed flow" | "listed minimum pressure" | "code minimum density" | "code minimum pressure";

/**
 * What a design sprinkler needs. The flow is the largest of: the listed flow for the coverage,
 * K·√(listed minimum pressure), the code's density × the coverage area, and K·√(the code's 7 psi);
 * the pressure follows from that flow, P = (Q ÷ K)². So neither floor of NFPA 13D can be undercut.
 */
export function designSprinklerPoint(
  kFactor: number,
  minFlowGpm: number,
  minPressurePsi?: number,
  coverageAreaSqFt?: number,
): { flowGpm: number; pressurePsi: number; governedBy: DesignPointGovernor } {
  const k = requirePositive("kFactor", kFactor, INPUT_LIMITS.kFactorUs);
  const candidates: { flowGpm: number; governedBy: DesignPointGovernor }[] = [
    { flowGpm: requirePositive("minFlowGpm", minFlowGpm, INPUT_LIMITS.flowGpm), governedBy: "listed flow" },
  ];
  if (minPressurePsi !== undefined) {
    const p = requirePositive("minPressurePsi", minPressurePsi, INPUT_LIMITS.pressurePsi);
    candidates.push({ flowGpm: k * Math.sqrt(p), governedBy: "listed minimum pressure" });
  }
  if (coverageAreaSqFt !== undefined) {
    const a = requireInRange("coverageAreaSqFt", coverageAreaSqFt, INPUT_LIMITS.areaSqFt.min, INPUT_LIMITS.areaSqFt.max);
    candidates.push({ flowGpm: CODE_FLOORS.minDensityGpmPerSqFt * a, governedBy: "code minimum density" });
  }
  candidates.push({ flowGpm: k * Math.sqrt(CODE_FLOORS.minPressurePsi), governedBy: "code minimum pressure" });
  // the first (listed) candidate wins ties, so a listing that meets a floor exactly is named as governing
  const best = candidates.reduce((a, b) => (b.flowGpm > a.flowGpm * (1 + 1e-12) ? b : a));
  const pressurePsi = best.governedBy === "code minimum pressure" ? CODE_FLOORS.minPressurePsi : (best.flowGpm / k) ** 2;
  return { flowGpm: best.flowGpm, pressurePsi: Math.max(pressurePsi, CODE_FLOORS.minPressurePsi), governedBy: best.governedBy };
}

/** the pressure a sprinkler needs for a flow, never below the code's 7 psi operating minimum */
export const designSprinklerPressurePsi = (kFactor: number, flowGpm: number): number =>
  Math.max(sprinklerPressurePsi(kFactor, flowGpm), CODE_FLOORS.minPressurePsi);
