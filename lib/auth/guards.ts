import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { APIError, getSessionFromCtx } from "better-auth/api";
import { db } from "@/db/client";
import { session, user, verification } from "@/db/schema";
import { MIN_PASSWORD_LENGTH, minPasswordLength, passwordProblem } from "./password-policy";
import { forgetCachedSessions } from "./session-cache";

/**
 * Checks better-auth's own endpoints do not make (run from the before hook in lib/auth/index.ts):
 * over-long names and addresses get a 400 with a message instead of reaching the database, and an
 * e-mail change needs the current password and ends the account's other sessions.
 */
const LIMITS: Record<string, { max: number; label: string }> = {
  name: { max: 200, label: "The name" },
  email: { max: 255, label: "The e-mail address" },
  newEmail: { max: 255, label: "The new e-mail address" },
  password: { max: 128, label: "The password" },
  currentPassword: { max: 128, label: "The current password" },
  newPassword: { max: 128, label: "The new password" },
};

export function assertFieldLengths(body: unknown): void {
  if (!body || typeof body !== "object") return;
  for (const [field, { max, label }] of Object.entries(LIMITS)) {
    const v = (body as Record<string, unknown>)[field];
    if (typeof v === "string" && v.length > max) {
      throw new APIError("BAD_REQUEST", { message: `${label} is too long: at most ${max} characters.`, code: "FIELD_TOO_LONG" });
    }
  }
}

type HookCtx = Parameters<typeof getSessionFromCtx>[0] & {
  body?: unknown;
  context: { password: { verify: (d: { hash: string; password: string }) => Promise<boolean> }; internalAdapter: { findAccounts: (userId: string) => Promise<{ providerId: string; password?: string | null }[]> } };
};

/** /change-email: the current password must come with the request; other sessions end once it is proven. */
export async function assertEmailChangeAllowed(ctx: HookCtx): Promise<void> {
  const current = await getSessionFromCtx(ctx);
  if (!current) return; // better-auth answers 401 itself
  const password = (ctx.body as { password?: unknown } | undefined)?.password;
  if (typeof password !== "string" || !password) {
    throw new APIError("BAD_REQUEST", { message: "Enter your current password to change your e-mail address.", code: "CURRENT_PASSWORD_REQUIRED" });
  }
  const credential = (await ctx.context.internalAdapter.findAccounts(current.user.id)).find((a) => a.providerId === "credential");
  const ok = credential?.password ? await ctx.context.password.verify({ hash: credential.password, password }) : false;
  if (!ok) throw new APIError("BAD_REQUEST", { message: "The current password is not right.", code: "INVALID_PASSWORD" });
  // whoever else holds a session for this account is signed out before the address can move
  await db.delete(session).where(and(eq(session.userId, current.user.id), ne(session.token, current.session.token)));
  forgetCachedSessions(current.user.id);
}

/** New passwords (sign-up, reset, change) are checked against the blocklist (lib/auth/password-policy.ts). */
export function assertPasswordAllowed(path: string, body: unknown): void {
  const b = (body ?? {}) as { password?: unknown; newPassword?: unknown; email?: unknown };
  const candidate = path === "/sign-up/email" ? b.password : path === "/reset-password" || path === "/change-password" ? b.newPassword : undefined;
  if (typeof candidate !== "string") return;
  const problem = passwordProblem(candidate, { email: typeof b.email === "string" ? b.email : null });
  if (problem) throw new APIError("BAD_REQUEST", { message: problem, code: "PASSWORD_NOT_ALLOWED" });
}

type LengthCtx = HookCtx & { path: string; query?: Record<string, unknown> };

async function hasSecondFactor(userId: string | null | undefined): Promise<boolean> {
  if (!userId) return false;
  const [row] = await db.select({ on: user.twoFactorEnabled }).from(user).where(eq(user.id, userId)).limit(1);
  return row?.on === true;
}

/** Whether the account a password-reset token belongs to uses two-step sign-in (false for an unknown or expired token). */
export async function resetTokenHasSecondFactor(token: string | null | undefined): Promise<boolean> {
  if (!token || token.length > 255) return false;
  const [row] = await db.select({ userId: verification.value, expiresAt: verification.expiresAt }).from(verification).where(eq(verification.identifier, `reset-password:${token}`)).limit(1);
  return row !== undefined && row.expiresAt > new Date() && (await hasSecondFactor(row.userId));
}

const tooShort = (min: number) =>
  new APIError("BAD_REQUEST", {
    message: min === MIN_PASSWORD_LENGTH ? "Use at least 15 characters (a few words make a good one)" : "Use at least 8 characters",
    code: "PASSWORD_TOO_SHORT",
  });

/**
 * Password length per NIST SP 800-63B-4 §3.1.1.2: 15 characters when the password is the account's
 * only factor, 8 when it also has two-step sign-in (better-auth's own floor is the 8). Sign-up has no
 * second factor yet; a change or reset looks at the account; and two-step sign-in cannot be turned
 * off while the password is shorter than the single-factor minimum (the request carries it).
 */
export async function assertPasswordLength(ctx: LengthCtx): Promise<void> {
  const b = (ctx.body ?? {}) as { password?: unknown; newPassword?: unknown; token?: unknown };
  if (ctx.path === "/sign-up/email") {
    if (typeof b.password === "string" && b.password.length < MIN_PASSWORD_LENGTH) throw tooShort(MIN_PASSWORD_LENGTH);
    return;
  }
  if (ctx.path === "/change-password" && typeof b.newPassword === "string") {
    const current = await getSessionFromCtx(ctx);
    if (!current) return; // better-auth answers 401 itself
    const min = minPasswordLength(await hasSecondFactor(current.user.id));
    if (b.newPassword.length < min) throw tooShort(min);
    return;
  }
  if (ctx.path === "/reset-password" && typeof b.newPassword === "string") {
    const token = typeof b.token === "string" ? b.token : typeof ctx.query?.token === "string" ? ctx.query.token : null;
    // an unknown token: the single-factor rule (better-auth then refuses the token itself)
    const min = minPasswordLength(await resetTokenHasSecondFactor(token));
    if (b.newPassword.length < min) throw tooShort(min);
    return;
  }
  if (ctx.path === "/two-factor/disable" && typeof b.password === "string" && b.password.length > 0 && b.password.length < MIN_PASSWORD_LENGTH) {
    const current = await getSessionFromCtx(ctx);
    if (!current) return;
    // only the right password is answered this way; a wrong one gets better-auth's INVALID_PASSWORD
    const credential = (await ctx.context.internalAdapter.findAccounts(current.user.id)).find((a) => a.providerId === "credential");
    const ok = credential?.password ? await ctx.context.password.verify({ hash: credential.password, password: b.password }) : false;
    if (!ok) return;
    throw new APIError("BAD_REQUEST", {
      message: "Your password has fewer than 15 characters, the minimum without two-step sign-in. Choose a longer password first, then turn two-step sign-in off.",
      code: "PASSWORD_TOO_SHORT_FOR_ONE_FACTOR",
    });
  }
}
