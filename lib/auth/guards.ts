import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { APIError, getSessionFromCtx } from "better-auth/api";
import { db } from "@/db/client";
import { session } from "@/db/schema";
import { passwordProblem } from "./password-policy";
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
