/**
 * The calculators' input contract: one zod schema per calculator. The web forms validate with these
 * schemas (their react-hook-form resolver is built from them), `calculatorReport` parses with them,
 * and the server's PDF summary parses what the browser sends with them — so the types below
 * (z.infer) are the only input types. Numbers may arrive as numbers (API, presets) or as the text a
 * form field holds; both parse to numbers. Sizes are capped (rows, labels, text length) so that an
 * oversized request gets a 400 with a message instead of work.
 *
 * Browser-safe: no Node-only APIs; pure zod.
 */
import { z } from "zod";
import { NOMINAL_SIZES, PIPE_MATERIALS } from "./pipe-data";

import { INPUT_CAPS } from "./caps";

export { INPUT_CAPS };

type Rule = "positive" | "nonnegative" | "any" | "count";

const raw = (label: string) =>
  z
    .union([z.number(), z.string().max(INPUT_CAPS.numberTextChars, `The ${label} is too long to be a number.`), z.null()], {
      error: `The ${label} must be a number.`,
    })
    .optional();

type Checked = { ok: true; value: number | undefined } | { ok: false; message: string };

function check(v: number | string | null | undefined, label: string, rule: Rule): Checked {
  if (v === undefined || v === null || (typeof v === "string" && v.trim() === "")) return { ok: true, value: undefined };
  const n = typeof v === "number" ? v : Number(v.trim());
  if (!Number.isFinite(n)) return { ok: false, message: `The ${label} must be a number.` };
  if (rule === "positive" && n <= 0) return { ok: false, message: `The ${label} must be more than 0.` };
  if ((rule === "nonnegative" || rule === "count") && n < 0) return { ok: false, message: `The ${label} must not be negative.` };
  if (rule === "count" && !Number.isInteger(n)) return { ok: false, message: `The ${label} must be a whole number.` };
  return { ok: true, value: n };
}

/** a required number */
function num(label: string, rule: Rule = "positive") {
  return raw(label).transform((v, ctx): number => {
    const r = check(v, label, rule);
    if (!r.ok) {
      ctx.addIssue({ code: "custom", message: r.message });
      return z.NEVER;
    }
    if (r.value === undefined) {
      ctx.addIssue({ code: "custom", message: `Enter the ${label}.` });
      return z.NEVER;
    }
    return r.value;
  });
}

/** a number that may be left blank */
function optNum(label: string, rule: Rule = "nonnegative") {
  return raw(label).transform((v, ctx): number | undefined => {
    const r = check(v, label, rule);
    if (!r.ok) {
      ctx.addIssue({ code: "custom", message: r.message });
      return z.NEVER;
    }
    return r.value;
  }).optional();
}

const label = z
  .string()
  .trim()
  .max(INPUT_CAPS.labelChars, `Keep the label to ${INPUT_CAPS.labelChars} characters.`)
  .optional()
  .transform((v) => (v ? v : undefined))
  .optional();

const units = z.enum(["us", "si"], { error: 'Units must be "us" or "si".' }).default("us");
const material = z.enum(PIPE_MATERIALS, { error: `Choose a pipe material: ${PIPE_MATERIALS.join(", ")}.` });
const nominalSize = z.enum(NOMINAL_SIZES, { error: `Choose a nominal size: ${NOMINAL_SIZES.join(", ")}.` });

export const sprinklerFlowInput = z
  .object({
    units,
    solveFor: z.enum(["flow", "pressure"], { error: 'Find "flow" or "pressure".' }).default("flow"),
    k: num("K-factor"),
    pressure: optNum("pressure", "positive"),
    flow: optNum("flow", "positive"),
  })
  .superRefine((v, ctx) => {
    if (v.solveFor === "flow" && v.pressure === undefined) ctx.addIssue({ code: "custom", path: ["pressure"], message: "Enter the pressure." });
    if (v.solveFor === "pressure" && v.flow === undefined) ctx.addIssue({ code: "custom", path: ["flow"], message: "Enter the flow." });
  });

export const frictionLossInput = z.object({
  units,
  material,
  nominalSize,
  flow: num("flow", "nonnegative"),
  length: num("pipe length", "nonnegative"),
  elbows: optNum("number of elbows", "count"),
  teeBranches: optNum("number of tees", "count"),
  /** total of the maker's listed equivalent lengths for the run's fittings (ft or m) */
  listedFittingsLength: optNum("listed fittings length"),
  /** the pipe's listed inside diameter (in or mm); when given it governs */
  insideDiameter: optNum("inside diameter", "positive"),
  cFactor: optNum("C-factor", "positive"),
});

export const elevationInput = z.object({ units, height: num("height", "nonnegative") });

