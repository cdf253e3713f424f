import "server-only";
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { rateLimitBucket, user } from "@/db/schema";
import { hitRateLimit } from "@/lib/rate-limit";
import { env } from "@/lib/env";
import { mailTranslator, sendMail } from "@/lib/mail";

/**
 * Failed sign-ins counted per account, whatever address they come from (NIST SP 800-63B §5.2.2:
 * limit consecutive failed attempts on a single account). Counts live in rate_limit_bucket
 * (one atomic INSERT … ON DUPLICATE KEY UPDATE per failure; the rate-limit-prune job removes old
 * windows). The key is a hash of the lower-cased address, so unknown addresses are counted the same
 * way as real ones and the answer tells nobody whether an account exists.
 */
const keyFor = (email: string) => `signin-fail:${createHash("sha256").update(email.trim().toLowerCase()).digest("hex")}`;

function windowOf(now: Date) {
  const nowS = Math.floor(now.getTime() / 1000);
  const size = env.SIGN_IN_LOCK_WINDOW_S;
  const start = nowS - (nowS % size);
  return { start, retryAfter: start + size - nowS };
}

export const lockedMessage = (retryAfterSeconds: number) => {
  const minutes = Math.max(1, Math.ceil(retryAfterSeconds / 60));
  return `Too many wrong passwords or codes for this account. Sign-in is paused for ${minutes} minute${minutes === 1 ? "" : "s"}; we sent an e-mail to the account's address. If you forgot the password, reset it.`;
};

/** Is this account paused now? (read only; called before the password is checked) */
export async function signInLock(email: string, now = new Date()): Promise<{ locked: boolean; retryAfterSeconds: number }> {
  const w = windowOf(now);
  const [row] = await db
    .select({ hits: rateLimitBucket.hits })
    .from(rateLimitBucket)
    .where(and(eq(rateLimitBucket.bucketKey, keyFor(email)), eq(rateLimitBucket.windowStart, w.start)));
  return { locked: (row?.hits ?? 0) >= env.SIGN_IN_LOCK_FAILURES, retryAfterSeconds: w.retryAfter };
}

/** Counts one failed sign-in; the failure that reaches the limit mails the account's owner (once per window). */
export async function recordFailedSignIn(email: string, ip: string, now = new Date()): Promise<void> {
  const r = await hitRateLimit(keyFor(email), env.SIGN_IN_LOCK_FAILURES, env.SIGN_IN_LOCK_WINDOW_S, now);
  if (r.hits !== env.SIGN_IN_LOCK_FAILURES) return;
  const [owner] = await db.select({ name: user.name, email: user.email, language: user.language }).from(user).where(eq(user.email, email.trim().toLowerCase()));
  if (!owner) return;
  const minutes = Math.ceil(env.SIGN_IN_LOCK_WINDOW_S / 60);
  const t = mailTranslator(owner.language);
  await sendMail({
    to: owner.email,
    kind: "sign-in-paused",
    subject: t("auth.paused.subject"),
    text: `${t("helloName", { name: owner.name })}\n\n${t("auth.paused.body", { hits: r.hits, ip, minutes, url: `${env.APP_URL}/forgot-password` })}`,
  });
}

/**
 * Sign-in attempts per client address, in fixed windows shared by every app server (rate_limit_bucket):
 * AUTH_RATE_LIMIT_MAX per AUTH_RATE_LIMIT_WINDOW_S. It slows one address trying many accounts; the
 * per-account pause above stops guessing at one account from many addresses.
 */
export async function hitSignInFromClient(ip: string, now = new Date()) {
  return hitRateLimit(`signin-ip:${ip}`, env.AUTH_RATE_LIMIT_MAX, env.AUTH_RATE_LIMIT_WINDOW_S, now);
}
