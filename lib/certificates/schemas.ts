/** Input schemas shared by the certificate forms (browser) and route handlers (server). */
import { z } from "zod";
import { extractVerificationCode } from "./status";

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
    .min(1, "Type or paste the code printed under the QR code.")
    .refine((s) => extractVerificationCode(s) !== null, "That is not a Riser verification code: it has 24 letters, digits, - or _."),
});
export type VerifyCodeInput = z.infer<typeof verifyCodeInput>;
