import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import { flowAtResidualGpm, flowTestAvailablePsi, supplyMargin, type FlowTest } from "../flow-test";
import type { FlowTestReportInput } from "../schemas";
import { fromUs, toUs } from "../units";
import { f, g, mapErrors, supplyComparison, unitSet, type CalculatorReport } from "./common";
import { supplyChart } from "./supply";

export const FLOW_TEST_NAMES = {
  staticPsi: "staticPressure",
  residualPsi: "residualPressure",
  testFlowGpm: "testFlow",
  demandFlowGpm: "demandFlow",
  residualTargetPsi: "residualTarget",
  demandPressurePsi: "demandPressure",
  maxFlowGpm: "testFlow",
};

export function flowTestReport(input: FlowTestReportInput): CalculatorReport {
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
    title: CALCULATOR_INFO["flow-test"].title,
    units,
    formula: [
      "P = Ps − (Ps − Pr) × (Q ÷ Qt)^1.85   (pressure available at flow Q)",
      "Q_R = Q_F × (H_R ÷ H_F)^0.54   (flow available at a chosen residual; H = static minus residual)",
    ],
    inputs: [
      { label: "Static pressure Ps", text: f(ps, u.pressure) },
      { label: "Residual pressure Pr", text: f(pr, u.pressure) },
      { label: "Test flow Qt", text: f(qt, u.flow) },
      { label: "Design flow Q", text: f(qd, u.flow) },
      ...(pd === undefined ? [] : [{ label: "Pressure needed at the design flow", text: f(pd, u.pressure) }]),
    ],
    steps: [
      { label: "Pressure drop during the test", work: `${g(ps)} − ${g(pr)}`, text: f(drop, u.pressure) },
      { label: "Flow ratio raised to 1.85", work: `(${g(qd)} ÷ ${g(qt)})^1.85`, text: g(ratio ** 1.85) },
      {
        label: "Pressure available at the design flow",
        work: `${g(ps)} − ${g(drop)} × ${g(ratio ** 1.85)}`,
        text: f(available, u.pressure, "down"),
      },
      {
        label: `Flow available at ${f(target, u.pressure)} residual`,
        work: `${g(qt)} × ((${g(ps)} − ${g(target)}) ÷ ${g(drop)})^0.54`,
        text: f(fromUs("flow", qR, units), u.flow, "down"),
      },
    ],
    results: [
      { label: "Pressure available at the design flow", text: f(available, u.pressure, "down"), value: available, unit: u.pressure },
      {
        label: `Flow available at ${f(target, u.pressure)} residual`,
        text: f(fromUs("flow", qR, units), u.flow, "down"),
        value: fromUs("flow", qR, units),
        unit: u.flow,
      },
    ],
    checks: [],
    notes: [
      "Formulas: NFPA 291, flow testing and the calculation of results. Available figures are rounded down so they never flatter the supply.",
      "A test describes the main at one place and time: supplies drop at peak hours and in dry seasons, and the water purveyor or the AHJ may require a margin below this curve.",
      "Carry the height between the test gauge and the building, and the service, meter and backflow losses, in the system demand.",
    ],
    chart: supplyChart(test, pd === undefined ? null : { flowGpm: toUs("flow", qd, units), pressurePsi: toUs("pressure", pd, units) }, units),
    caution: CALCULATOR_CAUTION_TEXT,
  };
  if (avail.beyondSupply) {
    report.checks.push({ status: "fails", text: "The test curve reaches 0 pressure before this flow: the main cannot deliver it." });
  }
  if (avail.extrapolated) {
    report.checks.push({ status: "check", text: "The design flow is above the flow tested: the curve is extended past what was measured." });
  }
  if (pd !== undefined) {
    const m = supplyMargin({ flowGpm: Math.max(toUs("flow", qd, units), 1e-9), pressurePsi: toUs("pressure", pd, units) }, test);
    const c = supplyComparison(available, pd, m.result === "pass", u.pressure);
    report.steps.push({ label: c.pass ? "Margin" : "Shortfall", work: c.work, text: c.text });
    report.results.push({ label: c.pass ? "Margin" : "Shortfall", text: c.text, value: c.value, unit: u.pressure });
    report.verdict = c.pass
      ? { result: "pass", text: `Supply exceeds the demand by ${c.text} at ${f(qd, u.flow)}.` }
      : {
          result: "short",
          text: `Supply is short by ${c.text} at ${f(qd, u.flow)}: the system will not deliver its design flow without a change (larger pipe or service, a pump or a tank — a qualified designer and the AHJ decide).`,
        };
  }
  return report;
}
