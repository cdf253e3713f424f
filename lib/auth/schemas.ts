/** Form schemas shared by the browser (react-hook-form) and the server (route handlers). */
import { z } from "zod";
import { nameProblem, normalizeName } from "@/lib/names";

export const email = z.string().trim().toLowerCase().email("Enter an e-mail address like name@company.com").max(255, "At most 255 characters");
/** NIST SP 800-63B-4: 15+ characters without a second factor, no composition rules (blocklist: lib/auth/password-policy.ts). */
export const password = z.string().min(15, "Use at least 15 characters (a few words make a good one)").max(128, "At most 128 characters");
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
export const resetSchema = z
  .object({ password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });
