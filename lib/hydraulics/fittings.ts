/**
 * Equivalent length of fittings and valves: the length of straight pipe that loses as much pressure
 * as the fitting at the same flow.
 *
 * Steel schedule 40 values follow the NFPA 13 equivalent schedule 40 steel pipe length chart
 * (Table 23.4.3.1.1 in the 2013 numbering; renumbered in later editions). Values are as remembered
 * and matched against a reproduction of that table — verify against the adopted edition. The chart
 * is for C = 120; for other C it is multiplied by the chart's C-factor multipliers, which equal
 * (C/120)^1.85 rounded (the tests check that). For copper tube, NFPA 13 also scales the chart by
 * (actual ID ÷ schedule 40 ID)^4.87 (from memory — verify).
 *
 * CPVC and PEX fittings are NOT covered by the steel chart: their equivalent lengths come from the
 * pipe maker's listing, and the caller must pass them as `equivalentLengthFt`.
 */
import { HydraulicsInputError, INPUT_LIMITS, requireInRange, requireInteger, requireNonNegative } from "./errors";
import { PIPE_DATA, pipeDimensions, type NominalSize, type PipeMaterial } from "./pipe-data";

export const FITTING_KINDS = [
  "elbow-45",
  "elbow-90",
  "elbow-90-long-turn",
  "tee-branch",
  "tee-run",
  "butterfly-valve",
  "gate-valve",
  "swing-check",
] as const;
export type FittingKind = (typeof FITTING_KINDS)[number];

export const FITTING_LABELS: Record<FittingKind, string> = {
  "elbow-45": "45° elbow",
  "elbow-90": "90° standard elbow",
  "elbow-90-long-turn": "90° long-turn elbow",
  "tee-branch": "Tee or cross, flow turned 90°",
  "tee-run": "Tee, flow straight through the run",
  "butterfly-valve": "Butterfly valve",
  "gate-valve": "Gate valve",
  "swing-check": "Swing check valve",
};

/** null = the chart gives no value for that size */
type Row = Record<NominalSize, number | null>;

/** NFPA 13 equivalent schedule 40 steel pipe length chart, feet, C = 120 (see the header note) */
export const STEEL_40_EQUIVALENT_LENGTH_FT: Record<FittingKind, Row> = {
  "elbow-45": { "1/2": null, "3/4": 1, "1": 1, "1-1/4": 1, "1-1/2": 2, "2": 2 },
  "elbow-90": { "1/2": 1, "3/4": 2, "1": 2, "1-1/4": 3, "1-1/2": 4, "2": 5 },
  "elbow-90-long-turn": { "1/2": 0.5, "3/4": 1, "1": 2, "1-1/4": 2, "1-1/2": 2, "2": 3 },
  "tee-branch": { "1/2": 3, "3/4": 4, "1": 5, "1-1/4": 6, "1-1/2": 8, "2": 10 },
  // The chart lists no value for flow straight through a tee. Common practice charges the run of a
  // tee as pipe length only (0 ft extra); a reducing or specially shaped tee may need the maker's data.
  "tee-run": { "1/2": 0, "3/4": 0, "1": 0, "1-1/4": 0, "1-1/2": 0, "2": 0 },
  "butterfly-valve": { "1/2": null, "3/4": null, "1": null, "1-1/4": null, "1-1/2": null, "2": 6 },
  "gate-valve": { "1/2": null, "3/4": null, "1": null, "1-1/4": null, "1-1/2": null, "2": 1 },
  // the chart notes that swing check values are averages: designs vary, so the valve maker's data govern
  "swing-check": { "1/2": null, "3/4": null, "1": 5, "1-1/4": 7, "1-1/2": 9, "2": 11 },
};

/** the chart's C-factor multipliers (from memory — verify against the adopted edition) */
export const C_FACTOR_MULTIPLIERS: ReadonlyArray<{ cFactor: number; multiplier: number }> = [
  { cFactor: 100, multiplier: 0.713 },
  { cFactor: 120, multiplier: 1.0 },
  { cFactor: 130, multiplier: 1.16 },
  { cFactor: 140, multiplier: 1.33 },
  { cFactor: 150, multiplier: 1.51 },
];

/**
 * Multiplier for a C other than 120: the chart's value where it lists that C, otherwise (C/120)^1.85,
 * the relation the chart's values follow.
 */
