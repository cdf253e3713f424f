// Password rules per NIST SP 800-63B-4 §3.1.1.2: 15+ characters without a second factor (8+ with one), no
// composition rules, and a blocklist of common and breached passwords (the common-password list of
// @zxcvbn-ts/language-common, a maintained package).
import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "@/db/demo";
import { password, passwordWithSecondFactor } from "@/lib/auth/schemas";
import { passwordChangeSchemaFor } from "@/lib/account/schemas";
import { MIN_PASSWORD_LENGTH, minPasswordLength, passwordProblem } from "@/lib/auth/password-policy";

describe("password policy", () => {
  it("needs 15 characters and accepts any characters without composition rules", () => {
    expect(MIN_PASSWORD_LENGTH).toBe(15);
    expect(password.safeParse("fourteen-chars").success).toBe(false); // 14
    expect(password.safeParse("fifteen-chars-x").success).toBe(true); // 15, no digit or capital required
    expect(password.safeParse("alllowercaseletters").success).toBe(true);
    expect(password.safeParse("Ünïcödé wörds ok 🔥").success).toBe(true);
  });

  it("needs only 8 characters of an account with a second factor (§3.1.1.2), still with no composition rules", () => {
    expect(minPasswordLength(true)).toBe(8);
    expect(minPasswordLength(false)).toBe(15);
    expect(passwordWithSecondFactor.safeParse("tq7-mar").success).toBe(false); // 7
    expect(passwordWithSecondFactor.safeParse("tq7-marl").success).toBe(true); // 8
    const change = (hasSecondFactor: boolean, newPassword: string) => passwordChangeSchemaFor(hasSecondFactor).safeParse({ currentPassword: "x", newPassword, confirm: newPassword, signOutOthers: true }).success;
    expect(change(true, "tq7-marl")).toBe(true);
    expect(change(false, "tq7-marl")).toBe(false);
    expect(change(false, "fifteen-chars-x")).toBe(true);
  });

  it("refuses passwords on the common and breached list, whatever their case", () => {
    for (const p of ["qwerty123456789", "1qaz2wsx3edc4rfv", "123456789987654321", "QWERTY123456789"]) expect(passwordProblem(p), p).toMatch(/common or breached/);
  });

  it("refuses repetitive input and the account's own address", () => {
    expect(passwordProblem("aaaaaaaaaaaaaaaa")).toMatch(/repeats/);
    expect(passwordProblem("abcabcabcabcabcabc")).toMatch(/repeats/);
    expect(passwordProblem("someone.long@example.com", { email: "Someone.Long@example.com" })).toMatch(/e-mail/);
  });

  it("accepts the demo password and the test helpers' passwords", () => {
    for (const p of [DEMO_PASSWORD, "test-people-pass-2026", "correct-horse-42", "e2e-person-pass-2026"]) {
      expect(password.safeParse(p).success, p).toBe(true);
      expect(passwordProblem(p), p).toBeNull();
    }
  });
});
