/**
 * Form schemas for the calculators (zod 4). Form fields hold text as typed; each schema checks every
 * field on its own (so several errors show at once), turns the text into numbers, and then runs the
 * calculator itself so that rules between fields (residual below static, CPVC fittings need listed
 * lengths …) come back as an error on the right field. The output is the calculator's input.
 */
import { z } from "zod";
import {
  HydraulicsInputError,
  NOMINAL_SIZES,
  PIPE_MATERIALS,
  calculatorReport,
  type CalculatorId,
  type CalculatorInputs,
} from "@/lib/hydraulics";

const isNumberText = (v: string) => v.trim() !== "" && Number.isFinite(Number(v.trim()));

function numberField(label: string, rule: "positive" | "nonnegative" | "any" = "positive") {
  return z
    .string()
    .trim()
    .min(1, `Enter the ${label}.`)
    .refine(isNumberText, `The ${label} must be a number.`)
    .transform(Number)
    .refine((n) => (rule === "positive" ? n > 0 : rule === "nonnegative" ? n >= 0 : true), {
      message: rule === "positive" ? `The ${label} must be more than 0.` : `The ${label} must not be negative.`,
    });
}

function optionalNumber(label: string, rule: "positive" | "nonnegative" | "any" = "nonnegative", blankHint = true) {
  return z
    .string()
    .trim()
    .refine((v) => v === "" || isNumberText(v), `The ${label} must be a number${blankHint ? " (or leave it blank)" : ""}.`)
    .transform((v) => (v === "" ? undefined : Number(v)))
    .refine((n) => n === undefined || (rule === "positive" ? n > 0 : rule === "nonnegative" ? n >= 0 : true), {
      message: rule === "positive" ? `The ${label} must be more than 0.` : `The ${label} must not be negative.`,
    });
}

function countField(label: string) {
  return optionalNumber(label).refine((n) => n === undefined || Number.isInteger(n), `The ${label} must be a whole number.`);
}

const units = z.enum(["us", "si"]);
const material = z.enum(PIPE_MATERIALS, { error: "Choose a pipe material." });
const nominalSize = z.enum(NOMINAL_SIZES, { error: "Choose a nominal size." });

/** "segments[0].length" → ["segments", 0, "length"] */
export function fieldPath(field: string): (string | number)[] {
  return field
    .split(/[.[\]]/)
    .filter((p) => p !== "")
    .map((p) => (/^\d+$/.test(p) ? Number(p) : p));
}

