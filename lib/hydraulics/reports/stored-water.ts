import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import type { StoredWaterReportInput } from "../schemas";
import { storedWaterGal } from "../storage";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";

export function storedWaterReport({ units, flow: q, duration: t }: StoredWaterReportInput): CalculatorReport {
  const u = unitSet(units);
  const gal = mapErrors({ flowGpm: "flow", durationMin: "duration" }, () => storedWaterGal(toUs("flow", q, units), t));
  const v = fromUs("volume", gal, units);
  return {
    id: "stored-water",
    title: CALCULATOR_INFO["stored-water"].title,
    units,
    formula: [`V = Q × t   (V in ${u.volume}, Q in ${u.flow}, t in minutes)`],
    inputs: [
      { label: "Design flow", text: f(q, u.flow) },
      { label: "Design duration", text: `${f(t, "min")}` },
    ],
    steps: [{ label: "Volume", work: `${g(q)} × ${g(t)}`, text: f(v, u.volume, "up") }],
    results: [{ label: "Water to store", text: f(v, u.volume, "up"), value: v, unit: u.volume }],
    checks: [
      { status: "check", text: "This is usable water: add what the tank holds below its outlet and any allowance the tank or pump maker requires." },
    ],
    notes: [
      "The design duration comes from the adopted code (NFPA 13D sets it by the dwelling's size and stories — check the adopted edition and local amendments).",
      "Volume is rounded up, so the display never understates the tank.",
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}
