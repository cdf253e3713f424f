/**
 * Calculator reports: one function per calculator turns its inputs (US or SI) into everything a
 * page or a printed summary shows — the formula, each step with its numbers, the results rounded by
 * the display rule, the checks and the sources. The web calculators and the server's PDF summary
 * both call `calculatorReport`, so what is printed is what was shown.
 *
 * Inputs use unit-neutral keys (`pressure`, `flow`, `length` …) plus `units: "us" | "si"`.
 * Lesson presets use the US keys of the content contract; `inputFromPreset` maps them.
 * Bad input throws HydraulicsInputError whose field is the neutral key (e.g. "residualPressure",
 * "segments[1].length").
 */
import { HydraulicsInputError, INPUT_LIMITS } from "./errors";
import { PSI_PER_FT_OF_WATER, BAR_PER_M_OF_WATER, WATER_DENSITY_LB_PER_CU_FT } from "./elevation";
import { FITTING_LABELS, fittingsEquivalentLength, type FittingInput } from "./fittings";
import { flowAtResidualGpm, flowTestAvailablePsi, supplyMargin, type FlowTest } from "./flow-test";
import { frictionLossBarPerM, frictionLossPsiPerFt } from "./friction";
import {
  NOMINAL_SIZES,
  PIPE_DATA,
  PIPE_MATERIALS,
  hazenWilliamsC,
  pipeDimensions,
  type NominalSize,
  type PipeMaterial,
} from "./pipe-data";
import { roomCoverage } from "./coverage";
import { formatForDisplay, type DisplayUnit, type RoundingDirection } from "./rounding";
import { sprinklerFlowGpm, sprinklerPressurePsi } from "./sprinkler";
import { storedWaterGal } from "./storage";
import { systemDemand, type PipeSegmentInput, type SystemDemandInput } from "./demand";
import { K_SI_PER_K_US, L_PER_GAL, MM_PER_IN, M_PER_FT, PSI_PER_BAR, SQ_M_PER_SQ_FT } from "./units";

export const CALCULATOR_CAUTION_TEXT =
  "A teaching and checking aid, not a stamped design: the sprinkler's listing, the adopted code with its local amendments and the authority having jurisdiction govern.";

export const CALCULATOR_IDS = [
  "sprinkler-flow",
  "friction-loss",
  "elevation",
  "flow-test",
  "stored-water",
  "room-coverage",
  "system-demand",
] as const;
export type CalculatorId = (typeof CALCULATOR_IDS)[number];
export const isCalculatorId = (v: unknown): v is CalculatorId =>
  typeof v === "string" && (CALCULATOR_IDS as readonly string[]).includes(v);

export const CALCULATOR_INFO: Record<CalculatorId, { title: string; summary: string }> = {
  "sprinkler-flow": {
    title: "Sprinkler flow and pressure",
    summary: "Flow from a sprinkler's K-factor at a pressure, or the pressure it needs for a flow.",
  },
  "friction-loss": {
    title: "Friction loss in pipe",
    summary: "Hazen-Williams loss for a run of copper, CPVC, PEX or steel pipe, fittings included.",
  },
  elevation: { title: "Elevation pressure", summary: "Pressure lost lifting water to a sprinkler above the gauge." },
  "flow-test": {
    title: "Hydrant flow test",
    summary: "Pressure the main offers at your design flow, from static, residual and test-flow readings.",
  },
  "stored-water": { title: "Stored water", summary: "Tank volume for a design flow held for the design duration." },
  "room-coverage": {
    title: "Room coverage",
    summary: "Fewest sprinklers in a regular grid for a room, against a listing's spacing and area.",
  },
  "system-demand": {
    title: "System demand",
    summary: "Flow and pressure needed at the source for the design sprinklers, step by step.",
  },
};

export type Units = "us" | "si";

/* ---------- inputs ---------- */

export interface SprinklerFlowReportInput {
  units: Units;
  solveFor: "flow" | "pressure";
  k: number;
  pressure?: number;
  flow?: number;
}
export interface FrictionLossReportInput {
  units: Units;
  material: PipeMaterial;
  nominalSize: NominalSize;
  flow: number;
  length: number;
  elbows?: number;
  teeBranches?: number;
  /** total of the maker's listed equivalent lengths for the run's fittings (ft or m) */
  listedFittingsLength?: number;
  /** the maker's listed inside diameter (in or mm), if it differs from the table */
  insideDiameter?: number;
  cFactor?: number;
}
export interface ElevationReportInput {
  units: Units;
  height: number;
}
export interface FlowTestReportInput {
  units: Units;
  staticPressure: number;
  residualPressure: number;
  testFlow: number;
  demandFlow: number;
  demandPressure?: number;
  residualTarget?: number;
}
export interface StoredWaterReportInput {
  units: Units;
  flow: number;
  duration: number;
}
export interface RoomCoverageReportInput {
  units: Units;
  length: number;
  width: number;
  maxSpacing: number;
  maxArea: number;
  minSpacing?: number;
  maxWallDistance?: number;
}
export interface SegmentReportInput {
  label?: string;
  material: PipeMaterial;
  nominalSize: NominalSize;
  length: number;
  elevation?: number;
  elbows?: number;
  teeBranches?: number;
  listedFittingsLength?: number;
}
export interface SystemDemandReportInput {
  units: Units;
  sprinklers: {
    label?: string;
    k: number;
    minFlow: number;
    minPressure?: number;
    branch?: SegmentReportInput;
  }[];
  segments: SegmentReportInput[];
  devices?: { label: string; loss: number }[];
  additionalFlow?: number;
  supply?: { staticPressure: number; residualPressure: number; testFlow: number };
}

export interface CalculatorInputs {
  "sprinkler-flow": SprinklerFlowReportInput;
  "friction-loss": FrictionLossReportInput;
  elevation: ElevationReportInput;
  "flow-test": FlowTestReportInput;
  "stored-water": StoredWaterReportInput;
  "room-coverage": RoomCoverageReportInput;
  "system-demand": SystemDemandReportInput;
}

/* ---------- report ---------- */

