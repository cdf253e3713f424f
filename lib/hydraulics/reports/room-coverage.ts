import { roomCoverage, type CoverageCheck } from "../coverage";
import type { RoomCoverageReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";
import { englishReportT, type ReportT } from "./text";

const FIXED_CHECKS: Record<string, string> = {
  "min-wall-distance": "minWallDistance",
  obstructions: "obstructions",
  "sloped-ceiling": "slopedCeiling",
  "beams-soffits": "beamsSoffits",
  "room-shape": "roomShape",
  "sprinkler-type": "sprinklerType",
};

/**
 * The library's coverage checks in the report's language. Their figures are the library's (feet,
 * to 0.1 ft, worked out the same way); a check this does not know keeps the library's words.
 */
function checkText(c: CoverageCheck, sLFt: number, sWFt: number, columns: number, rows: number, minSpacingFt: number | undefined, t: ReportT) {
  const fixed = FIXED_CHECKS[c.id];
  if (fixed) return t(`coverageChecks.${fixed}`);
  if (c.id === "min-spacing") {
    if (minSpacingFt === undefined) return c.status === "check" ? t("coverageChecks.minSpacingCheck") : t("coverageChecks.minSpacingOne");
    if (c.status === "ok") return t("coverageChecks.minSpacingOk");
    const closest = Math.min(columns > 1 ? sLFt : Infinity, rows > 1 ? sWFt : Infinity);
    return t("coverageChecks.minSpacingFails", { closest: closest.toFixed(1), minimum: String(minSpacingFt) });
  }
  if (c.id === "wall-distance") {
    return c.status === "check"
      ? t("coverageChecks.wallCheck", { alongLength: (sLFt / 2).toFixed(1), alongWidth: (sWFt / 2).toFixed(1) })
      : t("coverageChecks.wallOk");
  }
  if (c.id === "listed-flow") return t("coverageChecks.listedFlow", { alongLength: sLFt.toFixed(1), alongWidth: sWFt.toFixed(1) });
  return c.message;
}

export function roomCoverageReport(input: RoomCoverageReportInput, t: ReportT = englishReportT): CalculatorReport {
  const { units, length: L, width: W, maxSpacing: S, maxArea: A, minSpacing: minS, maxWallDistance: maxWall } = input;
  const u = unitSet(units);
  const r = mapErrors(
    { lengthFt: "length", widthFt: "width", maxSpacingFt: "maxSpacing", maxAreaSqFt: "maxArea", minSpacingFt: "minSpacing", maxWallDistanceFt: "maxWallDistance" },
    () =>
      roomCoverage({
        lengthFt: toUs("length", L, units),
        widthFt: toUs("length", W, units),
        maxSpacingFt: toUs("length", S, units),
        maxAreaSqFt: toUs("area", A, units),
        minSpacingFt: minS === undefined ? undefined : toUs("length", minS, units),
        maxWallDistanceFt: maxWall === undefined ? undefined : toUs("length", maxWall, units),
      }),
  );
  const limit = fromUs("length", r.spacingLimitFt, units);
  const sL = fromUs("length", r.spacingAlongLengthFt, units);
  const sW = fromUs("length", r.spacingAlongWidthFt, units);
  const area = fromUs("area", r.areaPerSprinklerSqFt, units);
  return {
    id: "room-coverage",
    title: t("title.room-coverage"),
    units,
    formula: [
      t("roomCoverage.formulaCount"),
      t("roomCoverage.formulaArea"),
    ],
    inputs: [
      { label: t("roomCoverage.room"), text: `${f(L, u.length)} × ${f(W, u.length)}` },
      { label: t("roomCoverage.maxSpacing"), text: f(S, u.length) },
      { label: t("roomCoverage.maxArea"), text: f(A, u.area) },
      ...(minS === undefined ? [] : [{ label: t("roomCoverage.minSpacing"), text: f(minS, u.length) }]),
      ...(maxWall === undefined ? [] : [{ label: t("roomCoverage.maxWall"), text: f(maxWall, u.length) }]),
    ],
    steps: [
      ...(maxWall === undefined
        ? []
        : [{ label: t("roomCoverage.spacingLimit"), work: t("roomCoverage.spacingLimitWork", { spacing: g(S), wall: g(maxWall) }), text: f(limit, u.length) }]),
      { label: t("roomCoverage.alongLength"), work: `${g(L)} ÷ ${g(limit)} = ${g(L / limit)} → ${r.columns}`, text: t("roomCoverage.spacingText", { count: String(r.columns), spacing: f(sL, u.length) }) },
      { label: t("roomCoverage.alongWidth"), work: `${g(W)} ÷ ${g(limit)} = ${g(W / limit)} → ${r.rows}`, text: t("roomCoverage.spacingText", { count: String(r.rows), spacing: f(sW, u.length) }) },
      {
        label: t("roomCoverage.areaEach"),
        work: `${g(sL)} × ${g(sW)} ≤ ${g(A)}`,
        text: f(area, u.area, "up"),
      },
    ],
    results: [
      { label: t("roomCoverage.sprinklers"), text: String(r.sprinklers), value: r.sprinklers, unit: "count" },
      { label: t("roomCoverage.layout"), text: `${r.columns} × ${r.rows}`, value: r.sprinklers, unit: null },
      { label: t("roomCoverage.spacingLength"), text: f(sL, u.length), value: sL, unit: u.length },
      { label: t("roomCoverage.spacingWidth"), text: f(sW, u.length), value: sW, unit: u.length },
      {
        label: t("roomCoverage.wallDistance"),
        text: t("roomCoverage.wallDistanceText", { alongLength: f(sL / 2, u.length), alongWidth: f(sW / 2, u.length) }),
        value: Math.max(sL, sW) / 2,
        unit: u.length,
      },
      { label: t("roomCoverage.areaPer"), text: f(area, u.area, "up"), value: area, unit: u.area },
    ],
    checks: r.checks.map((c) => ({
      status: c.status,
      text: checkText(c, r.spacingAlongLengthFt, r.spacingAlongWidthFt, r.columns, r.rows, minS === undefined ? undefined : toUs("length", minS, units), t),
    })),
    notes: [
      t("roomCoverage.noteGrid"),
    ],
    caution: t("common.caution"),
  };
}
