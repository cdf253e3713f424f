import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import { roomCoverage } from "../coverage";
import type { RoomCoverageReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";
import { englishReportT, type ReportT } from "./text";

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
    title: CALCULATOR_INFO["room-coverage"].title,
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
    checks: r.checks.map((c) => ({ status: c.status, text: c.message })),
    notes: [
      t("roomCoverage.noteGrid"),
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}
