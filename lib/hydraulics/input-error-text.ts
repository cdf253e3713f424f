/**
 * The sentence a calculator form shows for a HydraulicsInputError, in the reader's language. The
 * library raises its reasons in English ("must be greater than 0, got -7"); each known reason maps
 * to a key of the calcReports catalog (`inputErrors.*`) with its parts as arguments, and each form
 * field to `inputFields.*`. Numbers pass through as the library wrote them, so a language never
 * changes a figure. A reason not listed here is shown as the library wrote it.
 *
 * Browser-safe: no Node-only APIs.
 */
import { FITTING_KINDS, FITTING_LABELS } from "./fittings";
import { PIPE_DATA, PIPE_MATERIALS } from "./pipe-data";
import { fieldPath } from "./schemas";
import { englishReportT, type ReportT } from "./reports/text";

/** the form fields whose names the catalog carries (last part of the field path) */
export const INPUT_FIELD_NAMES = [
  "k", "pressure", "flow", "material", "nominalSize", "length", "elbows", "teeBranches", "listedFittingsLength",
  "insideDiameter", "cFactor", "height", "staticPressure", "residualPressure", "testFlow", "demandFlow",
  "demandPressure", "residualTarget", "duration", "width", "maxSpacing", "maxArea", "minSpacing", "maxWallDistance",
  "elevation", "minFlow", "minPressure", "coverageArea", "loss", "additionalFlow", "label", "sprinklers", "segments",
  "devices", "supply",
] as const;

/** "segments[0].listedFittingsLength" → "Listed fittings length" (the English label, from the name) */
export function fieldLabel(field: string): string {
  const last = String(fieldPath(field).filter((p) => typeof p === "string").pop() ?? field);
  const words = last.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();
  const named: Record<string, string> = { k: "K-factor", "c factor": "C-factor", "tee branches": "Tees" };
  const text = named[words] ?? words;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

type Arg = (m: RegExpExecArray, t: ReportT) => string;
const group = (i: number): Arg => (m) => m[i] ?? "";
const materialNamed = (i: number): Arg => (m, t) => {
  const id = PIPE_MATERIALS.find((p) => PIPE_DATA[p].label === m[i]);
  return id ? t(`material.${id}`) : (m[i] ?? "");
};
const fittingNamed = (i: number): Arg => (m, t) => {
  const kind = FITTING_KINDS.find((k) => FITTING_LABELS[k].toLowerCase() === m[i]);
  return kind ? t(`inputErrors.fitting.${kind}`) : (m[i] ?? "");
};

/** library reason → catalog key and its arguments; `whole`: the reason is a sentence of its own (no field name) */
const REASONS: { re: RegExp; key: string; args?: Record<string, Arg>; whole?: boolean }[] = [
  { re: /^must be a finite number, got missing$/, key: "missing" },
  { re: /^must be a finite number, got not a number \((.+)\)$/, key: "notANumber", args: { type: group(1) } },
  { re: /^must be a finite number, got (.+)$/, key: "notFinite", args: { got: group(1) } },
  { re: /^must be greater than 0, got (.+)$/, key: "greaterThanZero", args: { got: group(1) } },
  { re: /^must be at most (.+), got (.+)$/, key: "atMost", args: { max: group(1), got: group(2) } },
  { re: /^must not be negative, got (.+)$/, key: "notNegative", args: { got: group(1) } },
  { re: /^must be between (.+) and (.+), got (.+)$/, key: "between", args: { min: group(1), max: group(2), got: group(3) } },
  { re: /^must be a whole number, got (.+)$/, key: "wholeNumber", args: { got: group(1) } },
  { re: /^the inputs together are outside the range this calculator handles$/, key: "outsideRange" },
  { re: /^give one or two design sprinklers$/, key: "oneOrTwoSprinklers" },
  { re: /^must be a list of pipe segments$/, key: "segmentList" },
  { re: /^for (.+) must be one of (.+)$/, key: "sizeFor", args: { material: materialNamed(1), sizes: group(2) } },
  { re: /^must be one of (.+)$/, key: "oneOf", args: { list: group(1) } },
  { re: /^(.+) fittings use the pipe maker's listed equivalent lengths, not the steel chart: enter the listed value$/, key: "plasticFittings", args: { material: materialNamed(1) }, whole: true },
  { re: /^the chart gives no (.+) value at (.+) in: enter the maker's equivalent length$/, key: "noChartValue", args: { fitting: fittingNamed(1), size: group(2) } },
  { re: /^must be below the static pressure: a test with no pressure drop cannot be projected to other flows$/, key: "belowStaticProjected" },
  { re: /^must be below the static pressure$/, key: "belowStatic" },
  { re: /^is beyond the range this calculator handles$/, key: "beyondRange" },
];

/** the field's label in the reader's language (English from its name when the catalog has none) */
function labelOf(field: string, t: ReportT): string {
  const last = String(fieldPath(field).filter((p) => typeof p === "string").pop() ?? field);
  return (INPUT_FIELD_NAMES as readonly string[]).includes(last) ? t(`inputFields.${last}`) : fieldLabel(field);
}

/**
 * The sentence shown beside the field: "Pressure must be greater than 0, got -7." in English,
 * the same words from the reader's catalog otherwise.
 */
export function inputErrorSentence(e: { field: string; reason: string }, t: ReportT = englishReportT): string {
  for (const r of REASONS) {
    const m = r.re.exec(e.reason);
    if (!m) continue;
    const values: Record<string, string> = {};
    for (const [name, arg] of Object.entries(r.args ?? {})) values[name] = arg(m, t);
    if (!r.whole) values.field = labelOf(e.field, t);
    return t(`inputErrors.${r.key}`, values);
  }
  // a reason the catalog does not know: as the library wrote it
  const sentence = /^[A-Z]/.test(e.reason) ? e.reason : `${fieldLabel(e.field)} ${e.reason}`;
  return sentence.endsWith(".") ? sentence : `${sentence}.`;
}
