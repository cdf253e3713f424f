/**
 * Stored water for a tank-supplied system: the design flow for the design duration.
 * The duration comes from the adopted code (NFPA 13D sets it by dwelling size and number of stories;
 * check the adopted edition) — this only multiplies.
 */
import { INPUT_LIMITS, requireFiniteResult, requirePositive } from "./errors";

/** gallons = gpm × minutes */
export function storedWaterGal(flowGpm: number, durationMin: number): number {
  const q = requirePositive("flowGpm", flowGpm, INPUT_LIMITS.flowGpm);
  const t = requirePositive("durationMin", durationMin, INPUT_LIMITS.durationMin);
  return requireFiniteResult("volumeGal", q * t);
}