/** "segments[0].listedFittingsLength" → "Listed fittings length" */
export function fieldLabel(field: string): string {
  const last = String(fieldPath(field).filter((p) => typeof p === "string").pop() ?? field);
  const words = last.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();
  const named: Record<string, string> = { k: "K-factor", "c factor": "C-factor", "tee branches": "Tees" };
  const text = named[words] ?? words;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** run the calculator over parsed input and report its error on the field it names */
function checkedBy<I extends CalculatorId>(id: I) {
  return (input: CalculatorInputs[I], ctx: z.RefinementCtx) => {
    try {
      calculatorReport(id, input);
    } catch (e) {
      if (e instanceof HydraulicsInputError) {
        // library reasons read "must be …" (needs the field's name) or are whole sentences
        const sentence = /^[A-Z]/.test(e.reason) ? e.reason : `${fieldLabel(e.field)} ${e.reason}`;
        const message = sentence.endsWith(".") ? sentence : `${sentence}.`;
        ctx.addIssue({ code: "custom", path: fieldPath(e.field), message });
      } else {
        ctx.addIssue({ code: "custom", path: [], message: "These inputs could not be calculated." });
      }
    }
  };
}

export const sprinklerFlowSchema = z
  .object({
    units,
    solveFor: z.enum(["flow", "pressure"]),
    k: numberField("K-factor"),
    pressure: optionalNumber("pressure", "positive", false),
    flow: optionalNumber("flow", "positive", false),
  })
  .superRefine((v, ctx) => {
    if (v.solveFor === "flow" && v.pressure === undefined) ctx.addIssue({ code: "custom", path: ["pressure"], message: "Enter the pressure." });
    if (v.solveFor === "pressure" && v.flow === undefined) ctx.addIssue({ code: "custom", path: ["flow"], message: "Enter the flow." });
  })
  .superRefine(checkedBy("sprinkler-flow"));

export const frictionLossSchema = z
  .object({
    units,
    material,
    nominalSize,
    flow: numberField("flow", "nonnegative"),
    length: numberField("pipe length", "nonnegative"),
    elbows: countField("number of elbows"),
    teeBranches: countField("number of tees"),
    listedFittingsLength: optionalNumber("listed fittings length"),
    insideDiameter: optionalNumber("inside diameter", "positive"),
    cFactor: optionalNumber("C-factor", "positive"),
  })
  .superRefine(checkedBy("friction-loss"));

export const elevationSchema = z.object({ units, height: numberField("height", "nonnegative") }).superRefine(checkedBy("elevation"));

export const flowTestSchema = z
  .object({
    units,
    staticPressure: numberField("static pressure"),
    residualPressure: numberField("residual pressure", "nonnegative"),
    testFlow: numberField("test flow"),
    demandFlow: numberField("design flow", "nonnegative"),
    demandPressure: optionalNumber("pressure needed"),
    residualTarget: optionalNumber("residual for the rated flow"),
  })
  .superRefine(checkedBy("flow-test"));

export const storedWaterSchema = z
  .object({ units, flow: numberField("design flow"), duration: numberField("duration") })
  .superRefine(checkedBy("stored-water"));

export const roomCoverageSchema = z
  .object({
    units,
    length: numberField("room length"),
    width: numberField("room width"),
    maxSpacing: numberField("maximum spacing"),
    maxArea: numberField("maximum coverage area"),
    minSpacing: optionalNumber("minimum spacing"),
    maxWallDistance: optionalNumber("maximum wall distance", "positive"),
  })
  .superRefine(checkedBy("room-coverage"));

const segment = z.object({
  label: z.string().trim().max(60, "Keep the label under 60 characters."),
  material,
  nominalSize,
  length: numberField("length", "nonnegative"),
  elevation: optionalNumber("rise", "any"),
  elbows: countField("number of elbows"),
  teeBranches: countField("number of tees"),
  listedFittingsLength: optionalNumber("listed fittings length"),
});

export const systemDemandSchema = z
  .object({
    units,
    sprinklers: z
      .array(
        z.object({
          label: z.string().trim().max(60, "Keep the label under 60 characters."),
          k: numberField("K-factor"),
          minFlow: numberField("listed flow"),
          minPressure: optionalNumber("listed minimum pressure", "positive"),
          branch: segment,
        }),
      )
      .min(1, "Give at least one design sprinkler.")
      .max(2, "Residual design here takes one or two design sprinklers."),
    segments: z.array(segment).max(12, "Up to 12 pipe runs."),
    devices: z.array(z.object({ label: z.string().trim().max(60), loss: numberField("loss", "nonnegative") })).max(8),
    additionalFlow: optionalNumber("additional flow"),
    useSupply: z.boolean(),
    supply: z.object({
      staticPressure: optionalNumber("static pressure", "positive"),
      residualPressure: optionalNumber("residual pressure"),
      testFlow: optionalNumber("test flow", "positive"),
    }),
  })
  .transform((v, ctx) => {
    let supply: CalculatorInputs["system-demand"]["supply"];
    if (v.useSupply) {
      const { staticPressure, residualPressure, testFlow } = v.supply;
      if (staticPressure === undefined) ctx.addIssue({ code: "custom", path: ["supply", "staticPressure"], message: "Enter the static pressure." });
      if (residualPressure === undefined) ctx.addIssue({ code: "custom", path: ["supply", "residualPressure"], message: "Enter the residual pressure." });
      if (testFlow === undefined) ctx.addIssue({ code: "custom", path: ["supply", "testFlow"], message: "Enter the test flow." });
      if (staticPressure !== undefined && residualPressure !== undefined && testFlow !== undefined) {
        supply = { staticPressure, residualPressure, testFlow };
      }
    }
    const out: CalculatorInputs["system-demand"] = {
      units: v.units,
      sprinklers: v.sprinklers.map((s) => ({ ...s, label: s.label || undefined, branch: { ...s.branch, label: s.branch.label || undefined } })),
      segments: v.segments.map((s) => ({ ...s, label: s.label || undefined })),
      devices: v.devices,
      additionalFlow: v.additionalFlow,
      supply,
    };
    return out;
  })
  .superRefine(checkedBy("system-demand"));

export const CALCULATOR_SCHEMAS = {
  "sprinkler-flow": sprinklerFlowSchema,
  "friction-loss": frictionLossSchema,
  elevation: elevationSchema,
  "flow-test": flowTestSchema,
  "stored-water": storedWaterSchema,
  "room-coverage": roomCoverageSchema,
  "system-demand": systemDemandSchema,
} as const;

/* ---------- form values from calculator inputs ---------- */

const text = (v: number | undefined) => (v === undefined ? "" : String(v));

export type SegmentFormValues = z.input<typeof segment>;
export type SystemDemandFormValues = z.input<typeof systemDemandSchema>;

function segmentValues(s: CalculatorInputs["system-demand"]["segments"][number] | undefined, fallbackLabel: string): SegmentFormValues {
  return {
    label: s?.label ?? fallbackLabel,
    material: s?.material ?? "cpvc",
    nominalSize: s?.nominalSize ?? "1",
    length: text(s?.length ?? 0),
    elevation: text(s?.elevation),
    elbows: text(s?.elbows),
    teeBranches: text(s?.teeBranches),
    listedFittingsLength: text(s?.listedFittingsLength),
  };
}

export const emptySegment = (label: string): SegmentFormValues => segmentValues(undefined, label);

export function systemDemandFormValues(input: CalculatorInputs["system-demand"]): SystemDemandFormValues {
  return {
    units: input.units,
    sprinklers: input.sprinklers.map((s, i) => ({
      label: s.label ?? `Sprinkler ${String.fromCharCode(65 + i)}`,
      k: text(s.k),
      minFlow: text(s.minFlow),
      minPressure: text(s.minPressure),
      branch: segmentValues(s.branch, `Branch ${String.fromCharCode(65 + i)}`),
    })),
    segments: input.segments.map((s, i) => segmentValues(s, `Pipe run ${i + 1}`)),
    devices: (input.devices ?? []).map((d) => ({ label: d.label, loss: text(d.loss) })),
    additionalFlow: text(input.additionalFlow),
    useSupply: input.supply !== undefined,
    supply: {
      staticPressure: text(input.supply?.staticPressure),
      residualPressure: text(input.supply?.residualPressure),
      testFlow: text(input.supply?.testFlow),
    },
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
} as const;

export type FlatCalculatorId = keyof typeof FLAT_FORM_FIELDS;

/** form values for a flat calculator: numbers as text, blanks for fields the input leaves out */
export function flatFormValues<I extends FlatCalculatorId>(id: I, input: CalculatorInputs[I]): z.input<(typeof CALCULATOR_SCHEMAS)[I]> {
  const out: Record<string, unknown> = {};
  const raw = input as unknown as Record<string, unknown>;
  for (const key of FLAT_FORM_FIELDS[id]) {
    const v = raw[key];
    out[key] = typeof v === "number" ? String(v) : v === undefined ? "" : v;
  }
  return out as z.input<(typeof CALCULATOR_SCHEMAS)[I]>;
}
