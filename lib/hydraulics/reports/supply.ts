import { flowAtResidualGpm, flowTestAvailablePsi, type FlowTest } from "../flow-test";
import { fromUs, type Units } from "../units";
import { unitSet, type ReportChart } from "./common";

/**
 * The supply curve for a chart. The flow axis is sized to the design flow (1.5 × the demand flow,
 * so a home's 20–40 gpm point sits in the middle of the chart instead of squashed against the
 * axis beside a 1,000 gpm hydrant test); without a demand it runs to 1.5 × the test flow (or to
 * where the supply reaches 0). The test reading is plotted only when it falls on that range.
 */
export function supplyChart(test: FlowTest, demand: { flowGpm: number; pressurePsi: number } | null, units: Units): ReportChart {
  const u = unitSet(units);
  const zeroFlow = flowAtResidualGpm(test, 0);
  const maxGpm = demand && demand.flowGpm > 0 ? demand.flowGpm * 1.5 : Math.min(zeroFlow, test.testFlowGpm * 1.5);
  const supply = Array.from({ length: 41 }, (_, i) => {
    const q = (maxGpm * i) / 40;
    return { flow: fromUs("flow", q, units), pressure: fromUs("pressure", flowTestAvailablePsi(test, q).pressurePsi, units) };
  });
  return {
    flowUnit: u.flow,
    pressureUnit: u.pressure,
    flowMax: fromUs("flow", maxGpm, units),
    supply,
    demand: demand ? { flow: fromUs("flow", demand.flowGpm, units), pressure: fromUs("pressure", demand.pressurePsi, units) } : null,
    test:
      test.testFlowGpm <= maxGpm
        ? { flow: fromUs("flow", test.testFlowGpm, units), pressure: fromUs("pressure", test.residualPsi, units) }
        : null,
  };
}
