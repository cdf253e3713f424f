import type { SprinklerFlowReportInput } from "../schemas";
import { CODE_FLOORS, sprinklerFlowGpm, sprinklerPressurePsi } from "../sprinkler";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";
import { englishReportT, type ReportT } from "./text";

const NAMES = { kFactor: "k", pressurePsi: "pressure", flowGpm: "flow" };

export function sprinklerFlowReport(input: SprinklerFlowReportInput, t: ReportT = englishReportT): CalculatorReport {
  const { units, solveFor, k } = input;
  const u = unitSet(units);
  const kUs = toUs("k", k, units);
  const floor = fromUs("pressure", CODE_FLOORS.minPressurePsi, units);
  const formula =
    solveFor === "flow"
      ? [t("sprinklerFlow.formulaFlow", { flowUnit: u.flow, kUnit: u.kLabel, pressureUnit: u.pressure })]
      : [
          t("sprinklerFlow.formulaPressure", { pressureUnit: u.pressure, flowUnit: u.flow, kUnit: u.kLabel }),
          t("sprinklerFlow.formulaFloor", { floor: f(floor, u.pressure) }),
        ];
  const other = units === "si" ? t("sprinklerFlow.otherUs", { k: f(kUs, "K-US") }) : t("sprinklerFlow.otherSi", { k: f(fromUs("k", kUs, "si"), "K-SI") });
  const notes = [
    t("sprinklerFlow.noteDischarge"),
    t("sprinklerFlow.noteFloor", { source: t("codeFloor.minPressure") }),
    t("sprinklerFlow.noteSame", { other }),
  ];
  const base = { id: "sprinkler-flow" as const, title: t("title.sprinkler-flow"), units, formula, caution: t("common.caution") };
  if (solveFor === "flow") {
    const p = input.pressure as number; // the schema requires it when solving for flow
    const qUs = mapErrors(NAMES, () => sprinklerFlowGpm(kUs, toUs("pressure", p, units)));
    const q = fromUs("flow", qUs, units);
    const below = toUs("pressure", p, units) < CODE_FLOORS.minPressurePsi;
    return {
      ...base,
      inputs: [
        { label: t("sprinklerFlow.kFactor"), text: `${f(k, u.k)} ${u.kLabel}` },
        { label: t("sprinklerFlow.pressureAt"), text: f(p, u.pressure) },
      ],
      steps: [
        { label: t("sprinklerFlow.sqrt"), work: `√${g(p)}`, text: g(Math.sqrt(p)) },
        { label: t("sprinklerFlow.flow"), work: `${g(k)} × ${g(Math.sqrt(p))}`, text: f(q, u.flow) },
      ],
      results: [{ label: t("sprinklerFlow.flowFrom"), text: f(q, u.flow), value: q, unit: u.flow }],
      checks: below
        ? [
            {
              status: "fails",
              text: t("sprinklerFlow.checkBelow", { pressure: f(p, u.pressure), floor: f(floor, u.pressure) }),
            },
          ]
        : [],
      notes,
    };
  }
  const q = input.flow as number; // the schema requires it when solving for pressure
  const pUs = mapErrors(NAMES, () => sprinklerPressurePsi(kUs, toUs("flow", q, units)));
  const pFormula = fromUs("pressure", pUs, units);
  const floorGoverns = pUs < CODE_FLOORS.minPressurePsi;
  const p = floorGoverns ? floor : pFormula;
  return {
    ...base,
    inputs: [
      { label: t("sprinklerFlow.kFactor"), text: `${f(k, u.k)} ${u.kLabel}` },
      { label: t("sprinklerFlow.flowWanted"), text: f(q, u.flow) },
    ],
    steps: [
      { label: t("sprinklerFlow.flowOverK"), work: `${g(q)} ÷ ${g(k)}`, text: g(q / k) },
      { label: t("sprinklerFlow.pressureFromFlow"), work: `${g(q / k)}²`, text: f(pFormula, u.pressure, "up") },
      {
        label: t("sprinklerFlow.pressureNeeded"),
        work: t("sprinklerFlow.largerOf", { formula: g(pFormula), floor: g(floor) }),
        text: f(p, u.pressure, "up"),
      },
    ],
    results: [{ label: t("sprinklerFlow.pressureNeededAt"), text: f(p, u.pressure, "up"), value: p, unit: u.pressure }],
    checks: floorGoverns
      ? [
          {
            status: "check",
            text: t("sprinklerFlow.checkFloor", { pressure: f(pFormula, u.pressure, "up"), floor: f(floor, u.pressure) }),
          },
        ]
      : [],
    notes: [...notes, t("sprinklerFlow.noteRounded")],
  };
}
