/**
 * A calculator form's resolver schema: the calculator's input schema (schemas.ts) plus one refinement
 * that runs the calculator, so rules between fields (CPVC fittings need listed lengths, a size the
 * material does not come in …) come back as an error on the right field.
 */
import type { z } from "zod";
import type { CalculatorId } from "./catalog";
import { HydraulicsInputError } from "./errors";
import { calculatorReport } from "./reports";
import { inputErrorSentence } from "./input-error-text";
import type { ReportT } from "./reports/text";
import { CALCULATOR_SCHEMAS, fieldPath } from "./schemas";

export { fieldLabel } from "./input-error-text";

/** `t`: the calcReports translator of the reader's language (English without one) */
export function calculatorFormSchema<I extends CalculatorId>(id: I, t?: ReportT) {
  const schema = CALCULATOR_SCHEMAS[id] as unknown as z.ZodType<unknown, unknown>;
  return schema.superRefine((input, ctx) => {
    try {
      calculatorReport(id, input);
    } catch (e) {
      if (e instanceof HydraulicsInputError) {
        // library reasons read "must be …" (needs the field's name) or are whole sentences
        ctx.addIssue({ code: "custom", path: fieldPath(e.field), message: inputErrorSentence(e, t) });
      } else {
        ctx.addIssue({ code: "custom", path: [], message: "These inputs could not be calculated." });
      }
    }
  });
}
