import { flowAtResidualGpm, flowTestAvailablePsi, supplyMargin, type FlowTest } from "../flow-test";
import type { FlowTestReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, supplyComparison, unitSet, type CalculatorReport } from "./common";
import { supplyChart } from "./supply";
import { englishReportT, type ReportT } from "./text";

export const FLOW_TEST_NAMES = {
  staticPsi: "staticPressure",
  residualPsi: "residualPressure",
  testFlowGpm: "testFlow",
  demandFlowGpm: "demandFlow",
  residualTargetPsi: "residualTarget",
  demandPressurePsi: "demandPressure",
  maxFlowGpm: "testFlow",
};

export function flowTestReport(input: FlowTestReportInput, t: ReportT = englishReportT): CalculatorReport {
  const { units, staticPressure: ps, residualPressure: pr, testFlow: qt, demandFlow: qd, demandPressure: pd } = input;
  const target = input.residualTarget ?? (units === "si" ? 1.4 : 20);
  const u = unitSet(units);
  const test: FlowTest = { staticPsi: toUs("pressure", ps, units), residualPsi: toUs("pressure", pr, units), testFlowGpm: toUs("flow", qt, units) };
  const avail = mapErrors(FLOW_TEST_NAMES, () => flowTestAvailablePsi(test, toUs("flow", qd, units)));
  const qR = mapErrors(FLOW_TEST_NAMES, () => flowAtResidualGpm(test, toUs("pressure", target, units)));
  const ratio = qd / qt;
  const drop = ps - pr;
  const available = fromUs("pressure", avail.pressurePsi, units);

  const report: CalculatorReport = {
    id: "flow-test",
    title: t("title.flow-test"),
    units,
    formula: [
      t("flowTest.formulaPressure"),
      t("flowTest.formulaFlow"),
    ],
    inputs: [
      { label: t("flowTest.staticPressure"), text: f(ps, u.pressure) },
      { label: t("flowTest.residualPressure"), text: f(pr, u.pressure) },
      { label: t("flowTest.testFlow"), text: f(qt, u.flow) },
      { label: t("flowTest.designFlow"), text: f(qd, u.flow) },
      ...(pd === undefined ? [] : [{ label: t("flowTest.pressureNeeded"), text: f(pd, u.pressure) }]),
    ],
    steps: [
      { label: t("flowTest.drop"), work: `${g(ps)} − ${g(pr)}`, text: f(drop, u.pressure) },
      { label: t("flowTest.ratio"), work: `(${g(qd)} ÷ ${g(qt)})^1.85`, text: g(ratio ** 1.85) },
      {
        label: t("flowTest.available"),
        work: `${g(ps)} − ${g(drop)} × ${g(ratio ** 1.85)}`,
        text: f(available, u.pressure, "down"),
      },
      {
        label: t("flowTest.flowAtResidual", { pressure: f(target, u.pressure) }),
        work: `${g(qt)} × ((${g(ps)} − ${g(target)}) ÷ ${g(drop)})^0.54`,
        text: f(fromUs("flow", qR, units), u.flow, "down"),
      },
    ],
    results: [
      { label: t("flowTest.available"), text: f(available, u.pressure, "down"), value: available, unit: u.pressure },
      {
        label: t("flowTest.flowAtResidual", { pressure: f(target, u.pressure) }),
        text: f(fromUs("flow", qR, units), u.flow, "down"),
        value: fromUs("flow", qR, units),
        unit: u.flow,
      },
    ],
    checks: [],
    notes: [
      t("flowTest.noteFormulas"),
      t("flowTest.noteOnePlace"),
      t("flowTest.noteCarry"),
    ],
    chart: supplyChart(test, pd === undefined ? null : { flowGpm: toUs("flow", qd, units), pressurePsi: toUs("pressure", pd, units) }, units),
    caution: t("common.caution"),
  };
  if (avail.beyondSupply) {
    report.checks.push({ status: "fails", text: t("flowTest.checkBeyond") });
  }
  if (avail.extrapolated) {
    report.checks.push({ status: "check", text: t("flowTest.checkExtrapolated") });
  }
  if (pd !== undefined) {
    const m = supplyMargin({ flowGpm: Math.max(toUs("flow", qd, units), 1e-9), pressurePsi: toUs("pressure", pd, units) }, test);
    const c = supplyComparison(available, pd, m.result === "pass", u.pressure, t);
    const marginLabel = c.pass ? t("common.margin") : t("common.shortfall");
    report.steps.push({ label: marginLabel, work: c.work, text: c.text });
    report.results.push({ label: marginLabel, text: c.text, value: c.value, unit: u.pressure });
    report.verdict = c.pass
      ? { result: "pass", text: t("flowTest.verdictPass", { margin: c.text, flow: f(qd, u.flow) }) }
      : {
          result: "short",
          text: t("flowTest.verdictShort", { shortfall: c.text, flow: f(qd, u.flow) }),
        };
  }
  return report;
}
