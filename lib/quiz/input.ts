import { z } from "zod";

/** One saved answer: option id(s), true/false, a number, or null to clear. */
export const answerInput = z.object({
  position: z.number().int().min(1).max(100),
  answer: z.union([z.string().max(8), z.array(z.string().max(8)).max(10), z.boolean(), z.number(), z.null()]),
});
export const answersBody = z.object({ answers: z.array(answerInput).max(100) });
