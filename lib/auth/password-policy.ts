import "server-only";
import { dictionary } from "@zxcvbn-ts/language-common";
import { MIN_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR } from "./schemas";

/**
 * Passwords per NIST SP 800-63B-4 §3.1.1.2 (memorized secrets): at least 15 characters when there is
 * no second factor (8 with one), at most 128 here, any characters, no composition rules; and a check against a
 * blocklist of commonly used and breached passwords — the maintained common-password list of
 * @zxcvbn-ts/language-common (about 49,000 entries) — plus repetitive input and the account's own
 * address. The lengths live in lib/auth/schemas.ts; better-auth's minPasswordLength is the floor (8)
 * and lib/auth/guards.ts asks for 15 of every account without a second factor.
 */
export { MIN_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR };

/** The shortest password an account may choose: 8 with a second factor, 15 without (SP 800-63B-4 §3.1.1.2). */
export function minPasswordLength(hasSecondFactor: boolean): number {
  return hasSecondFactor ? MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR : MIN_PASSWORD_LENGTH;
}

const common = new Set((dictionary["passwords-common"] as string[]).map((p) => p.toLowerCase()));

export function passwordProblem(password: string, context: { email?: string | null } = {}): string | null {
  const lower = password.toLowerCase();
  if (common.has(lower)) return "This password is on a list of common or breached passwords. Choose another one.";
  if (/^(.)\1+$/su.test(password) || /^(.{1,3})\1+$/su.test(password)) return "This password only repeats a few characters. Choose another one.";
  const email = context.email?.trim().toLowerCase();
  if (email && (lower === email || lower === email.split("@")[0])) return "Do not use your e-mail address as the password. Choose another one.";
  return null;
}
