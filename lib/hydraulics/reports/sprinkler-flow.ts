import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import type { SprinklerFlowReportInput } from "../schemas";
import { CODE_FLOORS, sprinklerFlowGpm, sprinklerPressurePsi } from "../sprinkler";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, unitSet, type CalculatorReport } from "./common";

const NAMES = { kFactor: "k", pressurePsi: "pressure", flowGpm: "flow" };

export function sprinklerFlowReport(input: SprinklerFlowReportInput): CalculatorReport {
  const { units, solveFor, k } = input;
  const u = unitSet(units);
  const kUs = toUs("k", k, units);
  const floor = fromUs("pressure", CODE_FLOORS.minPressurePsi, units);
  const formula =
    solveFor === "flow"
      ? [`Q = K × √P   (Q in ${u.flow}, K in ${u.kLabel}, P in ${u.pressure})`]
      : [
          `P = (Q ÷ K)²   (P in ${u.pressure}, Q in ${u.flow}, K in ${u.kLabel})`,
          `and never below ${f(floor, u.pressure)}, NFPA 13D's minimum operating pressure`,
        ];
  const other = units === "si" ? `K ${f(kUs, "K-US")} in US units` : `K ${f(fromUs("k", kUs, "si"), "K-SI")} in SI units`;
  const notes = [
    "Q = K√P is the discharge relation used by NFPA 13 and NFPA 13D. The K-factor, and the minimum flow and pressure for each coverage area, come from the sprinkler's listing.",
    `Code floor: ${CODE_FLOORS.source.minPressurePsi}.`,
    `The same sprinkler is ${other} (K_SI = K_US × 14.416, from the gallon and the bar).`,
  ];
  const base = { id: "sprinkler-flow" as const, title: CALCULATOR_INFO["sprinkler-flow"].title, units, formula, caution: CALCULATOR_CAUTION_TEXT };
  if (solveFor === "flow") {
    const p = input.pressure as number; // the schema requires it when solving for flow
    const qUs = mapErrors(NAMES, () => sprinklerFlowGpm(kUs, toUs("pressure", p, units)));
    const q = fromUs("flow", qUs, units);
    const below = toUs("pressure", p, units) < CODE_FLOORS.minPressurePsi;
    return {
      ...base,
      inputs: [
        { label: "K-factor", text: `${f(k, u.k)} ${u.kLabel}` },
        { label: "Pressure at the sprinkler", text: f(p, u.pressure) },
      ],
      steps: [
        { label: "Square root of the pressure", work: `√${g(p)}`, text: g(Math.sqrt(p)) },
        { label: "Flow", work: `${g(k)} × ${g(Math.sqrt(p))}`, text: f(q, u.flow) },
      ],
      results: [{ label: "Flow from the sprinkler", text: f(q, u.flow), value: q, unit: u.flow }],
      checks: below
        ? [
            {
              status: "fails",
              text: `${f(p, u.pressure)} is below NFPA 13D's minimum operating pressure of ${f(floor, u.pressure)}: a design sprinkler must have at least that.`,
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
      { label: "K-factor", text: `${f(k, u.k)} ${u.kLabel}` },
      { label: "Flow wanted", text: f(q, u.flow) },
    ],
    steps: [
      { label: "Flow ÷ K", work: `${g(q)} ÷ ${g(k)}`, text: g(q / k) },
      { label: "Pressure from the flow", work: `${g(q / k)}²`, text: f(pFormula, u.pressure, "up") },
      {
        label: "Pressure needed (at least the code's minimum)",
        work: `larger of ${g(pFormula)} and ${g(floor)}`,
        text: f(p, u.pressure, "up"),
      },
    ],
    results: [{ label: "Pressure needed at the sprinkler", text: f(p, u.pressure, "up"), value: p, unit: u.pressure }],
    checks: floorGoverns
      ? [
          {
            status: "check",
            text: `(Q ÷ K)² gives ${f(pFormula, u.pressure, "up")}, below NFPA 13D's ${f(floor, u.pressure)} minimum operating pressure, so ${f(floor, u.pressure)} governs; the sprinkler then flows K√P, more than asked.`,
          },
        ]
      : [],
    notes: [...notes, "Pressure needed is rounded up, so the display never understates it."],
  };
}
