import "server-only";
import { dictionary } from "@zxcvbn-ts/language-common";

/**
 * Passwords per NIST SP 800-63B-4 §3.1.1.2 (memorized secrets): at least 15 characters when there is
 * no second factor, at most 128 here, any characters, no composition rules; and a check against a
 * blocklist of commonly used and breached passwords — the maintained common-password list of
 * @zxcvbn-ts/language-common (about 49,000 entries) — plus repetitive input and the account's own
 * address. The length rule lives in lib/auth/schemas.ts and better-auth's minPasswordLength.
 */
export const MIN_PASSWORD_LENGTH = 15;

const common = new Set((dictionary["passwords-common"] as string[]).map((p) => p.toLowerCase()));

export function passwordProblem(password: string, context: { email?: string | null } = {}): string | null {
  const lower = password.toLowerCase();
  if (common.has(lower)) return "This password is on a list of common or breached passwords. Choose another one.";
  if (/^(.)\1+$/su.test(password) || /^(.{1,3})\1+$/su.test(password)) return "This password only repeats a few characters. Choose another one.";
  const email = context.email?.trim().toLowerCase();
  if (email && (lower === email || lower === email.split("@")[0])) return "Do not use your e-mail address as the password. Choose another one.";
  return null;
}
