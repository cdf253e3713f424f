/**
 * Room coverage check: the least number of sprinklers in a regular rows × columns grid for a
 * rectangular room, given the sprinkler's listed maximum spacing and maximum coverage area.
 *
 * In a regular grid each sprinkler covers a rectangle `spacing along the length × spacing along the
 * width`, and the distance to each wall is half the spacing that way. The grid chosen keeps
 *   spacing each way ≤ the listed maximum spacing (and ≤ twice a listed maximum wall distance), and
 *   spacing × spacing ≤ the listed maximum coverage area,
 * using the fewest sprinklers (ties go to the squarest coverage).
 *
 * The listing decides everything else — this is a first layout to check, not a design.
 */
import { INPUT_LIMITS, requireInRange, requirePositive } from "./errors";

export interface RoomCoverageInput {
  lengthFt: number;
  widthFt: number;
  /** listed maximum distance between sprinklers (and, for one sprinkler, the coverage dimension) */
  maxSpacingFt: number;
  /** listed maximum area one sprinkler may cover */
  maxAreaSqFt: number;
  /** listed minimum distance between sprinklers, if you have it */
  minSpacingFt?: number;
  /** listed maximum distance from a sprinkler to a wall, if the listing gives one */
  maxWallDistanceFt?: number;
}

export type CoverageCheckStatus = "ok" | "fails" | "check";

export interface CoverageCheck {
  id:
    | "min-spacing"
    | "wall-distance"
    | "min-wall-distance"
    | "obstructions"
    | "sloped-ceiling"
    | "beams-soffits"
    | "room-shape"
    | "listed-flow"
    | "sprinkler-type";
  status: CoverageCheckStatus;
  message: string;
}

export interface RoomCoverageResult {
  sprinklers: number;
  /** sprinklers along the room's length */
  columns: number;
  /** sprinklers along the room's width */
  rows: number;
  spacingAlongLengthFt: number;
  spacingAlongWidthFt: number;
  /** half the spacing each way */
  wallDistanceLengthFt: number;
  wallDistanceWidthFt: number;
  areaPerSprinklerSqFt: number;
  roomAreaSqFt: number;
  /** the spacing limit actually applied (listed spacing, or twice a smaller listed wall distance) */
  spacingLimitFt: number;
  checks: CoverageCheck[];
}

/** ceil that ignores binary floating-point noise (14.7 / 4.9 must be 3, not 4) */
const ceilClean = (x: number) => Math.ceil(x - 1e-9);

