import type { Units } from "@/lib/hydraulics";

/** the unit names a form shows beside its fields */
export function unitLabels(units: Units | undefined) {
  return units === "si"
    ? { pressure: "bar", flow: "L/min", length: "m", diameter: "mm", area: "m²", k: "L/min/bar½" }
    : { pressure: "psi", flow: "gpm", length: "ft", diameter: "in", area: "ft²", k: "gpm/psi½" };
}
