/**
 * A calculator form's resolver schema: the calculator's input schema (schemas.ts) plus one refinement
 * that runs the calculator, so rules between fields (CPVC fittings need listed lengths, a size the
 * material does not come in …) come back as an error on the right field.
 */
import type { z } from "zod";
import type { CalculatorId } from "./catalog";
import { HydraulicsInputError } from "./errors";
import { calculatorReport } from "./reports";
import { CALCULATOR_SCHEMAS, fieldPath } from "./schemas";

/** "segments[0].listedFittingsLength" → "Listed fittings length" */
export function fieldLabel(field: string): string {
  const last = String(fieldPath(field).filter((p) => typeof p === "string").pop() ?? field);
  const words = last.replace(/([a-z])([A-Z])/g, "$1 $2").toLowerCase();
  const named: Record<string, string> = { k: "K-factor", "c factor": "C-factor", "tee branches": "Tees" };
  const text = named[words] ?? words;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function calculatorFormSchema<I extends CalculatorId>(id: I) {
  const schema = CALCULATOR_SCHEMAS[id] as unknown as z.ZodType<unknown, unknown>;
  return schema.superRefine((input, ctx) => {
    try {
      calculatorReport(id, input);
    } catch (e) {
      if (e instanceof HydraulicsInputError) {
        // library reasons read "must be …" (needs the field's name) or are whole sentences
        const sentence = /^[A-Z]/.test(e.reason) ? e.reason : `${fieldLabel(e.field)} ${e.reason}`;
        ctx.addIssue({ code: "custom", path: fieldPath(e.field), message: sentence.endsWith(".") ? sentence : `${sentence}.` });
      } else {
        ctx.addIssue({ code: "custom", path: [], message: "These inputs could not be calculated." });
      }
    }
  });
}
