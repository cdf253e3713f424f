/**
 * (Over 300 lines on purpose: the walk back from the sprinklers, the balancing at the split point
 * and the supply path share one segment calculation and one step format; split, they would drift.)
 *
 * System demand: the flow and pressure needed at the water source to deliver the design sprinklers'
 * flows, following the path back from the sprinklers and adding, step by step, each segment's
 * friction (pipe plus fitting equivalent length), its elevation change and the device losses.
 *
 * Layout: `supplyPath` runs from the source to the point where the path splits to the design
 * sprinklers (or to the single sprinkler); each sprinkler may have its own `branch` from that
 * point. With two sprinklers, the one needing less pressure at the split point is balanced: its
 * flow is raised until its branch needs exactly the split-point pressure, as a hydraulic
 * calculation does at every junction. Segments are listed in flow order (source → sprinkler);
 * elevationChangeFt is the rise in that direction (negative if the pipe drops).
 *
 * The number of design sprinklers, their listed flows and pressures, and whether domestic flow must
 * be added all come from the sprinkler's listing and the adopted code — they are inputs here.
 */
import { HydraulicsInputError, INPUT_LIMITS, requireInRange, requireNonNegative, requirePositive } from "./errors";
import { elevationChangePsi } from "./elevation";
import { fittingsEquivalentLength, type FittingInput, type FittingLengthItem } from "./fittings";
import { frictionLossPsiPerFt, pipeVelocityFtPerS } from "./friction";
import { hazenWilliamsC, pipeDimensions, type NominalSize, type PipeMaterial } from "./pipe-data";
import { designSprinklerPoint } from "./sprinkler";

export interface PipeSegmentInput {
  label?: string;
  material: PipeMaterial;
  nominalSize: NominalSize;
  lengthFt: number;
  fittings?: FittingInput[];
  /** rise in the direction of flow, ft (negative = the pipe drops) */
  elevationChangeFt?: number;
  /** the maker's listed C-factor, if it differs from the table */
  cFactor?: number;
  /** the maker's listed inside diameter, if it differs from the table */
  insideDiameterIn?: number;
  /** a fixed flow for this segment instead of the flow derived from the sprinklers */
  flowGpm?: number;
}

export interface DesignSprinklerInput {
  label?: string;
  /** listed K-factor, gpm/psi^0.5 */
  kFactor: number;
  /** listed minimum flow for the coverage used, gpm */
  minFlowGpm: number;
  /** listed minimum pressure, psi, if the listing gives one */
  minPressurePsi?: number;
  /** the coverage area this sprinkler protects, ft² (for NFPA 13D's minimum density check) */
  coverageAreaSqFt?: number;
  /** pipe from the split point to this sprinkler, in flow order */
  branch?: PipeSegmentInput[];
}

export interface DeviceLossInput {
  /** e.g. "Water meter", "Backflow preventer", "Control valve" */
  label: string;
  /** loss at the design flow, psi, read from the device maker's flow-loss data */
  lossPsi: number;
}

export interface SystemDemandInput {
  /** one or two design sprinklers */
  sprinklers: DesignSprinklerInput[];
  /** pipe from the source to the split point, in flow order */
  supplyPath: PipeSegmentInput[];
  deviceLosses?: DeviceLossInput[];
  /** other flow drawn through the supply path at the same time (e.g. domestic flow where the adopted code requires it), gpm */
  additionalFlowGpm?: number;
}

export interface SegmentDetail {
  material: PipeMaterial;
  nominalSize: NominalSize;
  insideDiameterIn: number;
  /** "entered" when the user gave the listed inside diameter, else the table's basis */
  insideDiameterBasis: string;
  cFactor: number;
  lengthFt: number;
  /** mean velocity at this segment's flow, ft/s */
  velocityFtPerS: number;
  fittings: FittingLengthItem[];
  fittingsEquivalentFt: number;
  totalLengthFt: number;
  lossPsiPerFt: number;
  frictionPsi: number;
  elevationChangeFt: number;
  elevationPsi: number;
}

export interface DemandStep {
  kind: "sprinkler" | "pipe" | "balance" | "junction" | "device" | "additional-flow";
  label: string;
  /** flow through this step, gpm */
  flowGpm: number;
  /** pressure this step adds to the requirement, psi (negative where a pipe drops) */
  pressureAddedPsi: number;
  /** pressure required just upstream of this step, psi (never below 0) */
  pressureRequiredPsi: number;
  segment?: SegmentDetail;
  note?: string;
}

export interface SystemDemandResult {
  /** flow needed at the source, gpm */
  flowGpm: number;
  /** pressure needed at the source, psi */
  pressurePsi: number;
  sprinklers: { label: string; kFactor: number; flowGpm: number; pressurePsi: number; governedBy: string }[];
  steps: DemandStep[];
  /** a computed requirement fell below 0 somewhere and was held at 0 (a large drop in elevation) */
  clampedAtZero: boolean;
}

const round2 = (v: number) => String(Math.round(v * 100) / 100);

interface SegmentCalc {
  detail: SegmentDetail;
  addedPsi: number;
}

/** friction + elevation of one segment at a flow */
function segmentLoss(seg: PipeSegmentInput, flowGpm: number, field: string): SegmentCalc {
  const dims = pipeDimensions(seg.material, seg.nominalSize, `${field}.`);
  const cFactor = seg.cFactor ?? hazenWilliamsC(seg.material, `${field}.material`);
  const insideDiameterIn =
    seg.insideDiameterIn === undefined
      ? dims.insideDiameterIn
      : requireInRange(`${field}.insideDiameterIn`, seg.insideDiameterIn, INPUT_LIMITS.insideDiameterIn.min, INPUT_LIMITS.insideDiameterIn.max);
  const lengthFt = requireNonNegative(`${field}.lengthFt`, seg.lengthFt, INPUT_LIMITS.lengthFt);
  const fit = fittingsEquivalentLength(seg.material, seg.nominalSize, seg.fittings ?? [], {
    cFactor: seg.cFactor,
    insideDiameterIn: seg.insideDiameterIn,
    fieldPrefix: `${field}.`,
  });
  let lossPsiPerFt: number;
  try {
    lossPsiPerFt = frictionLossPsiPerFt(flowGpm, cFactor, insideDiameterIn);
  } catch (e) {
    if (e instanceof HydraulicsInputError) {
      const name = e.field === "flowGpm" ? "flowGpm" : e.field;
      throw new HydraulicsInputError(`${field}.${name}`, e.reason);
    }
    throw e;
  }
  const totalLengthFt = lengthFt + fit.totalFt;
  const frictionPsi = lossPsiPerFt * totalLengthFt;
  const elevationChangeFt = seg.elevationChangeFt ?? 0;
  const elevationPsi = elevationChangePsi(elevationChangeFt, `${field}.elevationChangeFt`);
  return {
    addedPsi: frictionPsi + elevationPsi,
    detail: {
      material: seg.material,
      nominalSize: seg.nominalSize,
      insideDiameterIn,
      insideDiameterBasis: seg.insideDiameterIn === undefined ? dims.boreBasis : "entered from the pipe's listing",
      cFactor,
      lengthFt,
      velocityFtPerS: pipeVelocityFtPerS(flowGpm, insideDiameterIn),
      fittings: fit.items,
      fittingsEquivalentFt: fit.totalFt,
      totalLengthFt,
      lossPsiPerFt,
      frictionPsi,
      elevationChangeFt,
      elevationPsi,
    },
  };
}

function segmentFlow(seg: PipeSegmentInput, derived: number, field: string): number {
  return seg.flowGpm === undefined ? derived : requirePositive(`${field}.flowGpm`, seg.flowGpm, INPUT_LIMITS.flowGpm);
}

/** pressure needed at the split point for a branch delivering flowGpm at sprinkler pressure pressurePsi */
function branchRequirement(
  branch: PipeSegmentInput[],
  flowGpm: number,
  pressurePsi: number,
  field: string,
): { nodePsi: number; steps: DemandStep[]; clamped: boolean } {
  let p = pressurePsi;
  let clamped = false;
  const steps: DemandStep[] = [];
  for (let i = branch.length - 1; i >= 0; i--) {
    const seg = branch[i]!;
    const f = `${field}[${i}]`;
    const q = segmentFlow(seg, flowGpm, f);
    const calc = segmentLoss(seg, q, f);
    p += calc.addedPsi;
    if (p < 0) {
      p = 0;
      clamped = true;
    }
    steps.push({
      kind: "pipe",
      label: seg.label ?? `Pipe ${i + 1}`,
      flowGpm: q,
      pressureAddedPsi: calc.addedPsi,
      pressureRequiredPsi: p,
      segment: calc.detail,
    });
  }
  return { nodePsi: p, steps, clamped };
}

