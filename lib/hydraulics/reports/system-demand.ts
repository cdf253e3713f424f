/**
 * System demand report: each step back from the design sprinklers to the source with its numbers,
 * the demand, and (with a flow test) the supply, the margin and a chart.
 */
import { systemDemand } from "../demand";
import { HydraulicsInputError } from "../errors";
import { supplyMargin } from "../flow-test";
import type { RoundingDirection } from "../rounding";
import type { SystemDemandReportInput } from "../schemas";
import { CODE_FLOORS } from "../sprinkler";
import { fromUs } from "../units";
import { f, g, mapErrors, supplyComparison, unitSet, type CalculatorReport, type ReportStep } from "./common";
import { demandInputUs } from "./demand-input";
import { FLOW_TEST_NAMES } from "./flow-test";
import { supplyChart } from "./supply";
import { englishReportT, type ReportT } from "./text";

/** what set a sprinkler's design point (the library's words) → its calcReports key */
const GOVERNORS: Record<string, string> = {
  "listed flow": "listedFlow",
  "listed minimum pressure": "listedMinimumPressure",
  "code minimum density": "codeMinimumDensity",
  "code minimum pressure": "codeMinimumPressure",
  "balanced to the split-point pressure": "balanced",
};

export function systemDemandReport(raw: SystemDemandReportInput, t: ReportT = englishReportT): CalculatorReport {
  const { units } = raw;
  const u = unitSet(units);
  const { input, supply, fieldOf } = demandInputUs(raw, t);
  let result: ReturnType<typeof systemDemand>;
  try {
    result = systemDemand(input);
  } catch (e) {
    if (e instanceof HydraulicsInputError) throw fieldOf(e);
    throw e;
  }

  // NFPA 13D's density floor in the report's units: 0.05 gpm/ft² = 2.04 L/min/m²
  const densityValue = fromUs("flow", CODE_FLOORS.minDensityGpmPerSqFt, units) / fromUs("area", 1, units);
  const density = `${g(Number(densityValue.toPrecision(3)))} ${u.flow}/${u.area}`;
  const governor = (note: string | undefined) => {
    const m = /set by the (.+)$/.exec(note ?? "");
    if (!m) return "";
    const what = m[1] ?? "";
    return t("systemDemand.setBy", { what: GOVERNORS[what] ? t(`governor.${GOVERNORS[what]}`) : what });
  };
  // the library's bore basis up to its colon, in the report's language
  const boreBasis = (basis: string) => {
    const head = basis.split(":")[0] ?? "";
    if (head === "average bore") return t("frictionLoss.averageBore");
    if (head === "published ID") return t("frictionLoss.publishedId");
    if (head === "entered from the pipe's listing") return t("systemDemandSteps.boreEntered");
    return head;
  };
  const P = (psi: number, dir: RoundingDirection = "nearest") => f(fromUs("pressure", psi, units), u.pressure, dir);
  const Q = (gpm: number) => f(fromUs("flow", gpm, units), u.flow);
  const steps: ReportStep[] = result.steps.map((s) => {
    if (s.kind === "pipe" && s.segment) {
      const d = s.segment;
      const len = fromUs("length", d.totalLengthFt, units);
      const per = fromUs("lossPerLength", d.lossPsiPerFt, units);
      const vel = fromUs("velocity", d.velocityFtPerS, units);
      const fric = fromUs("pressure", d.frictionPsi, units);
      const elev = fromUs("pressure", d.elevationPsi, units);
      const elevText =
        d.elevationChangeFt === 0
          ? ""
          : t("systemDemand.elevation", {
              rise: g(fromUs("length", d.elevationChangeFt, units)),
              lengthUnit: u.length,
              pressure: g(elev),
              pressureUnit: u.pressure,
            });
      return {
        label: t("systemDemand.pipeLabel", { label: s.label, material: t(`material.${d.material}`), size: d.nominalSize, flow: Q(s.flowGpm) }),
        work: t("systemDemand.pipeWork", {
          bore: g(fromUs("diameter", d.insideDiameterIn, units)),
          diameterUnit: u.diameter,
          basis: boreBasis(d.insideDiameterBasis),
          perLength: g(per),
          lossUnit: u.lossPerLength,
          length: g(len),
          lengthUnit: u.length,
          fittings: g(fromUs("length", d.fittingsEquivalentFt, units)),
          friction: g(fric),
          pressureUnit: u.pressure,
          elevation: elevText,
          velocity: g(vel),
          velocityUnit: u.velocity,
        }),
        text: `+${P(s.pressureAddedPsi)} → ${P(s.pressureRequiredPsi, "up")}`,
      };
    }
    if (s.kind === "sprinkler") {
      return {
        label: `${s.label}: ${Q(s.flowGpm)}`,
        work: t("systemDemand.sprinklerWork", { density, floor: P(CODE_FLOORS.minPressurePsi), governor: governor(s.note) }),
        text: P(s.pressureRequiredPsi, "up"),
      };
    }
    if (s.kind === "balance") {
      // the library's note states psi; say it in the report's units
      const node = result.steps.find((x) => x.kind === "junction")?.pressureRequiredPsi;
      const work =
        node === undefined
          ? (s.note ?? "")
          : t("systemDemand.balanceWork", { pressure: P(node) });
      const name = s.label.endsWith(" balanced") ? t("systemDemandSteps.balanced", { label: s.label.slice(0, -" balanced".length) }) : s.label;
      return { label: `${name}: ${Q(s.flowGpm)}`, work, text: P(s.pressureRequiredPsi, "up") };
    }
    if (s.kind === "additional-flow") {
      return {
        label: `${t("systemDemand.additionalFlow")}: ${Q(s.flowGpm)}`,
        work: t("systemDemand.additionalWork", { sprinklers: Q(result.flowGpm - s.flowGpm), additional: Q(s.flowGpm), total: Q(result.flowGpm) }),
        text: P(s.pressureRequiredPsi, "up"),
      };
    }
    if (s.kind === "device") {
      return { label: s.label, work: t("systemDemand.deviceWork"), text: `+${P(s.pressureAddedPsi)} → ${P(s.pressureRequiredPsi, "up")}` };
    }
    if (s.kind === "junction") {
      return { label: `${t("systemDemandSteps.splitPoint")}: ${Q(s.flowGpm)}`, work: t("systemDemandSteps.junctionWork"), text: P(s.pressureRequiredPsi, "up") };
    }
    return { label: `${s.label}: ${Q(s.flowGpm)}`, work: s.note ?? "", text: P(s.pressureRequiredPsi, "up") };
  });

  const flow = fromUs("flow", result.flowGpm, units);
  const pressure = fromUs("pressure", result.pressurePsi, units);
  const report: CalculatorReport = {
    id: "system-demand",
    title: t("title.system-demand"),
    units,
    formula: [
      t("systemDemand.formulaSprinkler"),
      t("systemDemand.formulaRun", { rate: units === "si" ? "0.098 bar/m" : "0.433 psi/ft" }),
      t("systemDemand.formulaSource"),
    ],
    inputs: [
      ...result.sprinklers.map((s) => ({ label: s.label, text: `K ${f(fromUs("k", s.kFactor, units), u.k)}` })),
      { label: t("systemDemand.pipeRuns"), text: String(input.supplyPath.length) },
      ...(input.deviceLosses ?? []).map((d) => ({ label: d.label, text: P(d.lossPsi) })),
      ...(input.additionalFlowGpm ? [{ label: t("systemDemand.additionalFlow"), text: Q(input.additionalFlowGpm) }] : []),
      ...(input.sprinklers.some((s) => s.coverageAreaSqFt === undefined)
        ? []
        : input.sprinklers.map((s, i) => ({ label: t("systemDemand.coverage", { letter: String.fromCharCode(65 + i) }), text: f(fromUs("area", s.coverageAreaSqFt ?? 0, units), u.area) }))),
    ],
    steps,
    results: [
      { label: t("systemDemand.pressureAtSource"), text: f(pressure, u.pressure, "up"), value: pressure, unit: u.pressure },
      { label: t("systemDemand.flowAtSource"), text: f(flow, u.flow, "up"), value: flow, unit: u.flow },
    ],
    checks: [
      {
        status: "check",
        text: t("systemDemand.checkListing"),
      },
    ],
    notes: [
      t("systemDemand.noteFriction"),
      t("systemDemand.noteFloors", { density: t("codeFloor.minDensity"), pressure: t("codeFloor.minPressure") }),
      t("common.nominalBore"),
      t("systemDemand.noteFittings"),
      t("systemDemand.noteBalance"),
    ],
    caution: t("common.caution"),
  };
  if (result.clampedAtZero) {
    report.checks.push({ status: "check", text: t("systemDemand.checkClamped") });
  }
  if (supply) {
    const m = mapErrors(FLOW_TEST_NAMES, () => supplyMargin({ flowGpm: result.flowGpm, pressurePsi: result.pressurePsi }, supply), "supply.");
    const available = fromUs("pressure", m.availablePsi, units);
    const c = supplyComparison(available, pressure, m.result === "pass", u.pressure, t);
    const marginLabel = c.pass ? t("common.margin") : t("common.shortfall");
    report.results.push(
      { label: t("systemDemand.supplyOffers"), text: f(available, u.pressure, "down"), value: available, unit: u.pressure },
      { label: marginLabel, text: c.text, value: c.value, unit: u.pressure },
    );
    report.steps.push(
      { label: t("systemDemand.supplyStep"), work: "P = Ps − (Ps − Pr) × (Q ÷ Qt)^1.85 (NFPA 291)", text: f(available, u.pressure, "down") },
      { label: marginLabel, work: c.work, text: c.text },
    );
    report.verdict = c.pass
      ? { result: "pass", text: t("systemDemand.verdictPass", { margin: c.text }) }
      : {
          result: "short",
          text: t("systemDemand.verdictShort", { shortfall: c.text }),
        };
    report.chart = supplyChart(supply, { flowGpm: result.flowGpm, pressurePsi: result.pressurePsi }, units);
  }
  return report;
}
