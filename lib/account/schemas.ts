/** Account settings forms: shared by the browser forms; better-auth checks the same rules on its side. */
import { z } from "zod";
import { email, password, passwordWithSecondFactor, personName } from "@/lib/auth/browser";

export const nameSchema = z.object({ name: personName });

export const emailChangeSchema = z.object({ email, password: z.string().min(1, "Enter your current password").max(128, "At most 128 characters") });

/** The new password's length rule depends on whether the account has a second factor (lib/auth/schemas.ts). */
export const passwordChangeSchemaFor = (hasSecondFactor: boolean) =>
  z
    .object({
      currentPassword: z.string().min(1, "Enter your current password"),
      newPassword: hasSecondFactor ? passwordWithSecondFactor : password,
      confirm: z.string(),
      signOutOthers: z.boolean(),
    })
    .refine((v) => v.newPassword === v.confirm, { path: ["confirm"], message: "The two new passwords differ" })
    .refine((v) => v.newPassword !== v.currentPassword, { path: ["newPassword"], message: "Choose a password different from the current one" });
export const passwordChangeSchema = passwordChangeSchemaFor(false);