export interface ReportLine {
  label: string;
  text: string;
}
export interface ReportResult extends ReportLine {
  value: number;
  unit: DisplayUnit | null;
}
export interface ReportStep {
  label: string;
  /** the arithmetic with the numbers put in */
  work: string;
  /** the step's result, rounded for display */
  text: string;
}
export interface ReportChart {
  flowUnit: "gpm" | "L/min";
  pressureUnit: "psi" | "bar";
  supply: { flow: number; pressure: number }[];
  demand: { flow: number; pressure: number } | null;
}
export interface CalculatorReport {
  id: CalculatorId;
  title: string;
  units: Units;
  formula: string[];
  inputs: ReportLine[];
  steps: ReportStep[];
  results: ReportResult[];
  verdict?: { result: "pass" | "short"; text: string };
  checks: { status: "ok" | "check" | "fails"; text: string }[];
  notes: string[];
  chart?: ReportChart;
  caution: string;
}

/* ---------- unit helpers ---------- */

interface UnitSet {
  pressure: "psi" | "bar";
  flow: "gpm" | "L/min";
  length: "ft" | "m";
  diameter: "in" | "mm";
  volume: "gal" | "L";
  area: "ft²" | "m²";
  lossPerLength: "psi/ft" | "bar/m";
  k: "K-US" | "K-SI";
  kLabel: string;
}
const US: UnitSet = {
  pressure: "psi",
  flow: "gpm",
  length: "ft",
  diameter: "in",
  volume: "gal",
  area: "ft²",
  lossPerLength: "psi/ft",
  k: "K-US",
  kLabel: "gpm/psi^½",
};
const SI: UnitSet = {
  pressure: "bar",
  flow: "L/min",
  length: "m",
  diameter: "mm",
  volume: "L",
  area: "m²",
  lossPerLength: "bar/m",
  k: "K-SI",
  kLabel: "L/min/bar^½",
};
const unitSet = (u: Units) => (u === "si" ? SI : US);

/** to US from the input's units */
const toUs = {
  pressure: (v: number, u: Units) => (u === "si" ? v * PSI_PER_BAR : v),
  flow: (v: number, u: Units) => (u === "si" ? v / L_PER_GAL : v),
  length: (v: number, u: Units) => (u === "si" ? v / M_PER_FT : v),
  diameter: (v: number, u: Units) => (u === "si" ? v / MM_PER_IN : v),
  area: (v: number, u: Units) => (u === "si" ? v / SQ_M_PER_SQ_FT : v),
  k: (v: number, u: Units) => (u === "si" ? v / K_SI_PER_K_US : v),
};
/** from US to the report's units */
const fromUs = {
  pressure: (v: number, u: Units) => (u === "si" ? v / PSI_PER_BAR : v),
  flow: (v: number, u: Units) => (u === "si" ? v * L_PER_GAL : v),
  length: (v: number, u: Units) => (u === "si" ? v * M_PER_FT : v),
  diameter: (v: number, u: Units) => (u === "si" ? v * MM_PER_IN : v),
  area: (v: number, u: Units) => (u === "si" ? v * SQ_M_PER_SQ_FT : v),
  volume: (v: number, u: Units) => (u === "si" ? v * L_PER_GAL : v),
  k: (v: number, u: Units) => (u === "si" ? v * K_SI_PER_K_US : v),
};

const f = (value: number, unit: DisplayUnit, dir: RoundingDirection = "nearest") => formatForDisplay(value, unit, dir);
/** an intermediate number without a unit, to 4 significant figures */
const g = (v: number) => (v === 0 ? "0" : Math.abs(v) >= 1e-3 && Math.abs(v) < 1e6 ? String(Number(v.toPrecision(4))) : v.toExponential(3));

/* ---------- input reading ---------- */

type Raw = Record<string, unknown>;

function asRecord(v: unknown, field: string): Raw {
  if (typeof v !== "object" || v === null || Array.isArray(v)) throw new HydraulicsInputError(field, "must be an object");
  return v as Raw;
}

function readNumber(
  raw: Raw,
  key: string,
  opts: { min?: number; positive?: boolean; optional?: boolean; integer?: boolean; path?: string } = {},
): number | undefined {
  const field = opts.path ?? key;
  const v = raw[key];
  if (v === undefined || v === null || v === "") {
    if (opts.optional) return undefined;
    throw new HydraulicsInputError(field, "enter a value");
  }
  const n = typeof v === "number" ? v : typeof v === "string" ? Number(v.trim()) : Number.NaN;
  if (!Number.isFinite(n)) throw new HydraulicsInputError(field, "must be a number");
  if (opts.positive && n <= 0) throw new HydraulicsInputError(field, "must be more than 0");
  if (opts.min !== undefined && n < opts.min) throw new HydraulicsInputError(field, `must be at least ${opts.min}`);
  if (opts.integer && !Number.isInteger(n)) throw new HydraulicsInputError(field, "must be a whole number");
  return n;
}
const need = (raw: Raw, key: string, opts: Parameters<typeof readNumber>[2] = {}) => readNumber(raw, key, opts) as number;

function readUnits(raw: Raw): Units {
  const u = raw.units ?? "us";
  if (u !== "us" && u !== "si") throw new HydraulicsInputError("units", 'must be "us" or "si"');
  return u;
}
function readMaterial(raw: Raw, key: string, path = key): PipeMaterial {
  const v = raw[key];
  if (typeof v !== "string" || !(PIPE_MATERIALS as readonly string[]).includes(v)) {
    throw new HydraulicsInputError(path, `choose one of ${PIPE_MATERIALS.join(", ")}`);
  }
  return v as PipeMaterial;
}
function readSize(raw: Raw, key: string, path = key): NominalSize {
  const v = raw[key];
  if (typeof v !== "string" || !(NOMINAL_SIZES as readonly string[]).includes(v)) {
    throw new HydraulicsInputError(path, `choose one of ${NOMINAL_SIZES.join(", ")}`);
  }
  return v as NominalSize;
}

/** run a library call, renaming its error fields to the report's neutral names */
function mapErrors<T>(names: Record<string, string>, run: () => T, prefix = ""): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof HydraulicsInputError) {
      const mapped = e.field.replace(/([A-Za-z]+)$/, (name) => names[name] ?? name);
      throw new HydraulicsInputError(`${prefix}${mapped}`, e.reason);
    }
    throw e;
  }
}

/* ---------- sprinkler flow ---------- */

function sprinklerFlowReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const solveFor = raw.solveFor === "pressure" ? "pressure" : raw.solveFor === undefined || raw.solveFor === "flow" ? "flow" : null;
  if (!solveFor) throw new HydraulicsInputError("solveFor", 'must be "flow" or "pressure"');
  const k = need(raw, "k", { positive: true });
  const kUs = toUs.k(k, units);
  const names = { kFactor: "k", pressurePsi: "pressure", flowGpm: "flow" };
  const formula =
    solveFor === "flow"
      ? [`Q = K × √P   (Q in ${u.flow}, K in ${u.kLabel}, P in ${u.pressure})`]
      : [`P = (Q ÷ K)²   (P in ${u.pressure}, Q in ${u.flow}, K in ${u.kLabel})`];
  const other = units === "si" ? `K ${f(kUs, "K-US")} in US units` : `K ${f(fromUs.k(kUs, "si"), "K-SI")} in SI units`;
  const notes = [
    "Q = K√P is the discharge relation used by NFPA 13 and NFPA 13D. The K-factor, and the minimum flow and pressure for each coverage area, come from the sprinkler's listing.",
    `The same sprinkler is ${other} (K_SI = K_US × 14.416, from the gallon and the bar).`,
  ];
  if (solveFor === "flow") {
    const p = need(raw, "pressure", { positive: true });
    const qUs = mapErrors(names, () => sprinklerFlowGpm(kUs, toUs.pressure(p, units)));
    const q = fromUs.flow(qUs, units);
    return {
      id: "sprinkler-flow",
      title: CALCULATOR_INFO["sprinkler-flow"].title,
      units,
      formula,
      inputs: [
        { label: "K-factor", text: `${f(k, u.k)} ${u.kLabel}` },
        { label: "Pressure at the sprinkler", text: f(p, u.pressure) },
      ],
      steps: [
        { label: "Square root of the pressure", work: `√${g(p)}`, text: g(Math.sqrt(p)) },
        { label: "Flow", work: `${g(k)} × ${g(Math.sqrt(p))}`, text: f(q, u.flow) },
      ],
      results: [{ label: "Flow from the sprinkler", text: f(q, u.flow), value: q, unit: u.flow }],
      checks: [],
      notes,
      caution: CALCULATOR_CAUTION_TEXT,
    };
  }
  const q = need(raw, "flow", { positive: true });
  const pUs = mapErrors(names, () => sprinklerPressurePsi(kUs, toUs.flow(q, units)));
  const p = fromUs.pressure(pUs, units);
  return {
    id: "sprinkler-flow",
    title: CALCULATOR_INFO["sprinkler-flow"].title,
    units,
    formula,
    inputs: [
      { label: "K-factor", text: `${f(k, u.k)} ${u.kLabel}` },
      { label: "Flow wanted", text: f(q, u.flow) },
    ],
    steps: [
      { label: "Flow ÷ K", work: `${g(q)} ÷ ${g(k)}`, text: g(q / k) },
      { label: "Pressure needed", work: `${g(q / k)}²`, text: f(p, u.pressure, "up") },
    ],
    results: [{ label: "Pressure needed at the sprinkler", text: f(p, u.pressure, "up"), value: p, unit: u.pressure }],
    checks: [],
    notes: [...notes, "Pressure needed is rounded up, so the display never understates it."],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}

/* ---------- friction loss ---------- */

function fittingList(elbows: number | undefined, tees: number | undefined, listed: number | undefined, units: Units): FittingInput[] {
  const list: FittingInput[] = [];
  if (elbows) list.push({ kind: "elbow-90", count: elbows });
  if (tees) list.push({ kind: "tee-branch", count: tees });
  if (listed) list.push({ label: "Listed fittings (maker's equivalent lengths)", equivalentLengthFt: toUs.length(listed, units) });
  return list;
}

const FITTING_FIELD_NAMES: Record<string, string> = { count: "elbows", equivalentLengthFt: "listedFittingsLength" };

/** map "fittings[i].x" errors back to the form's fields */
function fittingsError(e: HydraulicsInputError, fittings: FittingInput[], prefix: string): HydraulicsInputError {
  const m = /fittings\[(\d+)\]\.(\w+)$/.exec(e.field);
  if (!m) return new HydraulicsInputError(`${prefix}${e.field.split(".").pop() ?? e.field}`, e.reason);
  const item = fittings[Number(m[1])];
  let name = FITTING_FIELD_NAMES[m[2] ?? ""] ?? "elbows";
  if (item && "kind" in item) name = item.kind === "tee-branch" ? "teeBranches" : "elbows";
  if (item && "equivalentLengthFt" in item) name = "listedFittingsLength";
  return new HydraulicsInputError(`${prefix}${name}`, e.reason);
}

function frictionLossReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const material = readMaterial(raw, "material");
  const nominalSize = readSize(raw, "nominalSize");
  const flow = need(raw, "flow", { min: 0 });
  const length = need(raw, "length", { min: 0 });
  const elbows = readNumber(raw, "elbows", { optional: true, min: 0, integer: true });
  const tees = readNumber(raw, "teeBranches", { optional: true, min: 0, integer: true });
  const listed = readNumber(raw, "listedFittingsLength", { optional: true, min: 0 });
  const idOverride = readNumber(raw, "insideDiameter", { optional: true, positive: true });
  const cOverride = readNumber(raw, "cFactor", { optional: true, positive: true });

  const info = PIPE_DATA[material];
  const dims = mapErrors({}, () => pipeDimensions(material, nominalSize));
  const idIn = idOverride === undefined ? dims.insideDiameterIn : toUs.diameter(idOverride, units);
  const c = cOverride ?? hazenWilliamsC(material);
  const fittings = fittingList(elbows, tees, listed, units);
  let fit: ReturnType<typeof fittingsEquivalentLength>;
  try {
    fit = fittingsEquivalentLength(material, nominalSize, fittings, {
      cFactor: cOverride,
      insideDiameterIn: idOverride === undefined ? undefined : idIn,
    });
  } catch (e) {
    if (e instanceof HydraulicsInputError) throw fittingsError(e, fittings, "");
    throw e;
  }
  const names = { flowGpm: "flow", flowLpm: "flow", cFactor: "cFactor", insideDiameterIn: "insideDiameter", insideDiameterMm: "insideDiameter" };
  const totalFt = toUs.length(length, units) + fit.totalFt;
  const perUs = mapErrors(names, () => frictionLossPsiPerFt(toUs.flow(flow, units), c, idIn));
  const id = fromUs.diameter(idIn, units);
  const fitLen = fromUs.length(fit.totalFt, units);
  const totalLen = fromUs.length(totalFt, units);

  const constant = units === "si" ? "6.05 × 10⁵" : "4.52";
  const per = units === "si" ? mapErrors(names, () => frictionLossBarPerM(flow, c, id)) : perUs;
  const loss = per * totalLen;

  const steps: ReportStep[] = [
    idOverride === undefined
      ? {
          label: `Inside diameter (${info.dimensionSource.split(" (")[0]})`,
          work: `OD ${dims.outsideDiameterIn} − 2 × ${info.wallBasis} ${dims.wallIn} in`,
          text: f(id, u.diameter),
        }
      : { label: "Inside diameter (maker's listed value, entered)", work: "entered", text: f(id, u.diameter) },
  ];
  for (const item of fit.items) {
    steps.push({
      label: `Fittings: ${item.count} × ${item.label}`,
      work:
        item.chartFt === undefined
          ? `${item.count} × ${g(fromUs.length(item.eachFt, units))} ${u.length} (entered)`
          : `${item.count} × ${item.chartFt} ft chart × ${g(item.cMultiplier ?? 1)} for C${item.diameterMultiplier !== 1 ? ` × ${g(item.diameterMultiplier ?? 1)} for the bore` : ""}`,
      text: f(fromUs.length(item.totalFt, units), u.length),
    });
  }
  steps.push(
    { label: "Length with fittings", work: `${g(length)} + ${g(fitLen)}`, text: f(totalLen, u.length) },
    {
      label: "Loss per unit length",
      work: `${constant} × ${g(flow)}^1.85 ÷ (${g(c)}^1.85 × ${g(id)}^4.87)`,
      text: f(per, u.lossPerLength),
    },
    { label: "Friction loss", work: `${g(per)} × ${g(totalLen)}`, text: f(loss, u.pressure, "up") },
  );

  const notes = [
    `Hazen-Williams in the form NFPA 13 prints: ${units === "si" ? "bar per metre with Q in L/min and d in mm" : "psi per foot with Q in gpm and d in inches"}.`,
    `Inside diameter: ${idOverride === undefined ? info.dimensionSource : "entered from the maker's listing"}.`,
    `C = ${c}: ${cOverride === undefined ? info.cFactorSource : "entered"}.`,
  ];
  if (fit.items.some((i) => i.chartFt !== undefined)) {
    notes.push(
      "Fitting lengths: NFPA 13 equivalent schedule 40 steel pipe length chart (C = 120) with its C-factor multiplier; for other bores × (ID ÷ schedule 40 ID)^4.87 (from memory — verify against the adopted edition).",
    );
  }
  if (material === "cpvc" || material === "pex") {
    notes.push("CPVC and PEX fittings take the pipe maker's listed equivalent lengths; enter their total as listed fittings.");
  }
  if (info.note) notes.push(info.note);

  return {
    id: "friction-loss",
    title: CALCULATOR_INFO["friction-loss"].title,
    units,
    formula: [
      `p = ${constant} × Q^1.85 ÷ (C^1.85 × d^4.87)   (${u.lossPerLength}; Q in ${u.flow}, d in ${u.diameter})`,
      `Friction loss = p × (pipe length + fitting equivalent length)`,
    ],
    inputs: [
      { label: "Pipe", text: `${info.label}, ${nominalSize} in nominal` },
      { label: "Flow", text: f(flow, u.flow) },
      { label: "Pipe length", text: f(length, u.length) },
      ...(elbows ? [{ label: "90° elbows", text: String(elbows) }] : []),
      ...(tees ? [{ label: "Tees, flow turned 90°", text: String(tees) }] : []),
      ...(listed ? [{ label: "Listed fittings, total", text: f(listed, u.length) }] : []),
      { label: "C-factor", text: String(c) },
    ],
    steps,
    results: [
      { label: "Friction loss", text: f(loss, u.pressure, "up"), value: loss, unit: u.pressure },
      { label: "Loss per unit length", text: f(per, u.lossPerLength), value: per, unit: u.lossPerLength },
    ],
    checks: [],
    notes,
    caution: CALCULATOR_CAUTION_TEXT,
  };
}

/* ---------- elevation ---------- */

function elevationReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const h = need(raw, "height", { min: 0 });
  if (toUs.length(h, units) > INPUT_LIMITS.elevationFt) throw new HydraulicsInputError("height", "is beyond the range this calculator handles");
  const rate = units === "si" ? BAR_PER_M_OF_WATER : PSI_PER_FT_OF_WATER;
  const p = h * rate;
  return {
    id: "elevation",
    title: CALCULATOR_INFO.elevation.title,
    units,
    formula: [units === "si" ? "P = 0.098 bar per metre × h" : "P = 0.433 psi per foot × h"],
    inputs: [{ label: "Height of the sprinkler above the gauge", text: f(h, u.length) }],
    steps: [
      units === "si"
        ? { label: "Weight of water per metre of height", work: "999.1 kg/m³ × 9.80665 m/s² ÷ 100 000", text: `${g(rate)} bar/m` }
        : { label: "Weight of water per foot of height", work: `${WATER_DENSITY_LB_PER_CU_FT} lb/ft³ ÷ 144 in²/ft²`, text: `${g(rate)} psi/ft` },
      { label: "Elevation pressure", work: `${g(rate)} × ${g(h)}`, text: f(p, u.pressure, "up") },
    ],
    results: [{ label: "Pressure to lift the water", text: f(p, u.pressure, "up"), value: p, unit: u.pressure }],
    checks: [],
    notes: [
      "Water at about 60 °F weighs 62.37 lb/ft³ (water-property tables; from memory), which gives the 0.433 psi per foot the sprinkler standards use.",
      "A rise from the gauge to the sprinkler costs this pressure; a drop gives it back.",
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}

/* ---------- flow test ---------- */

const FLOW_TEST_NAMES = {
  staticPsi: "staticPressure",
  residualPsi: "residualPressure",
  testFlowGpm: "testFlow",
  demandFlowGpm: "demandFlow",
  residualTargetPsi: "residualTarget",
  demandPressurePsi: "demandPressure",
  maxFlowGpm: "testFlow",
};

function supplyChart(test: FlowTest, demand: { flowGpm: number; pressurePsi: number } | null, units: Units): ReportChart {
  const u = unitSet(units);
  const zeroFlow = flowAtResidualGpm(test, 0);
  const max = Math.max(zeroFlow, demand ? demand.flowGpm * 1.25 : 0);
  const supply = Array.from({ length: 41 }, (_, i) => {
    const q = (max * i) / 40;
    return {
      flow: fromUs.flow(q, units),
      pressure: fromUs.pressure(flowTestAvailablePsi(test, q).pressurePsi, units),
    };
  });
  return {
    flowUnit: u.flow,
    pressureUnit: u.pressure,
    supply,
    demand: demand ? { flow: fromUs.flow(demand.flowGpm, units), pressure: fromUs.pressure(demand.pressurePsi, units) } : null,
  };
}

function flowTestReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const ps = need(raw, "staticPressure", { positive: true });
  const pr = need(raw, "residualPressure", { min: 0 });
  const qt = need(raw, "testFlow", { positive: true });
  const qd = need(raw, "demandFlow", { min: 0 });
  const pd = readNumber(raw, "demandPressure", { optional: true, min: 0 });
  const target = readNumber(raw, "residualTarget", { optional: true, min: 0 }) ?? (units === "si" ? 1.4 : 20);
  const test: FlowTest = { staticPsi: toUs.pressure(ps, units), residualPsi: toUs.pressure(pr, units), testFlowGpm: toUs.flow(qt, units) };
  const avail = mapErrors(FLOW_TEST_NAMES, () => flowTestAvailablePsi(test, toUs.flow(qd, units)));
  const qR = mapErrors(FLOW_TEST_NAMES, () => flowAtResidualGpm(test, toUs.pressure(target, units)));
  const ratio = qd / qt;
  const drop = ps - pr;
  const available = fromUs.pressure(avail.pressurePsi, units);

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
        text: f(fromUs.flow(qR, units), u.flow, "down"),
      },
    ],
    results: [
      { label: "Pressure available at the design flow", text: f(available, u.pressure, "down"), value: available, unit: u.pressure },
      {
        label: `Flow available at ${f(target, u.pressure)} residual`,
        text: f(fromUs.flow(qR, units), u.flow, "down"),
        value: fromUs.flow(qR, units),
        unit: u.flow,
      },
    ],
    checks: [],
    notes: [
      "Formulas: NFPA 291, flow testing and the calculation of results. Available figures are rounded down so they never flatter the supply.",
      "A test describes the main at one place and time: supplies drop at peak hours and in dry seasons, and the water purveyor or the AHJ may require a margin below this curve.",
      "Carry the height between the test gauge and the building, and the service, meter and backflow losses, in the system demand.",
    ],
    chart: supplyChart(test, pd === undefined ? null : { flowGpm: toUs.flow(qd, units), pressurePsi: toUs.pressure(pd, units) }, units),
    caution: CALCULATOR_CAUTION_TEXT,
  };
  if (avail.beyondSupply) {
    report.checks.push({ status: "fails", text: "The test curve reaches 0 pressure before this flow: the main cannot deliver it." });
  }
  if (avail.extrapolated) {
    report.checks.push({ status: "check", text: "The design flow is above the flow tested: the curve is extended past what was measured." });
  }
  if (pd !== undefined) {
    const m = supplyMargin({ flowGpm: Math.max(toUs.flow(qd, units), 1e-9), pressurePsi: toUs.pressure(pd, units) }, test);
    const margin = fromUs.pressure(m.marginPsi, units);
    const short = fromUs.pressure(m.shortfallPsi, units);
    report.steps.push({
      label: m.result === "pass" ? "Margin" : "Shortfall",
      work: m.result === "pass" ? `${g(available)} − ${g(pd)}` : `${g(pd)} − ${g(available)}`,
      text: m.result === "pass" ? f(margin, u.pressure, "down") : f(short, u.pressure, "up"),
    });
    report.results.push(
      m.result === "pass"
        ? { label: "Margin", text: f(margin, u.pressure, "down"), value: margin, unit: u.pressure }
        : { label: "Shortfall", text: f(short, u.pressure, "up"), value: short, unit: u.pressure },
    );
    report.verdict =
      m.result === "pass"
        ? { result: "pass", text: `Supply exceeds the demand by ${f(margin, u.pressure, "down")} at ${f(qd, u.flow)}.` }
        : {
            result: "short",
            text: `Supply is short by ${f(short, u.pressure, "up")} at ${f(qd, u.flow)}: the system will not deliver its design flow without a change (larger pipe or service, a pump or a tank — a qualified designer and the AHJ decide).`,
          };
  }
  return report;
}

/* ---------- stored water ---------- */

function storedWaterReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const q = need(raw, "flow", { positive: true });
  const t = need(raw, "duration", { positive: true });
  const gal = mapErrors({ flowGpm: "flow", durationMin: "duration" }, () => storedWaterGal(toUs.flow(q, units), t));
  const v = fromUs.volume(gal, units);
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

/* ---------- room coverage ---------- */

function roomCoverageReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const L = need(raw, "length", { positive: true });
  const W = need(raw, "width", { positive: true });
  const S = need(raw, "maxSpacing", { positive: true });
  const A = need(raw, "maxArea", { positive: true });
  const minS = readNumber(raw, "minSpacing", { optional: true, min: 0 });
  const maxWall = readNumber(raw, "maxWallDistance", { optional: true, positive: true });
  const r = mapErrors(
    { lengthFt: "length", widthFt: "width", maxSpacingFt: "maxSpacing", maxAreaSqFt: "maxArea", minSpacingFt: "minSpacing", maxWallDistanceFt: "maxWallDistance" },
    () =>
      roomCoverage({
        lengthFt: toUs.length(L, units),
        widthFt: toUs.length(W, units),
        maxSpacingFt: toUs.length(S, units),
        maxAreaSqFt: toUs.area(A, units),
        minSpacingFt: minS === undefined ? undefined : toUs.length(minS, units),
        maxWallDistanceFt: maxWall === undefined ? undefined : toUs.length(maxWall, units),
      }),
  );
  const limit = fromUs.length(r.spacingLimitFt, units);
  const sL = fromUs.length(r.spacingAlongLengthFt, units);
  const sW = fromUs.length(r.spacingAlongWidthFt, units);
  const area = fromUs.area(r.areaPerSprinklerSqFt, units);
  return {
    id: "room-coverage",
    title: CALCULATOR_INFO["room-coverage"].title,
    units,
    formula: [
      "Sprinklers along each side ≥ side ÷ maximum spacing (rounded up)",
      "Spacing each way × spacing each way ≤ maximum coverage area; distance to a wall = half the spacing",
    ],
    inputs: [
      { label: "Room", text: `${f(L, u.length)} × ${f(W, u.length)}` },
      { label: "Listed maximum spacing", text: f(S, u.length) },
      { label: "Listed maximum coverage area", text: f(A, u.area) },
      ...(minS === undefined ? [] : [{ label: "Listed minimum spacing", text: f(minS, u.length) }]),
      ...(maxWall === undefined ? [] : [{ label: "Listed maximum distance to a wall", text: f(maxWall, u.length) }]),
    ],
    steps: [
      ...(maxWall === undefined
        ? []
        : [{ label: "Spacing limit from the wall distance", work: `smaller of ${g(S)} and 2 × ${g(maxWall)}`, text: f(limit, u.length) }]),
      { label: "Along the length", work: `${g(L)} ÷ ${g(limit)} = ${g(L / limit)} → ${r.columns}`, text: `${r.columns} × ${f(sL, u.length)} spacing` },
      { label: "Along the width", work: `${g(W)} ÷ ${g(limit)} = ${g(W / limit)} → ${r.rows}`, text: `${r.rows} × ${f(sW, u.length)} spacing` },
      {
        label: "Area each sprinkler covers",
        work: `${g(sL)} × ${g(sW)} ≤ ${g(A)}`,
        text: f(area, u.area, "up"),
      },
    ],
    results: [
      { label: "Sprinklers", text: String(r.sprinklers), value: r.sprinklers, unit: "count" },
      { label: "Layout (along length × along width)", text: `${r.columns} × ${r.rows}`, value: r.sprinklers, unit: null },
      { label: "Spacing along the length", text: f(sL, u.length), value: sL, unit: u.length },
      { label: "Spacing along the width", text: f(sW, u.length), value: sW, unit: u.length },
      {
        label: "Distance to the walls",
        text: `${f(sL / 2, u.length)} and ${f(sW / 2, u.length)}`,
        value: Math.max(sL, sW) / 2,
        unit: u.length,
      },
      { label: "Area per sprinkler", text: f(area, u.area, "up"), value: area, unit: u.area },
    ],
    checks: r.checks.map((c) => ({ status: c.status, text: c.message })),
    notes: [
      "A regular grid with each sprinkler centred in its share of the room. The spacing, area, wall-distance and obstruction rules that apply are the sprinkler's listing and the adopted code's.",
    ],
    caution: CALCULATOR_CAUTION_TEXT,
  };
}

