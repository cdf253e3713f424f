/** The calculators' US / SI switch: converts what a form holds, through the one conversion path in units.ts. */
import { fromUs, toUs, type Quantity, type Units } from "./units";

/** which quantity each input key holds (the same key means the same quantity in every calculator) */
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
  coverageArea: "area",
};

/**
 * Convert every quantity in a form's values (numbers or numeric text, nested in objects and lists)
 * from one unit system to the other, to 4 significant figures. Blank or non-numeric text is left
 * as typed, so the form can still show its error.
 */
export function convertInputUnits<T>(values: T, from: Units, to: Units): T {
  if (from === to) return values;
  const convert = (q: Quantity, v: number) => fromUs(q, toUs(q, v, from), to);
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
