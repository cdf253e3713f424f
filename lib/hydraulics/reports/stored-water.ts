import type { StoredWaterReportInput } from "../schemas";
import { storedWaterGal } from "../storage";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";
import { englishReportT, type ReportT } from "./text";

export function storedWaterReport({ units, flow: q, duration: minutes }: StoredWaterReportInput, t: ReportT = englishReportT): CalculatorReport {
  const u = unitSet(units);
  const gal = mapErrors({ flowGpm: "flow", durationMin: "duration" }, () => storedWaterGal(toUs("flow", q, units), minutes));
  const v = fromUs("volume", gal, units);
  return {
    id: "stored-water",
    title: t("title.stored-water"),
    units,
    formula: [t("storedWater.formula", { volume: u.volume, flow: u.flow })],
    inputs: [
      { label: t("storedWater.designFlow"), text: f(q, u.flow) },
      { label: t("storedWater.designDuration"), text: `${f(minutes, "min")}` },
    ],
    steps: [{ label: t("storedWater.volume"), work: `${g(q)} × ${g(minutes)}`, text: f(v, u.volume, "up") }],
    results: [{ label: t("storedWater.waterToStore"), text: f(v, u.volume, "up"), value: v, unit: u.volume }],
    checks: [
      { status: "check", text: t("storedWater.checkUsable") },
    ],
    notes: [
      t("storedWater.noteDuration"),
      t("storedWater.noteRounded"),
    ],
    caution: t("common.caution"),
  };
}
