import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import { roomCoverage } from "../coverage";
import type { RoomCoverageReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";

export function roomCoverageReport(input: RoomCoverageReportInput): CalculatorReport {
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
      "Sprinklers along each side ≥ side ÷ maximum spacing (rounded up)",
      "Spacing each way × spacing each way ≤ maximum coverage area; distance to a wall = half the spacing",
    ],
    inputs: [
      { label: "Room", text: `${f(L, u.length)} × ${f(W, u.length)}` },
      { label: "Listed maximum spacing", text: f(S, u.length) },
      { label: "Listed maximum coverage area", text: f(A, u.area) },
      ...(minS === undefined ? [] : [{ label: "Listed minimum spacing", text: f(minS, u.length) }]),
      ...(maxWall === undefined ? [] : [{ label: "Listed maximum distance to a wall", text: f(maxWall, u.length) }]),
    ],
    steps: [
      ...(maxWall === undefined
        ? []
        : [{ label: "Spacing limit from the wall distance", work: `smaller of ${g(S)} and 2 × ${g(maxWall)}`, text: f(limit, u.length) }]),
      { label: "Along the length", work: `${g(L)} ÷ ${g(limit)} = ${g(L / limit)} → ${r.columns}`, text: `${r.columns} × ${f(sL, u.length)} spacing` },
      { label: "Along the width", work: `${g(W)} ÷ ${g(limit)} = ${g(W / limit)} → ${r.rows}`, text: `${r.rows} × ${f(sW, u.length)} spacing` },
      {
        label: "Area each sprinkler covers",
        work: `${g(sL)} × ${g(sW)} ≤ ${g(A)}`,
        text: f(area, u.area, "up"),
      },
    ],
    results: [
      { label: "Sprinklers", text: String(r.sprinklers), value: r.sprinklers, unit: "count" },
      { label: "Layout (along length × along width)", text: `${r.columns} × ${r.rows}`, value: r.sprinklers, unit: null },
      { label: "Spacing along the length", text: f(sL, u.length), value: sL, unit: u.length },
      { label: "Spacing along the width", text: f(sW, u.length), value: sW, unit: u.length },
      {
        label: "Distance to the walls",
        text: `${f(sL / 2, u.length)} and ${f(sW / 2, u.length)}`,
        value: Math.max(sL, sW) / 2,
        unit: u.length,
      },
      { label: "Area per sprinkler", text: f(area, u.area, "up"), value: area, unit: u.area },
    ],
    checks: r.checks.map((c) => ({ status: c.status, text: c.message })),
    notes: [
      "A regular grid with each sprinkler centred in its share of the room. The spacing, area, wall-distance and obstruction rules that apply are the sprinkler's listing and the adopted code's.",
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}
