/**
 * Messages that reach people as English text (the shared zod schemas' messages, the API's errors)
 * are shown in the reader's language through the "errors" catalog. Checked against the schemas'
 * own output: every message the sign-in, sign-up, reset and account forms can produce is in the
 * catalog, and a message with a value in it (the quiz's attempt limit) keeps that value.
 */
import { describe, expect, it } from "vitest";
import { createTranslator } from "use-intl/core";
import { signInSchema, signUpSchema, resetSchema } from "@/lib/auth/browser";
import { emailChangeSchema, passwordChangeSchema } from "@/lib/account/browser";
import { errorKeyOf } from "@/lib/i18n/browser";
import es from "@/messages/es/errors.json";

const messagesOf = (r: { success: boolean; error?: { issues: { message: string }[] } }) => (r.success ? [] : r.error!.issues.map((i) => i.message));

describe("schema and API messages in the reader's language", () => {
  it("finds every message the auth and account schemas produce for bad input", () => {
    const produced = [
      ...messagesOf(signInSchema.safeParse({ email: "not-an-address", password: "" })),
      ...messagesOf(signUpSchema.safeParse({ name: "a@b.example", email: "x".repeat(260), password: "short", organizationName: "" })),
      ...messagesOf(signUpSchema.safeParse({ name: "1234", email: "a@b.example", password: "p".repeat(200), organizationName: "x".repeat(201) })),
      ...messagesOf(resetSchema.safeParse({ password: "a-long-enough-password-1", confirm: "something else entirely" })),
      ...messagesOf(emailChangeSchema.safeParse({ email: "nope", password: "" })),
      ...messagesOf(passwordChangeSchema.safeParse({ currentPassword: "", newPassword: "x", confirm: "y", signOutOthers: true })),
    ];
    expect(produced.length).toBeGreaterThan(8);
    const missing = produced.filter((m) => errorKeyOf(m) === null);
    expect(missing).toEqual([]);
  });

  it("carries the values of a message with arguments into the Spanish text", () => {
    const english = "You have used 3 attempts in 24 hours. Your next attempt opens at 2026-12-03 08:30 UTC.";
    const found = errorKeyOf(english);
    expect(found).toEqual({ key: "attemptsUsed", values: { attempts: "3", hours: "24", when: "2026-12-03 08:30 UTC" } });
    const t = createTranslator({ locale: "es-US", messages: { errors: es }, namespace: "errors" });
    const spanish = t(found!.key as never, found!.values as never);
    for (const v of ["3", "24", "2026-12-03 08:30 UTC"]) expect(spanish).toContain(v);
    expect(spanish).not.toBe(english);
  });

  it("leaves text that is not one of Riser's messages alone", () => {
    expect(errorKeyOf("Something a library said")).toBeNull();
  });
});
