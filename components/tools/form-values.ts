/**
 * Form values from calculator inputs: numbers as the text a field shows, blanks for what the input
 * leaves out. The values are the input type of the calculator's schema (lib/hydraulics/shared), so
 * the same schema validates them.
 */
import type { CalculatorFormValues, CalculatorId, CalculatorInputs, ReportT, SegmentReportInput } from "@/lib/hydraulics";
import { PIPE_MATERIALS } from "@/lib/hydraulics/browser";
import type { CalculatorWords } from "./types";

const text = (v: number | undefined) => (v === undefined ? "" : String(v));

/** what one pipe run's fields hold */
export interface SegmentFormValues {
  label: string;
  material: SegmentReportInput["material"];
  nominalSize: SegmentReportInput["nominalSize"];
  length: string;
  elevation: string;
  elbows: string;
  teeBranches: string;
  listedFittingsLength: string;
  insideDiameter: string;
}

export interface SystemDemandFormValues {
  units: "us" | "si";
  sprinklers: { label: string; k: string; minFlow: string; minPressure: string; coverageArea: string; branch: SegmentFormValues }[];
  segments: SegmentFormValues[];
  devices: { label: string; loss: string }[];
  additionalFlow: string;
  supply: { staticPressure: string; residualPressure: string; testFlow: string };
}

function segmentValues(s: SegmentReportInput | undefined, fallbackLabel: string): SegmentFormValues {
  return {
    label: s?.label ?? fallbackLabel,
    material: s?.material ?? "cpvc",
    nominalSize: s?.nominalSize ?? "1",
    length: text(s?.length ?? 0),
    elevation: text(s?.elevation),
    elbows: text(s?.elbows),
    teeBranches: text(s?.teeBranches),
    listedFittingsLength: text(s?.listedFittingsLength),
    insideDiameter: text(s?.insideDiameter),
  };
}

export const emptySegment = (label: string): SegmentFormValues => segmentValues(undefined, label);

/** the example system's labels (lib/hydraulics/presets.ts) → their keys in the tools catalog (`demandExample.*`) */
const EXAMPLE_LABEL_KEYS: Record<string, string> = {
  "Great room, far sprinkler": "farSprinkler",
  "Branch to far sprinkler": "farBranch",
  "Great room, near sprinkler": "nearSprinkler",
  "Branch to near sprinkler": "nearBranch",
  "Water service": "waterService",
  "Riser and attic main": "riserMain",
  "Water meter (1 in; loss at the design flow, maker's curve)": "meter",
  "Backflow preventer (maker's curve)": "backflow",
};

/** a translator for the tools catalog (the example and default labels in the reader's language) */
export type LabelT = (key: string, values?: Record<string, string | number>) => string;

const englishLabels: LabelT = (key, values = {}) =>
  key === "sprinklerN" ? `Sprinkler ${values.letter}` : key === "branchN" ? `Branch ${values.letter}` : key === "pipeRunN" ? `Pipe run ${values.n}` : key;

/** form values for the system demand; without `t` the labels stay English */
export function systemDemandFormValues(input: CalculatorInputs["system-demand"], t?: LabelT): SystemDemandFormValues {
  const tl = t ?? englishLabels;
  // an example label is shown in the reader's language; a label a lesson or a person wrote stays as written
  const ex = (label: string) => (t && EXAMPLE_LABEL_KEYS[label] ? t(`demandExample.${EXAMPLE_LABEL_KEYS[label]}`) : label);
  const seg = (s: SegmentReportInput | undefined, fallback: string) => {
    const v = segmentValues(s, fallback);
    return s?.label ? { ...v, label: ex(s.label) } : v;
  };
  return {
    units: input.units,
    sprinklers: input.sprinklers.map((s, i) => ({
      label: s.label ? ex(s.label) : tl("sprinklerN", { letter: String.fromCharCode(65 + i) }),
      k: text(s.k),
      minFlow: text(s.minFlow),
      minPressure: text(s.minPressure),
      coverageArea: text(s.coverageArea),
      branch: seg(s.branch, tl("branchN", { letter: String.fromCharCode(65 + i) })),
    })),
    segments: input.segments.map((s, i) => seg(s, tl("pipeRunN", { n: i + 1 }))),
    devices: (input.devices ?? []).map((d) => ({ label: d.label ? ex(d.label) : "", loss: text(d.loss) })),
    additionalFlow: text(input.additionalFlow),
    supply: {
      staticPressure: text(input.supply?.staticPressure),
      residualPressure: text(input.supply?.residualPressure),
      testFlow: text(input.supply?.testFlow),
    },
  };
}

/** the calcReports words a form shows before its engine has loaded, from that catalog's translator */
export function calculatorWords(tr: ReportT): CalculatorWords {
  return {
    materials: Object.fromEntries(PIPE_MATERIALS.map((m) => [m, tr(`material.${m}`)])),
    margin: tr("common.margin"),
    shortfall: tr("common.shortfall"),
  };
}

/** every field each flat calculator's form holds */
export const FLAT_FORM_FIELDS = {
  "sprinkler-flow": ["units", "solveFor", "k", "pressure", "flow"],
  "friction-loss": ["units", "material", "nominalSize", "flow", "length", "elbows", "teeBranches", "listedFittingsLength", "insideDiameter", "cFactor"],
  elevation: ["units", "height"],
  "flow-test": ["units", "staticPressure", "residualPressure", "testFlow", "demandFlow", "demandPressure", "residualTarget"],
  "stored-water": ["units", "flow", "duration"],
  "room-coverage": ["units", "length", "width", "maxSpacing", "maxArea", "minSpacing", "maxWallDistance"],
} as const satisfies Partial<Record<CalculatorId, readonly string[]>>;

export type FlatCalculatorId = keyof typeof FLAT_FORM_FIELDS;

/** form values for a flat calculator: numbers as text, blanks for fields the input leaves out */
export function flatFormValues<I extends FlatCalculatorId>(id: I, input: CalculatorInputs[I]): CalculatorFormValues[I] {
  const out: Record<string, unknown> = {};
  const raw = input as unknown as Record<string, unknown>;
  for (const key of FLAT_FORM_FIELDS[id]) {
    const v = raw[key];
    out[key] = typeof v === "number" ? String(v) : v === undefined ? "" : v;
  }
  return out as CalculatorFormValues[I];
}
