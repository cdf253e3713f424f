/**
 * System demand report: each step back from the design sprinklers to the source with its numbers,
 * the demand, and (with a flow test) the supply, the margin and a chart.
 */
import { CALCULATOR_CAUTION_TEXT, CALCULATOR_INFO } from "../catalog";
import { systemDemand } from "../demand";
import { HydraulicsInputError } from "../errors";
import { supplyMargin } from "../flow-test";
import { PIPE_DATA } from "../pipe-data";
import type { RoundingDirection } from "../rounding";
import type { SystemDemandReportInput } from "../schemas";
import { CODE_FLOORS } from "../sprinkler";
import { fromUs } from "../units";
import { f, g, mapErrors, supplyComparison, unitSet, type CalculatorReport, type ReportStep } from "./common";
import { demandInputUs } from "./demand-input";
import { NOMINAL_BORE_NOTE } from "./fittings";
import { FLOW_TEST_NAMES } from "./flow-test";
import { supplyChart } from "./supply";

export function systemDemandReport(raw: SystemDemandReportInput): CalculatorReport {
  const { units } = raw;
  const u = unitSet(units);
  const { input, supply, fieldOf } = demandInputUs(raw);
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
    return m ? ` (set by the ${m[1]})` : "";
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
      const elevText = d.elevationChangeFt === 0 ? "" : `; elevation ${g(fromUs("length", d.elevationChangeFt, units))} ${u.length} → ${g(elev)} ${u.pressure}`;
      return {
        label: `${s.label}: ${PIPE_DATA[d.material].label}, ${d.nominalSize} in, ${Q(s.flowGpm)}`,
        work: `bore ${g(fromUs("diameter", d.insideDiameterIn, units))} ${u.diameter} (${d.insideDiameterBasis.split(":")[0]}); ${g(per)} ${u.lossPerLength} × ${g(len)} ${u.length} (${g(fromUs("length", d.fittingsEquivalentFt, units))} of it fittings) = ${g(fric)} ${u.pressure}${elevText}; velocity ${g(vel)} ${u.velocity}`,
        text: `+${P(s.pressureAddedPsi)} → ${P(s.pressureRequiredPsi, "up")}`,
      };
    }
    if (s.kind === "sprinkler") {
      return {
        label: `${s.label}: ${Q(s.flowGpm)}`,
        work: `largest of the listed flow, K√(listed pressure), ${density} × coverage and K√(${P(CODE_FLOORS.minPressurePsi)}); P = (Q ÷ K)²${governor(s.note)}`,
        text: P(s.pressureRequiredPsi, "up"),
      };
    }
    if (s.kind === "balance") {
      // the library's note states psi; say it in the report's units
      const node = result.steps.find((x) => x.kind === "junction")?.pressureRequiredPsi;
      const work =
        node === undefined
          ? (s.note ?? "")
          : `At the split point this branch sees ${P(node)}, more than its minimum needs, so it flows more than its listed minimum.`;
      return { label: `${s.label}: ${Q(s.flowGpm)}`, work, text: P(s.pressureRequiredPsi, "up") };
    }
    if (s.kind === "additional-flow") {
      return {
        label: `${s.label}: ${Q(s.flowGpm)}`,
        work: `drawn at the same time: ${Q(result.flowGpm - s.flowGpm)} to the sprinklers + ${Q(s.flowGpm)} = ${Q(result.flowGpm)} through the supply path`,
        text: P(s.pressureRequiredPsi, "up"),
      };
    }
    if (s.kind === "device") {
      return { label: s.label, work: "entered loss at the design flow", text: `+${P(s.pressureAddedPsi)} → ${P(s.pressureRequiredPsi, "up")}` };
    }
    return { label: `${s.label}: ${Q(s.flowGpm)}`, work: s.note ?? "", text: P(s.pressureRequiredPsi, "up") };
  });

  const flow = fromUs("flow", result.flowGpm, units);
  const pressure = fromUs("pressure", result.pressurePsi, units);
  const report: CalculatorReport = {
    id: "system-demand",
    title: CALCULATOR_INFO["system-demand"].title,
    units,
    formula: [
      "Sprinkler: Q = the largest of the listed flow, K√(listed minimum pressure), 0.05 gpm/ft² × coverage area and K√(7 psi); P = (Q ÷ K)²",
      `Each pipe run: Hazen-Williams loss × (length + fittings) + ${units === "si" ? "0.098 bar/m" : "0.433 psi/ft"} × rise`,
      "Demand at the source = sprinkler pressure + every run's loss and rise + device losses",
    ],
    inputs: [
      ...result.sprinklers.map((s) => ({ label: s.label, text: `K ${f(fromUs("k", s.kFactor, units), u.k)}` })),
      { label: "Pipe runs", text: String(input.supplyPath.length) },
      ...(input.deviceLosses ?? []).map((d) => ({ label: d.label, text: P(d.lossPsi) })),
      ...(input.additionalFlowGpm ? [{ label: "Additional flow", text: Q(input.additionalFlowGpm) }] : []),
      ...(input.sprinklers.some((s) => s.coverageAreaSqFt === undefined)
        ? []
        : input.sprinklers.map((s, i) => ({ label: `Coverage, sprinkler ${String.fromCharCode(65 + i)}`, text: f(fromUs("area", s.coverageAreaSqFt ?? 0, units), u.area) }))),
    ],
    steps,
    results: [
      { label: "Pressure needed at the source", text: f(pressure, u.pressure, "up"), value: pressure, unit: u.pressure },
      { label: "Flow needed at the source", text: f(flow, u.flow, "up"), value: flow, unit: u.flow },
    ],
    checks: [
      {
        status: "check",
        text: "The number of design sprinklers, their listed flows and pressures, and whether domestic flow is added come from the listing and the adopted code.",
      },
    ],
    notes: [
      "Friction: Hazen-Williams as printed in NFPA 13; bores: copper and steel the published IDs (ASTM B88, ASME B36.10M), CPVC and PEX the average bore, OD − 2 × (minimum wall + half the wall tolerance) of ASTM F442 and ASTM F876 (tolerances from memory — verify); a listed inside diameter you enter governs. C-factors from NFPA 13's table (from memory — verify).",
      `Code floors per design sprinkler: ${CODE_FLOORS.source.minDensityGpmPerSqFt}; ${CODE_FLOORS.source.minPressurePsi}.`,
      NOMINAL_BORE_NOTE,
      "Fittings on steel and copper: NFPA 13's equivalent length chart with its C-factor multiplier (from memory — verify); CPVC and PEX: the maker's listed lengths you entered.",
      "With two sprinklers the one needing less pressure is balanced to the split point, so it flows a little more than its minimum. Requirements are rounded up.",
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
  if (result.clampedAtZero) {
    report.checks.push({ status: "check", text: "A large drop in elevation more than paid for the losses somewhere; the requirement there was held at 0." });
  }
  if (supply) {
    const m = mapErrors(FLOW_TEST_NAMES, () => supplyMargin({ flowGpm: result.flowGpm, pressurePsi: result.pressurePsi }, supply), "supply.");
    const available = fromUs("pressure", m.availablePsi, units);
    const c = supplyComparison(available, pressure, m.result === "pass", u.pressure);
    report.results.push(
      { label: "Pressure the supply offers at that flow", text: f(available, u.pressure, "down"), value: available, unit: u.pressure },
      { label: c.pass ? "Margin" : "Shortfall", text: c.text, value: c.value, unit: u.pressure },
    );
    report.steps.push(
      { label: "Supply from the flow test at the demand flow", work: "P = Ps − (Ps − Pr) × (Q ÷ Qt)^1.85 (NFPA 291)", text: f(available, u.pressure, "down") },
      { label: c.pass ? "Margin" : "Shortfall", work: c.work, text: c.text },
    );
    report.verdict = c.pass
      ? { result: "pass", text: `Supply exceeds the demand by ${c.text}.` }
      : {
          result: "short",
          text: `Supply is short by ${c.text}: the system will not deliver its design flow as drawn. A qualified designer decides the change (pipe or service size, a pump or a tank) with the AHJ.`,
        };
    report.chart = supplyChart(supply, { flowGpm: result.flowGpm, pressurePsi: result.pressurePsi }, units);
  }
  return report;
}