export function systemDemand(input: SystemDemandInput): SystemDemandResult {
  const list = input.sprinklers;
  if (!Array.isArray(list) || list.length < 1 || list.length > 2) {
    throw new HydraulicsInputError("sprinklers", "give one or two design sprinklers");
  }
  if (!Array.isArray(input.supplyPath)) throw new HydraulicsInputError("supplyPath", "must be a list of pipe segments");
  const steps: DemandStep[] = [];
  let clampedAtZero = false;

  const heads = list.map((s, i) => {
    const field = `sprinklers[${i}]`;
    let point;
    try {
      point = designSprinklerPoint(s.kFactor, s.minFlowGpm, s.minPressurePsi, s.coverageAreaSqFt);
    } catch (e) {
      if (e instanceof HydraulicsInputError) throw new HydraulicsInputError(`${field}.${e.field}`, e.reason);
      throw e;
    }
    const label = s.label ?? `Sprinkler ${String.fromCharCode(65 + i)}`;
    const branch = s.branch ?? [];
    const req = branchRequirement(branch, point.flowGpm, point.pressurePsi, `${field}.branch`);
    return { s, i, field, label, branch, point, req };
  });

  // the branch needing the most pressure at the split point governs
  const governing = heads.reduce((a, b) => (b.req.nodePsi > a.req.nodePsi ? b : a));
  const nodePsi = governing.req.nodePsi;
  const sprinklers: SystemDemandResult["sprinklers"] = [];

  for (const h of heads) {
    steps.push({
      kind: "sprinkler",
      label: h.label,
      flowGpm: h.point.flowGpm,
      pressureAddedPsi: h.point.pressurePsi,
      pressureRequiredPsi: h.point.pressurePsi,
      note: `K ${h.s.kFactor}; set by the ${h.point.governedBy}`,
    });
    if (h === governing || heads.length === 1) {
      steps.push(...h.req.steps);
      clampedAtZero ||= h.req.clamped;
      sprinklers.push({
        label: h.label,
        kFactor: h.s.kFactor,
        flowGpm: h.point.flowGpm,
        pressurePsi: h.point.pressurePsi,
        governedBy: h.point.governedBy,
      });
      continue;
    }
    // balance: raise this sprinkler's flow until its branch needs exactly nodePsi
    const k = h.s.kFactor;
    const need = (q: number) => branchRequirement(h.branch, q, (q / k) ** 2, `${h.field}.branch`).nodePsi;
    let lo = h.point.flowGpm;
    let hi = Math.max(lo, k * Math.sqrt(nodePsi) + lo);
    while (need(hi) < nodePsi && hi < INPUT_LIMITS.flowGpm) hi = Math.min(hi * 2, INPUT_LIMITS.flowGpm);
    for (let it = 0; it < 200 && hi - lo > 1e-9 * hi; it++) {
      const mid = (lo + hi) / 2;
      if (need(mid) < nodePsi) lo = mid;
      else hi = mid;
    }
    const q = hi; // the bracket's upper end: never less flow than balance needs
    const balanced = branchRequirement(h.branch, q, (q / k) ** 2, `${h.field}.branch`);
    steps.push({
      kind: "balance",
      label: `${h.label} balanced`,
      flowGpm: q,
      pressureAddedPsi: (q / k) ** 2 - h.point.pressurePsi,
      pressureRequiredPsi: (q / k) ** 2,
      note: `At the split point this branch sees ${nodePsi.toFixed(2)} psi, more than its minimum needs, so it flows more than its listed minimum.`,
    });
    steps.push(...balanced.steps);
    clampedAtZero ||= balanced.clamped;
    sprinklers.push({
      label: h.label,
      kFactor: k,
      flowGpm: q,
      pressurePsi: (q / k) ** 2,
      governedBy: "balanced to the split-point pressure",
    });
  }

  const sprinklerFlow = sprinklers.reduce((sum, s) => sum + s.flowGpm, 0);
  if (heads.length === 2) {
    steps.push({
      kind: "junction",
      label: "Split point",
      flowGpm: sprinklerFlow,
      pressureAddedPsi: 0,
      pressureRequiredPsi: nodePsi,
      note: "Flows of both design sprinklers join here.",
    });
  }

  const additional =
    input.additionalFlowGpm === undefined
      ? 0
      : requireNonNegative("additionalFlowGpm", input.additionalFlowGpm, INPUT_LIMITS.flowGpm);
  const totalFlow = sprinklerFlow + additional;
  if (additional > 0) {
    // the step's flow is the ADDED flow; the total it makes is in the note and on the pipe steps that follow
    steps.push({
      kind: "additional-flow",
      label: "Additional flow",
      flowGpm: additional,
      pressureAddedPsi: 0,
      pressureRequiredPsi: nodePsi,
      note: `drawn at the same time through the supply path: sprinklers ${round2(sprinklerFlow)} + additional ${round2(additional)} = ${round2(totalFlow)} gpm`,
    });
  }

  let p = nodePsi;
  for (let i = input.supplyPath.length - 1; i >= 0; i--) {
    const seg = input.supplyPath[i]!;
    const f = `supplyPath[${i}]`;
    const q = segmentFlow(seg, totalFlow, f);
    const calc = segmentLoss(seg, q, f);
    p += calc.addedPsi;
    if (p < 0) {
      p = 0;
      clampedAtZero = true;
    }
    steps.push({
      kind: "pipe",
      label: seg.label ?? `Supply pipe ${i + 1}`,
      flowGpm: q,
      pressureAddedPsi: calc.addedPsi,
      pressureRequiredPsi: p,
      segment: calc.detail,
    });
  }

  (input.deviceLosses ?? []).forEach((d, i) => {
    const loss = requireNonNegative(`deviceLosses[${i}].lossPsi`, d.lossPsi, INPUT_LIMITS.pressurePsi);
    p += loss;
    steps.push({
      kind: "device",
      label: d.label || `Device ${i + 1}`,
      flowGpm: totalFlow,
      pressureAddedPsi: loss,
      pressureRequiredPsi: p,
      note: "Loss at the design flow, entered from the device maker's data.",
    });
  });

  return { flowGpm: totalFlow, pressurePsi: p, sprinklers, steps, clampedAtZero };
}