/* ---------- system demand ---------- */

function readSegment(raw: Raw, path: string, units: Units): { seg: PipeSegmentInput; fittings: FittingInput[] } {
  const material = readMaterial(raw, "material", `${path}material`);
  const nominalSize = readSize(raw, "nominalSize", `${path}nominalSize`);
  const length = need(raw, "length", { min: 0, path: `${path}length` });
  const elevation = readNumber(raw, "elevation", { optional: true, path: `${path}elevation` });
  const elbows = readNumber(raw, "elbows", { optional: true, min: 0, integer: true, path: `${path}elbows` });
  const tees = readNumber(raw, "teeBranches", { optional: true, min: 0, integer: true, path: `${path}teeBranches` });
  const listed = readNumber(raw, "listedFittingsLength", { optional: true, min: 0, path: `${path}listedFittingsLength` });
  const fittings = fittingList(elbows, tees, listed, units);
  return {
    fittings,
    seg: {
      label: typeof raw.label === "string" && raw.label.trim() ? raw.label.trim() : undefined,
      material,
      nominalSize,
      lengthFt: toUs.length(length, units),
      elevationChangeFt: elevation === undefined ? 0 : toUs.length(elevation, units),
      fittings,
    },
  };
}

function systemDemandReport(raw: Raw): CalculatorReport {
  const units = readUnits(raw);
  const u = unitSet(units);
  const sprRaw = raw.sprinklers;
  if (!Array.isArray(sprRaw) || sprRaw.length < 1 || sprRaw.length > 2) {
    throw new HydraulicsInputError("sprinklers", "give one or two design sprinklers");
  }
  const segRaw = raw.segments;
  if (!Array.isArray(segRaw)) throw new HydraulicsInputError("segments", "must be a list of pipe runs");
  const segFittings: FittingInput[][] = [];
  const branchFittings: (FittingInput[] | undefined)[] = [];
  const input: SystemDemandInput = {
    sprinklers: sprRaw.map((s, i) => {
      const r = asRecord(s, `sprinklers[${i}]`);
      const p = `sprinklers[${i}].`;
      const branchRaw = r.branch === undefined || r.branch === null ? undefined : asRecord(r.branch, `${p}branch`);
      const branch = branchRaw ? readSegment(branchRaw, `${p}branch.`, units) : undefined;
      branchFittings[i] = branch?.fittings;
      const minPressure = readNumber(r, "minPressure", { optional: true, positive: true, path: `${p}minPressure` });
      return {
        label: typeof r.label === "string" && r.label.trim() ? r.label.trim() : undefined,
        kFactor: toUs.k(need(r, "k", { positive: true, path: `${p}k` }), units),
        minFlowGpm: toUs.flow(need(r, "minFlow", { positive: true, path: `${p}minFlow` }), units),
        minPressurePsi: minPressure === undefined ? undefined : toUs.pressure(minPressure, units),
        branch: branch ? [branch.seg] : undefined,
      };
    }),
    supplyPath: segRaw.map((s, i) => {
      const r = readSegment(asRecord(s, `segments[${i}]`), `segments[${i}].`, units);
      segFittings[i] = r.fittings;
      return r.seg;
    }),
    deviceLosses: Array.isArray(raw.devices)
      ? raw.devices.map((d, i) => {
          const r = asRecord(d, `devices[${i}]`);
          return {
            label: typeof r.label === "string" && r.label.trim() ? r.label.trim() : `Device ${i + 1}`,
            lossPsi: toUs.pressure(need(r, "loss", { min: 0, path: `devices[${i}].loss` }), units),
          };
        })
      : [],
    additionalFlowGpm: (() => {
      const a = readNumber(raw, "additionalFlow", { optional: true, min: 0 });
      return a === undefined ? undefined : toUs.flow(a, units);
    })(),
  };
  let supply: FlowTest | undefined;
  if (raw.supply !== undefined && raw.supply !== null) {
    const s = asRecord(raw.supply, "supply");
    supply = {
      staticPsi: toUs.pressure(need(s, "staticPressure", { positive: true, path: "supply.staticPressure" }), units),
      residualPsi: toUs.pressure(need(s, "residualPressure", { min: 0, path: "supply.residualPressure" }), units),
      testFlowGpm: toUs.flow(need(s, "testFlow", { positive: true, path: "supply.testFlow" }), units),
    };
  }

  let result: ReturnType<typeof systemDemand>;
  try {
    result = systemDemand(input);
  } catch (e) {
    if (!(e instanceof HydraulicsInputError)) throw e;
    // supplyPath[i]… → segments[i]…, sprinklers[i].branch[0]… → sprinklers[i].branch…
    const seg = /^supplyPath\[(\d+)\]\.(.*)$/.exec(e.field);
    const br = /^sprinklers\[(\d+)\]\.branch\[0\]\.(.*)$/.exec(e.field);
    const spr = /^sprinklers\[(\d+)\]\.(\w+)$/.exec(e.field);
    const simple: Record<string, string> = { lengthFt: "length", elevationChangeFt: "elevation", material: "material", nominalSize: "nominalSize", flowGpm: "length" };
    if (seg) {
      const i = Number(seg[1]);
      const rest = seg[2] ?? "";
      if (rest.startsWith("fittings")) throw fittingsError(e, segFittings[i] ?? [], `segments[${i}].`);
      throw new HydraulicsInputError(`segments[${i}].${simple[rest] ?? rest}`, e.reason);
    }
    if (br) {
      const i = Number(br[1]);
      const rest = br[2] ?? "";
      if (rest.startsWith("fittings")) throw fittingsError(e, branchFittings[i] ?? [], `sprinklers[${i}].branch.`);
      throw new HydraulicsInputError(`sprinklers[${i}].branch.${simple[rest] ?? rest}`, e.reason);
    }
    if (spr) {
      const names: Record<string, string> = { kFactor: "k", minFlowGpm: "minFlow", minPressurePsi: "minPressure" };
      throw new HydraulicsInputError(`sprinklers[${spr[1]}].${names[spr[2] ?? ""] ?? spr[2]}`, e.reason);
    }
    const top: Record<string, string> = { additionalFlowGpm: "additionalFlow" };
    const dev = /^deviceLosses\[(\d+)\]\.lossPsi$/.exec(e.field);
    if (dev) throw new HydraulicsInputError(`devices[${dev[1]}].loss`, e.reason);
    throw new HydraulicsInputError(top[e.field] ?? e.field, e.reason);
  }

  const P = (psi: number, dir: RoundingDirection = "nearest") => f(fromUs.pressure(psi, units), u.pressure, dir);
  const Q = (gpm: number) => f(fromUs.flow(gpm, units), u.flow);
  const steps: ReportStep[] = result.steps.map((s) => {
    if (s.kind === "pipe" && s.segment) {
      const d = s.segment;
      const len = fromUs.length(d.totalLengthFt, units);
      const per = units === "si" ? d.lossPsiPerFt / PSI_PER_BAR / M_PER_FT : d.lossPsiPerFt;
      const fric = fromUs.pressure(d.frictionPsi, units);
      const elev = fromUs.pressure(d.elevationPsi, units);
      const elevText = d.elevationChangeFt === 0 ? "" : `; elevation ${g(fromUs.length(d.elevationChangeFt, units))} ${u.length} → ${g(elev)} ${u.pressure}`;
      return {
        label: `${s.label}: ${PIPE_DATA[d.material].label}, ${d.nominalSize} in, ${Q(s.flowGpm)}`,
        work: `${g(per)} ${u.lossPerLength} × ${g(len)} ${u.length} (${g(fromUs.length(d.fittingsEquivalentFt, units))} of it fittings) = ${g(fric)} ${u.pressure}${elevText}`,
        text: `+${P(s.pressureAddedPsi)} → ${P(s.pressureRequiredPsi, "up")}`,
      };
    }
    if (s.kind === "sprinkler") {
      return {
        label: `${s.label}: ${Q(s.flowGpm)}`,
        work: `P = (Q ÷ K)² ${s.note ? `(${s.note})` : ""}`,
        text: P(s.pressureRequiredPsi, "up"),
      };
    }
    if (s.kind === "balance") {
      return { label: `${s.label}: ${Q(s.flowGpm)}`, work: s.note ?? "", text: P(s.pressureRequiredPsi, "up") };
    }
    if (s.kind === "device") {
      return { label: s.label, work: "entered loss at the design flow", text: `+${P(s.pressureAddedPsi)} → ${P(s.pressureRequiredPsi, "up")}` };
    }
    return { label: `${s.label}: ${Q(s.flowGpm)}`, work: s.note ?? "", text: P(s.pressureRequiredPsi, "up") };
  });

  const flow = fromUs.flow(result.flowGpm, units);
  const pressure = fromUs.pressure(result.pressurePsi, units);
  const report: CalculatorReport = {
    id: "system-demand",
    title: CALCULATOR_INFO["system-demand"].title,
    units,
    formula: [
      "Sprinkler: P = (Q ÷ K)², Q at least the listed flow",
      `Each pipe run: Hazen-Williams loss × (length + fittings) + ${units === "si" ? "0.098 bar/m" : "0.433 psi/ft"} × rise`,
      "Demand at the source = sprinkler pressure + every run's loss and rise + device losses",
    ],
    inputs: [
      ...result.sprinklers.map((s) => ({ label: s.label, text: `K ${f(fromUs.k(s.kFactor, units), u.k)}` })),
      { label: "Pipe runs", text: String(input.supplyPath.length) },
      ...(input.deviceLosses ?? []).map((d) => ({ label: d.label, text: P(d.lossPsi) })),
      ...(input.additionalFlowGpm ? [{ label: "Additional flow", text: Q(input.additionalFlowGpm) }] : []),
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
      "Friction: Hazen-Williams as printed in NFPA 13; inside diameters from ASTM B88, ASTM F442, ASTM F876 and ASME B36.10M; C-factors from NFPA 13's table (from memory — verify).",
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
    const available = fromUs.pressure(m.availablePsi, units);
    report.results.push({ label: "Pressure the supply offers at that flow", text: f(available, u.pressure, "down"), value: available, unit: u.pressure });
    const margin = fromUs.pressure(m.marginPsi, units);
    const short = fromUs.pressure(m.shortfallPsi, units);
    report.steps.push({
      label: "Supply from the flow test at the demand flow",
      work: "P = Ps − (Ps − Pr) × (Q ÷ Qt)^1.85 (NFPA 291)",
      text: f(available, u.pressure, "down"),
    });
    report.verdict =
      m.result === "pass"
        ? { result: "pass", text: `Supply exceeds the demand by ${f(margin, u.pressure, "down")}.` }
        : {
            result: "short",
            text: `Supply is short by ${f(short, u.pressure, "up")}: the system will not deliver its design flow as drawn. A qualified designer decides the change (pipe or service size, a pump or a tank) with the AHJ.`,
          };
    report.chart = supplyChart(supply, { flowGpm: result.flowGpm, pressurePsi: result.pressurePsi }, units);
  }
  return report;
}

/* ---------- entry points ---------- */

const BUILDERS: Record<CalculatorId, (raw: Raw) => CalculatorReport> = {
  "sprinkler-flow": sprinklerFlowReport,
  "friction-loss": frictionLossReport,
  elevation: elevationReport,
  "flow-test": flowTestReport,
  "stored-water": storedWaterReport,
  "room-coverage": roomCoverageReport,
  "system-demand": systemDemandReport,
};

/** the whole report for a calculator; throws HydraulicsInputError naming the input field */
export function calculatorReport(id: CalculatorId, input: unknown): CalculatorReport {
  if (!isCalculatorId(id)) throw new HydraulicsInputError("id", `unknown calculator ${String(id)}`);
  return BUILDERS[id](asRecord(input, "input"));
}

/** the friction/fitting labels, for forms */
export const FITTING_NAMES = { elbows: FITTING_LABELS["elbow-90"], teeBranches: FITTING_LABELS["tee-branch"] };

/** an invented example system (Quillmoor Fire Protection on a Larkhaven Homes plan, Juniper Flats) */
export const EXAMPLE_SYSTEM_DEMAND: SystemDemandReportInput = {
  units: "us",
  sprinklers: [
    {
      label: "Great room, far sprinkler",
      k: 4.9,
      minFlow: 13,
      branch: { label: "Branch to far sprinkler", material: "cpvc", nominalSize: "3/4", length: 22, listedFittingsLength: 7 },
    },
    {
      label: "Great room, near sprinkler",
      k: 4.9,
      minFlow: 13,
      branch: { label: "Branch to near sprinkler", material: "cpvc", nominalSize: "3/4", length: 6, listedFittingsLength: 4 },
    },
  ],
  segments: [
    { label: "Water service", material: "copper-k", nominalSize: "1", length: 55, elevation: 3, elbows: 2 },
    { label: "Riser and attic main", material: "cpvc", nominalSize: "1", length: 48, elevation: 14, listedFittingsLength: 19 },
  ],
  devices: [
    { label: "Water meter (5/8 × 3/4 in, maker's curve)", loss: 6.5 },
    { label: "Backflow preventer (maker's curve)", loss: 4 },
  ],
  supply: { staticPressure: 68, residualPressure: 55, testFlow: 1000 },
};

/** default inputs for each calculator, or a lesson preset (US keys of the content contract) mapped onto them */
export function inputFromPreset<I extends CalculatorId>(id: I, preset?: Record<string, unknown>): CalculatorInputs[I] {
  const p = preset ?? {};
  const n = (key: string, fallback: number) => (typeof p[key] === "number" && Number.isFinite(p[key]) ? (p[key] as number) : fallback);
  const defaults: { [K in CalculatorId]: () => CalculatorInputs[K] } = {
    "sprinkler-flow": () =>
      typeof p.flowGpm === "number" && typeof p.pressurePsi !== "number"
        ? { units: "us", solveFor: "pressure", k: n("kFactor", 4.9), flow: n("flowGpm", 13), pressure: 7 }
        : { units: "us", solveFor: "flow", k: n("kFactor", 4.9), pressure: n("pressurePsi", 10), flow: 13 },
    "friction-loss": () => ({
      units: "us",
      material: (PIPE_MATERIALS as readonly unknown[]).includes(p.material) ? (p.material as PipeMaterial) : "copper-l",
      nominalSize: (NOMINAL_SIZES as readonly unknown[]).includes(p.nominalSize) ? (p.nominalSize as NominalSize) : "1",
      flow: n("flowGpm", 26),
      length: n("lengthFt", 50),
    }),
    elevation: () => ({ units: "us", height: n("heightFt", 18) }),
    "flow-test": () => ({
      units: "us",
      staticPressure: n("staticPsi", 65),
      residualPressure: n("residualPsi", 50),
      testFlow: n("testFlowGpm", 900),
      demandFlow: n("demandFlowGpm", 26),
    }),
    "stored-water": () => ({ units: "us", flow: n("flowGpm", 26), duration: n("durationMin", 10) }),
    "room-coverage": () => ({
      units: "us",
      length: n("lengthFt", 18),
      width: n("widthFt", 14),
      maxSpacing: n("maxSpacingFt", 16),
      maxArea: n("maxAreaSqFt", 256),
    }),
    "system-demand": () => structuredClone(EXAMPLE_SYSTEM_DEMAND),
  };
  return defaults[id]() as CalculatorInputs[I];
}

/* ---------- unit switch for forms ---------- */

type Quantity = "pressure" | "flow" | "length" | "diameter" | "area" | "k";

/** which quantity each neutral input key holds (the same key means the same quantity in every calculator) */
export const INPUT_QUANTITY: Record<string, Quantity> = {
  k: "k",
  pressure: "pressure",
  staticPressure: "pressure",
  residualPressure: "pressure",
  demandPressure: "pressure",
  residualTarget: "pressure",
  minPressure: "pressure",
  loss: "pressure",
  flow: "flow",
  testFlow: "flow",
  demandFlow: "flow",
  minFlow: "flow",
  additionalFlow: "flow",
  length: "length",
  width: "length",
  height: "length",
  elevation: "length",
  maxSpacing: "length",
  minSpacing: "length",
  maxWallDistance: "length",
  listedFittingsLength: "length",
  insideDiameter: "diameter",
  maxArea: "area",
};

/**
 * Convert every quantity in a form's values (numbers or numeric text, nested in objects and lists)
 * from one unit system to the other, to 4 significant figures. Blank or non-numeric text is left
 * as typed, so the form can still show its error.
 */
export function convertInputUnits<T>(values: T, from: Units, to: Units): T {
  if (from === to) return values;
  const convert = (q: Quantity, v: number) => {
    const us = toUs[q](v, from);
    return fromUs[q](us, to);
  };
  const walk = (node: unknown, key?: string): unknown => {
    if (Array.isArray(node)) return node.map((item) => walk(item));
    if (node && typeof node === "object") {
      const out: Record<string, unknown> = {};
      for (const [k, v] of Object.entries(node as Record<string, unknown>)) out[k] = k === "units" ? to : walk(v, k);
      return out;
    }
    const q = key === undefined ? undefined : INPUT_QUANTITY[key];
    if (!q) return node;
    if (typeof node === "number" && Number.isFinite(node)) return Number(convert(q, node).toPrecision(4));
    if (typeof node === "string" && node.trim() !== "" && Number.isFinite(Number(node))) {
      return String(Number(convert(q, Number(node)).toPrecision(4)));
    }
    return node;
  };
  return walk(values) as T;
}