export function roomCoverage(input: RoomCoverageInput): RoomCoverageResult {
  const L = requirePositive("lengthFt", input.lengthFt, INPUT_LIMITS.roomSideFt);
  const W = requirePositive("widthFt", input.widthFt, INPUT_LIMITS.roomSideFt);
  const S = requireInRange("maxSpacingFt", input.maxSpacingFt, INPUT_LIMITS.spacingFt.min, INPUT_LIMITS.spacingFt.max);
  const A = requireInRange("maxAreaSqFt", input.maxAreaSqFt, INPUT_LIMITS.areaSqFt.min, INPUT_LIMITS.areaSqFt.max);
  const minSpacing =
    input.minSpacingFt === undefined
      ? undefined
      : requireInRange("minSpacingFt", input.minSpacingFt, 0, INPUT_LIMITS.spacingFt.max);
  const maxWall =
    input.maxWallDistanceFt === undefined
      ? undefined
      : requireInRange("maxWallDistanceFt", input.maxWallDistanceFt, 0.5, INPUT_LIMITS.spacingFt.max);

  const limit = maxWall === undefined ? S : Math.min(S, 2 * maxWall);
  const c0 = Math.max(1, ceilClean(L / limit));
  const r0 = Math.max(1, ceilClean(W / limit));

  let best: { cols: number; rows: number } | undefined;
  for (let cols = c0; ; cols++) {
    if (best && cols * r0 > best.cols * best.rows) break;
    const rows = Math.max(r0, ceilClean((L * W) / (cols * A)));
    const n = cols * rows;
    const squareness = Math.abs(L / cols - W / rows);
    if (
      !best ||
      n < best.cols * best.rows ||
      (n === best.cols * best.rows && squareness < Math.abs(L / best.cols - W / best.rows) - 1e-12)
    ) {
      best = { cols, rows };
    }
  }

  const { cols, rows } = best;
  const sL = L / cols;
  const sW = W / rows;
  const checks: CoverageCheck[] = [];

  if (minSpacing === undefined) {
    checks.push({
      id: "min-spacing",
      status: cols > 1 || rows > 1 ? "check" : "ok",
      message:
        cols > 1 || rows > 1
          ? "Check the listed minimum distance between sprinklers (it keeps one sprinkler from wetting and cooling its neighbour)."
          : "One sprinkler: no spacing between sprinklers to check.",
    });
  } else {
    const closest = Math.min(cols > 1 ? sL : Infinity, rows > 1 ? sW : Infinity);
    const fails = Number.isFinite(closest) && closest < minSpacing;
    checks.push({
      id: "min-spacing",
      status: fails ? "fails" : "ok",
      message: fails
        ? `Sprinklers would be ${closest.toFixed(1)} ft apart, below the listed minimum of ${minSpacing} ft: a regular grid does not work here; use another layout or sprinkler and check its listing.`
        : "Spacing between sprinklers is at or above the listed minimum you entered.",
    });
  }
  checks.push({
    id: "wall-distance",
    status: maxWall === undefined ? "check" : "ok",
    message:
      maxWall === undefined
        ? `Wall distances here are half the spacing (${(sL / 2).toFixed(1)} ft and ${(sW / 2).toFixed(1)} ft); check them against the listing's maximum distance to a wall.`
        : "Wall distances (half the spacing) are within the listed maximum you entered.",
  });
  checks.push({
    id: "min-wall-distance",
    status: "check",
    message: "Check the listing's minimum distance from a wall and its deflector position below the ceiling.",
  });
  checks.push({
    id: "obstructions",
    status: "check",
    message:
      "Check obstructions to the spray (ceiling fans, light fixtures, soffits, ducts, tall furniture) against the listing's obstruction rules.",
  });
  checks.push({
    id: "sloped-ceiling",
    status: "check",
    message: "This assumes a flat, smooth ceiling: a sloped ceiling needs a sprinkler listed for that slope, placed by its listing.",
  });
  checks.push({
    id: "beams-soffits",
    status: "check",
    message: "Beams and soffits can block or divide the spray; the listing and the adopted code set how they change the layout.",
  });
  checks.push({
    id: "room-shape",
    status: "check",
    message: "This covers a plain rectangle: L-shaped rooms, alcoves and openings to other rooms (compartments) need their own check.",
  });
  checks.push({
    id: "listed-flow",
    status: "check",
    message: `Each sprinkler covers ${(sL).toFixed(1)} × ${(sW).toFixed(1)} ft: use the listing's flow and pressure for the listed coverage that contains this (round up to the next listed size).`,
  });
  checks.push({
    id: "sprinkler-type",
    status: "check",
    message: "The grid suits pendent or upright sprinklers; sidewall sprinklers are placed along walls by different listing rules.",
  });

  return {
    sprinklers: cols * rows,
    columns: cols,
    rows,
    spacingAlongLengthFt: sL,
    spacingAlongWidthFt: sW,
    wallDistanceLengthFt: sL / 2,
    wallDistanceWidthFt: sW / 2,
    areaPerSprinklerSqFt: sL * sW,
    roomAreaSqFt: L * W,
    spacingLimitFt: limit,
    checks,
  };
}

/** the least number of sprinklers for the room (the quiz's `sprinklersNeeded`) */
export const sprinklersNeeded = (input: RoomCoverageInput): number => roomCoverage(input).sprinklers;
