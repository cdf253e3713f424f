/** The fittings a calculator form lets you enter, as the library's fitting list, and errors mapped back to those fields. */
import { HydraulicsInputError } from "../errors";
import { FITTING_LABELS, type FittingInput } from "../fittings";
import { toUs, type Units } from "../units";

export function fittingList(
  elbows: number | undefined,
  tees: number | undefined,
  listed: number | undefined,
  units: Units,
  listedLabel = "Listed fittings (maker's equivalent lengths)",
): FittingInput[] {
  const list: FittingInput[] = [];
  if (elbows) list.push({ kind: "elbow-90", count: elbows });
  if (tees) list.push({ kind: "tee-branch", count: tees });
  if (listed) list.push({ label: listedLabel, equivalentLengthFt: toUs("length", listed, units) });
  return list;
}

const FITTING_FIELD_NAMES: Record<string, string> = { count: "elbows", equivalentLengthFt: "listedFittingsLength" };

/** map "fittings[i].x" errors back to the form's fields */
export function fittingsError(e: HydraulicsInputError, fittings: FittingInput[], prefix: string): HydraulicsInputError {
  const m = /fittings\[(\d+)\]\.(\w+)$/.exec(e.field);
  if (!m) return new HydraulicsInputError(`${prefix}${e.field.split(".").pop() ?? e.field}`, e.reason);
  const item = fittings[Number(m[1])];
  let name = FITTING_FIELD_NAMES[m[2] ?? ""] ?? "elbows";
  if (item && "kind" in item) name = item.kind === "tee-branch" ? "teeBranches" : "elbows";
  if (item && "equivalentLengthFt" in item) name = "listedFittingsLength";
  return new HydraulicsInputError(`${prefix}${name}`, e.reason);
}

/** the friction/fitting labels, for forms */
export const FITTING_NAMES = { elbows: FITTING_LABELS["elbow-90"], teeBranches: FITTING_LABELS["tee-branch"] };

/**
 * What the calculators say about using the nominal size as the bore: the error goes both ways.
 * Copper Type L/M, CPVC and schedule 40 steel have real bores LARGER than nominal (using nominal
 * overstates loss); PEX's real bore is much SMALLER (using nominal understates loss — the
 * dangerous case).
 */
export const NOMINAL_BORE_NOTE =
  "Never use the nominal size as the bore. The error can go either way: copper Type L and M, CPVC and schedule 40 steel have real bores larger than nominal (nominal overstates loss), while PEX's bore is much smaller (1 in PEX is about 0.86 in — nominal understates loss, the dangerous case).";
