/** Input schemas shared by the certificate forms (browser) and route handlers (server). */
import { z } from "zod";
import { parseVerifyInput, VERIFY_INPUT_ERROR } from "./verify-code";

export const revokeInput = z.object({
  reason: z
    .string({ error: "Give the reason for revoking." })
    .trim()
    .min(5, "Give the reason for revoking (at least 5 characters): it goes into the audit log.")
    .max(500, "Keep the reason under 500 characters."),
});
export type RevokeInput = z.infer<typeof revokeInput>;

export const verifyCodeInput = z.object({
  code: z
    .string()
    .trim()
    .min(1, "Type or paste the code printed under the verification address, or the certificate's serial.")
    .refine((s) => parseVerifyInput(s) !== null, VERIFY_INPUT_ERROR),
});
export type VerifyCodeInput = z.infer<typeof verifyCodeInput>;