export function cFactorMultiplier(cFactor: number): { multiplier: number; source: "table" | "computed" } {
  const c = requireInRange("cFactor", cFactor, INPUT_LIMITS.cFactor.min, INPUT_LIMITS.cFactor.max);
  const row = C_FACTOR_MULTIPLIERS.find((r) => r.cFactor === c);
  if (row) return { multiplier: row.multiplier, source: "table" };
  return { multiplier: (c / 120) ** 1.85, source: "computed" };
}

/** a fitting from the chart, or one with the maker's listed equivalent length */
export type FittingInput =
  | { kind: FittingKind; count?: number }
  | { label: string; equivalentLengthFt: number; count?: number };

export interface FittingLengthItem {
  label: string;
  count: number;
  /** equivalent length of one fitting after adjustments, ft */
  eachFt: number;
  totalFt: number;
  source: string;
  /** for chart fittings: the chart value and the multipliers applied */
  chartFt?: number;
  cMultiplier?: number;
  diameterMultiplier?: number;
}

const PLASTIC: readonly PipeMaterial[] = ["cpvc", "pex"];

/**
 * Equivalent length of a list of fittings on one pipe segment.
 * `insideDiameterIn` and `cFactor` are the segment's actual values (defaults: the material's table).
 */
export function fittingsEquivalentLength(
  material: PipeMaterial,
  nominalSize: NominalSize,
  fittings: readonly FittingInput[],
  options: { cFactor?: number; insideDiameterIn?: number; fieldPrefix?: string } = {},
): { totalFt: number; items: FittingLengthItem[] } {
  const prefix = options.fieldPrefix ?? "";
  const dims = pipeDimensions(material, nominalSize, prefix);
  const items: FittingLengthItem[] = [];
  fittings.forEach((fitting, i) => {
    const field = `${prefix}fittings[${i}]`;
    const count = requireInteger(`${field}.count`, fitting.count ?? 1, 0, INPUT_LIMITS.fittingCount);
    if ("equivalentLengthFt" in fitting) {
      const each = requireNonNegative(`${field}.equivalentLengthFt`, fitting.equivalentLengthFt, 1000);
      items.push({
        label: fitting.label || "Listed fitting",
        count,
        eachFt: each,
        totalFt: each * count,
        source: "entered from the maker's listed equivalent length",
      });
      return;
    }
    if (!(FITTING_KINDS as readonly string[]).includes(fitting.kind)) {
      throw new HydraulicsInputError(`${field}.kind`, `must be one of ${FITTING_KINDS.join(", ")}`);
    }
    if (PLASTIC.includes(material) && fitting.kind !== "tee-run") {
      throw new HydraulicsInputError(
        `${field}.equivalentLengthFt`,
        `${PIPE_DATA[material].label} fittings use the pipe maker's listed equivalent lengths, not the steel chart: enter the listed value`,
      );
    }
    const chartFt = STEEL_40_EQUIVALENT_LENGTH_FT[fitting.kind][nominalSize];
    if (chartFt === null) {
      throw new HydraulicsInputError(
        `${field}.kind`,
        `the chart gives no ${FITTING_LABELS[fitting.kind].toLowerCase()} value at ${nominalSize} in: enter the maker's equivalent length`,
      );
    }
    const cFactor = options.cFactor ?? PIPE_DATA[material].cFactor;
    const { multiplier: cMultiplier, source: cSource } = cFactorMultiplier(cFactor);
    const sch40 = pipeDimensions("steel-40", nominalSize).insideDiameterIn;
    const actualId = options.insideDiameterIn ?? dims.insideDiameterIn;
    const diameterMultiplier = material === "steel-40" && options.insideDiameterIn === undefined ? 1 : (actualId / sch40) ** 4.87;
    const each = chartFt * cMultiplier * diameterMultiplier;
    items.push({
      label: FITTING_LABELS[fitting.kind],
      count,
      eachFt: each,
      totalFt: each * count,
      chartFt,
      cMultiplier,
      diameterMultiplier,
      source:
        fitting.kind === "tee-run"
          ? "common practice: flow through the run of a tee is charged as pipe length only"
          : `NFPA 13 equivalent schedule 40 steel pipe length chart (C = 120), × ${cMultiplier.toFixed(3)} for C = ${cFactor} (${cSource === "table" ? "chart multiplier" : "(C/120)^1.85"})` +
            (diameterMultiplier === 1 ? "" : `, × (ID ${actualId} / sch 40 ID ${sch40})^4.87`),
    });
  });
  return { totalFt: items.reduce((sum, it) => sum + it.totalFt, 0), items };
}