export const flowTestInput = z
  .object({
    units,
    staticPressure: num("static pressure"),
    residualPressure: num("residual pressure", "nonnegative"),
    testFlow: num("test flow"),
    demandFlow: num("design flow", "nonnegative"),
    demandPressure: optNum("pressure needed"),
    residualTarget: optNum("residual for the rated flow"),
  })
  .superRefine((v, ctx) => {
    if (v.residualPressure >= v.staticPressure) {
      ctx.addIssue({
        code: "custom",
        path: ["residualPressure"],
        message: "The residual pressure must be below the static pressure: a test with no pressure drop cannot be projected to other flows.",
      });
    }
  });

export const storedWaterInput = z.object({ units, flow: num("design flow"), duration: num("duration") });

export const roomCoverageInput = z.object({
  units,
  length: num("room length"),
  width: num("room width"),
  maxSpacing: num("maximum spacing"),
  maxArea: num("maximum coverage area"),
  minSpacing: optNum("minimum spacing"),
  maxWallDistance: optNum("maximum wall distance", "positive"),
});

export const segmentInput = z.object({
  label,
  material,
  nominalSize,
  length: num("length", "nonnegative"),
  /** rise toward the sprinkler (negative if the pipe drops) */
  elevation: optNum("rise", "any"),
  elbows: optNum("number of elbows", "count"),
  teeBranches: optNum("number of tees", "count"),
  listedFittingsLength: optNum("listed fittings length"),
  /** the pipe's listed inside diameter (in or mm); when given it governs */
  insideDiameter: optNum("inside diameter", "positive"),
});

const blankSupply = (v: unknown) =>
  v && typeof v === "object" && Object.values(v).every((x) => x === undefined || x === null || (typeof x === "string" && x.trim() === ""))
    ? undefined
    : v;

export const systemDemandInput = z.object({
  units,
  sprinklers: z
    .array(
      z.object({
        label,
        k: num("K-factor"),
        minFlow: num("listed flow"),
        minPressure: optNum("listed minimum pressure", "positive"),
        /** the area this sprinkler covers (ft² or m²), for NFPA 13D's minimum density */
        coverageArea: optNum("coverage area", "positive"),
        branch: segmentInput.optional(),
      }),
      { error: "List the design sprinklers." },
    )
    .min(1, "Give at least one design sprinkler.")
    .max(INPUT_CAPS.designSprinklers, "NFPA 13D designs here take one or two design sprinklers."),
  segments: z.array(segmentInput, { error: "List the pipe runs." }).max(INPUT_CAPS.pipeRuns, `Up to ${INPUT_CAPS.pipeRuns} pipe runs.`),
  devices: z
    .array(z.object({ label, loss: num("loss", "nonnegative") }))
    .max(INPUT_CAPS.devices, `Up to ${INPUT_CAPS.devices} devices.`)
    .optional(),
  additionalFlow: optNum("additional flow"),
  supply: z.preprocess(
    blankSupply,
    z
      .object({
        staticPressure: num("static pressure"),
        residualPressure: num("residual pressure", "nonnegative"),
        testFlow: num("test flow"),
      })
      .optional(),
  ),
});

export const CALCULATOR_SCHEMAS = {
  "sprinkler-flow": sprinklerFlowInput,
  "friction-loss": frictionLossInput,
  elevation: elevationInput,
  "flow-test": flowTestInput,
  "stored-water": storedWaterInput,
  "room-coverage": roomCoverageInput,
  "system-demand": systemDemandInput,
} as const;

export type SprinklerFlowReportInput = z.infer<typeof sprinklerFlowInput>;
export type FrictionLossReportInput = z.infer<typeof frictionLossInput>;
export type ElevationReportInput = z.infer<typeof elevationInput>;
export type FlowTestReportInput = z.infer<typeof flowTestInput>;
export type StoredWaterReportInput = z.infer<typeof storedWaterInput>;
export type RoomCoverageReportInput = z.infer<typeof roomCoverageInput>;
export type SegmentReportInput = z.infer<typeof segmentInput>;
export type SystemDemandReportInput = z.infer<typeof systemDemandInput>;

/** each calculator's parsed input */
export type CalculatorInputs = { [K in keyof typeof CALCULATOR_SCHEMAS]: z.output<(typeof CALCULATOR_SCHEMAS)[K]> };
/** what each calculator's form holds (numbers as typed text) */
export type CalculatorFormValues = { [K in keyof typeof CALCULATOR_SCHEMAS]: z.input<(typeof CALCULATOR_SCHEMAS)[K]> };

/** ["segments", 1, "length"] → "segments[1].length" */
export function fieldName(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, p) => (typeof p === "number" ? `${out}[${p}]` : out ? `${out}.${String(p)}` : String(p)), "");
}

/** "segments[0].length" → ["segments", 0, "length"] */
export function fieldPath(field: string): (string | number)[] {
  return field
    .split(/[.[\]]/)
    .filter((p) => p !== "")
    .map((p) => (/^\d+$/.test(p) ? Number(p) : p));
}
