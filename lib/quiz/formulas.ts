/**
 * The named computations a parametric quiz question may use (lib/content/schema.ts
 * `parametricFormula`), each a function of the drawn and fixed params, computed through
 * lib/hydraulics. A missing or bad param throws HydraulicsInputError naming it.
 */
import type { ParametricFormula } from "@/lib/content/browser";
import {
  HydraulicsInputError,
  designSprinklerPressurePsi,
  flowTestAvailablePsi,
  frictionLossPsi,
  headPressurePsi,
  sprinklerFlowGpm,
  sprinklersNeeded,
  storedWaterGal,
} from "@/lib/hydraulics";

export type FormulaParams = Record<string, number>;
export type FormulaFn = (params: FormulaParams) => number;

function param(params: FormulaParams, name: string): number {
  const v = params[name];
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new HydraulicsInputError(name, v === undefined ? "missing parameter" : `must be a finite number, got ${String(v)}`);
  }
  return v;
}

export const formulas = {
  sprinklerFlowGpm: (p) => sprinklerFlowGpm(param(p, "kFactor"), param(p, "pressurePsi")),
  // the pressure a design sprinkler needs: (Q/K)², never below NFPA 13D's 7 psi (CODE_FLOORS)
  sprinklerPressurePsi: (p) => designSprinklerPressurePsi(param(p, "kFactor"), param(p, "flowGpm")),
  elevationPsi: (p) => headPressurePsi(param(p, "heightFt")),
  frictionLossPsi: (p) =>
    frictionLossPsi({
      flowGpm: param(p, "flowGpm"),
      lengthFt: param(p, "lengthFt"),
      cFactor: param(p, "cFactor"),
      insideDiameterIn: param(p, "insideDiameterIn"),
    }),
  flowTestAvailablePsi: (p) =>
    flowTestAvailablePsi(
      { staticPsi: param(p, "staticPsi"), residualPsi: param(p, "residualPsi"), testFlowGpm: param(p, "testFlowGpm") },
      param(p, "demandFlowGpm"),
    ).pressurePsi,
  storedWaterGal: (p) => storedWaterGal(param(p, "flowGpm"), param(p, "durationMin")),
  sprinklersNeeded: (p) =>
    sprinklersNeeded({
      lengthFt: param(p, "lengthFt"),
      widthFt: param(p, "widthFt"),
      maxSpacingFt: param(p, "maxSpacingFt"),
      maxAreaSqFt: param(p, "maxAreaSqFt"),
    }),
} satisfies Record<ParametricFormula, FormulaFn>;

/** the param names each formula reads (for content checks and question authoring) */
export const FORMULA_PARAMS: Record<ParametricFormula, readonly string[]> = {
  sprinklerFlowGpm: ["kFactor", "pressurePsi"],
  sprinklerPressurePsi: ["kFactor", "flowGpm"],
  elevationPsi: ["heightFt"],
  frictionLossPsi: ["flowGpm", "lengthFt", "cFactor", "insideDiameterIn"],
  flowTestAvailablePsi: ["staticPsi", "residualPsi", "testFlowGpm", "demandFlowGpm"],
  storedWaterGal: ["flowGpm", "durationMin"],
  sprinklersNeeded: ["lengthFt", "widthFt", "maxSpacingFt", "maxAreaSqFt"],
};

/** compute a parametric question's answer */
export function computeFormula(name: ParametricFormula, params: FormulaParams): number {
  const fn: FormulaFn | undefined = (formulas as Record<string, FormulaFn>)[name];
  if (!fn) throw new HydraulicsInputError("formula", `unknown formula ${String(name)}`);
  return fn(params);
}
