import "server-only";
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { and, count, eq, isNotNull, lt } from "drizzle-orm";
import { db } from "@/db/client";
import { account, organization, session, signupIntent, user, verification } from "@/db/schema";
import { hitRateLimit } from "@/lib/rate-limit";
import { env } from "@/lib/env";
import { forgetCachedSessions } from "./session-cache";

/**
 * Sign-up protection (lib/accounts.ts and app/api/account/sign-up use these):
 * - rate limits per client address and per e-mail address (each sign-up mails a stranger);
 * - a pending (unverified) account never squats an address: a new sign-up replaces it, and the
 *   `unverified-accounts-expire` job removes it with its empty trial organization after
 *   UNVERIFIED_ACCOUNT_TTL_H hours;
 * - confirming the e-mail never hands over a password someone else chose: only the browser that
 *   signed up (cookie below) keeps its password; a confirmation from anywhere else clears it and
 *   sends the mailbox's owner to choose one.
 */
export const SIGNUP_COOKIE = "riser_signup";
const PER_ADDRESS_PER_HOUR = 3;
const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");

export type SignupLimit = { allowed: true } | { allowed: false; retryAfterSeconds: number; message: string };

export async function hitSignupLimits(ip: string, email: string): Promise<SignupLimit> {
  const byClient = await hitRateLimit(`signup-ip:${ip}`, env.SIGN_UP_RATE_LIMIT_MAX, 3600);
  if (!byClient.allowed) {
    return { allowed: false, retryAfterSeconds: byClient.retryAfterSeconds, message: "Too many new accounts from your network in the last hour. Try again later." };
  }
  const byAddress = await hitRateLimit(`signup-mail:${sha256(email.toLowerCase())}`, PER_ADDRESS_PER_HOUR, 3600);
  if (!byAddress.allowed) {
    return { allowed: false, retryAfterSeconds: byAddress.retryAfterSeconds, message: "Too many sign-ups for this e-mail address in the last hour. Check that inbox for our message, or try again later." };
  }
  return { allowed: true };
}

/** Deletes one unverified account and its trial organization when nobody else is in it. */
async function removePendingAccount(userId: string, organizationId: string | null): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.delete(user).where(and(eq(user.id, userId), eq(user.emailVerified, false)));
    if (!organizationId) return;
    const [left] = await tx.select({ n: count() }).from(user).where(eq(user.organizationId, organizationId));
    if ((left?.n ?? 0) === 0) await tx.delete(organization).where(and(eq(organization.id, organizationId), isNotNull(organization.trialEndsAt)));
  });
}

/** An unverified account holding this address is replaced by the new sign-up (it proves nothing yet). */
export async function releasePendingAddress(email: string): Promise<void> {
  const [row] = await db
    .select({ id: user.id, verified: user.emailVerified, organizationId: user.organizationId })
    .from(user)
    .where(eq(user.email, email.toLowerCase()));
  if (row && !row.verified) await removePendingAccount(row.id, row.organizationId);
}

/** The job: unverified accounts older than the TTL go, with trial organizations left empty. */
export async function expireUnverifiedAccounts(now = new Date()): Promise<{ removed: number }> {
  const cutoff = new Date(now.getTime() - env.UNVERIFIED_ACCOUNT_TTL_H * 3_600_000);
  const stale = await db
    .select({ id: user.id, organizationId: user.organizationId })
    .from(user)
    .where(and(eq(user.emailVerified, false), lt(user.createdAt, cutoff)))
    .limit(500);
  for (const s of stale) await removePendingAccount(s.id, s.organizationId);
  return { removed: stale.length };
}

/** A new nonce for the browser that signs up; its hash is kept with the account. */
export async function rememberSignupBrowser(userId: string): Promise<string> {
  const nonce = randomBytes(24).toString("base64url");
  await db.insert(signupIntent).values({ userId, nonceHash: sha256(nonce), createdAt: new Date() });
  return nonce;
}

export function signupCookie(nonce: string): string {
  const secure = env.INSECURE_COOKIES === "1" ? "" : "; Secure";
  return `${SIGNUP_COOKIE}=${nonce}; Path=/api/auth/verify-email; Max-Age=${60 * 60 * 24}; HttpOnly; SameSite=Lax${secure}`;
}

function cookieValue(req: Request | undefined, name: string): string | null {
  for (const part of (req?.headers.get("cookie") ?? "").split(";")) {
    const [k, ...v] = part.trim().split("=");
    if (k === name) return v.join("=");
  }
  return null;
}

/** Reset tokens made for confirmations from another browser, by address, picked up by the redirect hook. */
const choosePassword = new Map<string, string>();

/**
 * better-auth's afterEmailVerification: the sign-up browser keeps its password; any other confirmation
 * clears the password (and sessions) in one transaction and prepares a one-hour "choose a password" token.
 */
export async function afterEmailVerified(verified: { id: string; email: string }, req?: Request): Promise<void> {
  const [intent] = await db.select({ nonceHash: signupIntent.nonceHash }).from(signupIntent).where(eq(signupIntent.userId, verified.id));
  if (!intent) return;
  const nonce = cookieValue(req, SIGNUP_COOKIE);
  if (nonce && sha256(nonce) === intent.nonceHash) {
    await db.delete(signupIntent).where(eq(signupIntent.userId, verified.id));
    return;
  }
  const token = randomBytes(24).toString("base64url");
  await db.transaction(async (tx) => {
    await tx.update(account).set({ password: null }).where(and(eq(account.userId, verified.id), eq(account.providerId, "credential")));
    await tx.delete(session).where(eq(session.userId, verified.id));
    await tx.delete(signupIntent).where(eq(signupIntent.userId, verified.id));
    await tx.insert(verification).values({ id: randomUUID(), identifier: `reset-password:${token}`, value: verified.id, expiresAt: new Date(Date.now() + 3_600_000) });
  });
  forgetCachedSessions(verified.id);
  choosePassword.set(verified.email.toLowerCase(), token);
}

/** Where a confirmation from another browser continues: the page that sets the first password. */
export function takeChoosePasswordUrl(verifyToken: string | undefined): string | null {
  let email: string | undefined;
  try {
    email = (JSON.parse(Buffer.from((verifyToken ?? "").split(".")[1] ?? "", "base64url").toString("utf8")) as { email?: string }).email;
  } catch {
    return null;
  }
  const key = email?.toLowerCase();
  const token = key ? choosePassword.get(key) : undefined;
  if (!key || !token) return null;
  choosePassword.delete(key);
  return `${env.APP_URL}/reset-password?token=${encodeURIComponent(token)}&confirmed=1`;
}
