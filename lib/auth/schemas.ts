/** Form schemas shared by the browser (react-hook-form) and the server (route handlers). */
import { z } from "zod";
import { nameProblem, normalizeName } from "@/lib/names";

export const email = z.string().trim().toLowerCase().email("Enter an e-mail address like name@company.com").max(255, "At most 255 characters");
/**
 * NIST SP 800-63B-4 §3.1.1.2: at least 15 characters when the password is the only factor, at least 8
 * when the account also has a second factor (two-step sign-in); no composition rules (blocklist:
 * lib/auth/password-policy.ts). Sign-up and invitations always take the 15 (no second factor yet).
 */
export const MIN_PASSWORD_LENGTH = 15;
export const MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR = 8;
export const password = z.string().min(MIN_PASSWORD_LENGTH, "Use at least 15 characters (a few words make a good one)").max(128, "At most 128 characters");
/** A new password for an account that signs in with a second factor too. */
export const passwordWithSecondFactor = z.string().min(MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR, "Use at least 8 characters").max(128, "At most 128 characters");
// The name rule is lib/names.ts (certificates print it; the server enforces it in lib/auth hooks too).
export const personName = z
  .string()
  .superRefine((v, ctx) => {
    const problem = nameProblem(v);
    if (problem) ctx.addIssue({ code: "custom", message: problem });
  })
  .transform(normalizeName);

export const signUpSchema = z.object({
  name: personName,
  email,
  password,
  organizationName: z.string().trim().min(2, "Enter your company's name").max(200, "At most 200 characters"),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({ email, password: z.string().min(1, "Enter your password") });
export const forgotSchema = z.object({ email });
/** A reset's new password: 8 characters will do for an account with two-step sign-in, 15 otherwise. */
export const resetSchemaFor = (hasSecondFactor: boolean) =>
  z
    .object({ password: hasSecondFactor ? passwordWithSecondFactor : password, confirm: z.string() })
    .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });
export const resetSchema = resetSchemaFor(false);
