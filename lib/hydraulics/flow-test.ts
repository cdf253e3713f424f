/**
 * Water supply from a hydrant flow test (NFPA 291, flow testing and the calculation of results).
 *
 * A test reads the static pressure Ps (no flow), then the residual pressure Pr while a measured flow
 * Qt is discharged. Friction in the mains grows with Q^1.85, so the pressure available at another
 * flow Q is
 *   P(Q) = Ps − (Ps − Pr) · (Q / Qt)^1.85
 * and the flow available at a chosen residual pressure (NFPA 291's form) is
 *   Q_R = Q_F · (H_R / H_F)^0.54     H_R = Ps − chosen residual, H_F = Ps − Pr  (0.54 ≈ 1/1.85)
 *
 * Results are for the test location and time. Supplies vary by season and hour, and the water
 * purveyor or the AHJ may require a safety margin below the test curve; elevation between the
 * gauge and the building is carried separately (a segment's elevation change in the demand).
 */
import { HydraulicsInputError, INPUT_LIMITS, requireNonNegative, requirePositive } from "./errors";

export const FLOW_TEST_PRESSURE_EXPONENT = 1.85;
export const FLOW_TEST_FLOW_EXPONENT = 0.54;

export interface FlowTest {
  staticPsi: number;
  residualPsi: number;
  testFlowGpm: number;
}

function checkFlowTest(test: FlowTest): FlowTest {
  const staticPsi = requirePositive("staticPsi", test.staticPsi, INPUT_LIMITS.pressurePsi);
  const residualPsi = requireNonNegative("residualPsi", test.residualPsi, INPUT_LIMITS.pressurePsi);
  if (residualPsi >= staticPsi) {
    throw new HydraulicsInputError(
      "residualPsi",
      "must be below the static pressure: a test with no pressure drop cannot be projected to other flows",
    );
  }
  const testFlowGpm = requirePositive("testFlowGpm", test.testFlowGpm, INPUT_LIMITS.flowGpm);
  return { staticPsi, residualPsi, testFlowGpm };
}

export interface AvailablePressure {
  /** pressure available at the flow, psi; never below 0 */
  pressurePsi: number;
  /** the formula gave less than 0: the supply cannot deliver this flow at all */
  beyondSupply: boolean;
  /** the flow is larger than the flow tested: the curve is extended past what was measured */
  extrapolated: boolean;
}

/** pressure available at flowGpm from a flow test: P = Ps − (Ps − Pr)·(Q/Qt)^1.85, floored at 0 */
export function flowTestAvailablePsi(test: FlowTest, flowGpm: number): AvailablePressure {
  const t = checkFlowTest(test);
  const q = requireNonNegative("demandFlowGpm", flowGpm, INPUT_LIMITS.flowGpm);
  const p = t.staticPsi - (t.staticPsi - t.residualPsi) * (q / t.testFlowGpm) ** FLOW_TEST_PRESSURE_EXPONENT;
  return { pressurePsi: Math.max(0, p), beyondSupply: p < 0, extrapolated: q > t.testFlowGpm };
}

/** flow available at a chosen residual pressure (NFPA 291): Q_R = Q_F·(H_R/H_F)^0.54 */
export function flowAtResidualGpm(test: FlowTest, residualTargetPsi: number): number {
  const t = checkFlowTest(test);
  const target = requireNonNegative("residualTargetPsi", residualTargetPsi, INPUT_LIMITS.pressurePsi);
  if (target >= t.staticPsi) {
    throw new HydraulicsInputError("residualTargetPsi", "must be below the static pressure");
  }
  const hR = t.staticPsi - target;
  const hF = t.staticPsi - t.residualPsi;
  return t.testFlowGpm * (hR / hF) ** FLOW_TEST_FLOW_EXPONENT;
}

export interface DemandPoint {
  flowGpm: number;
  pressurePsi: number;
}

export interface SupplyMarginResult {
  demandFlowGpm: number;
  requiredPsi: number;
  availablePsi: number;
  /** available − required when the supply is enough, else 0 */
  marginPsi: number;
  /** required − available when the supply is short, else 0 */
  shortfallPsi: number;
  result: "pass" | "short";
  beyondSupply: boolean;
  extrapolated: boolean;
}

/**
 * Compare a demand (flow and pressure needed at the source) with a supply: a flow test, or a pressure
 * known to be available at the demand flow. Neither margin nor shortfall is ever negative.
 */
export function supplyMargin(demand: DemandPoint, supply: FlowTest | { availablePsi: number }): SupplyMarginResult {
  const flowGpm = requirePositive("demandFlowGpm", demand.flowGpm, INPUT_LIMITS.flowGpm);
  const requiredPsi = requireNonNegative("demandPressurePsi", demand.pressurePsi, INPUT_LIMITS.pressurePsi);
  let availablePsi: number;
  let beyondSupply = false;
  let extrapolated = false;
  if ("availablePsi" in supply) {
    availablePsi = requireNonNegative("availablePsi", supply.availablePsi, INPUT_LIMITS.pressurePsi);
  } else {
    const a = flowTestAvailablePsi(supply, flowGpm);
    availablePsi = a.pressurePsi;
    beyondSupply = a.beyondSupply;
    extrapolated = a.extrapolated;
  }
  const diff = availablePsi - requiredPsi;
  const pass = diff >= 0 && !beyondSupply;
  return {
    demandFlowGpm: flowGpm,
    requiredPsi,
    availablePsi,
    marginPsi: pass ? diff : 0,
    shortfallPsi: pass ? 0 : Math.max(0, -diff),
    result: pass ? "pass" : "short",
    beyondSupply,
    extrapolated,
  };
}
