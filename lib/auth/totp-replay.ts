import "server-only";
import { createHmac } from "node:crypto";
import { and, eq, lte } from "drizzle-orm";
import { db } from "@/db/client";
import { totpCodeUse } from "@/db/schema";

/**
 * One use per TOTP code (RFC 6238 §5.2: "the verifier MUST NOT accept the second attempt of the same
 * OTP after the successful validation has been issued for the first OTP").
 *
 * The plugin accepts a code from one 30-second step before to one after the current step, so a code
 * can be valid for up to 90 seconds. Before the plugin checks a code in a sign-in's second step, the
 * code is claimed for that person: one INSERT into totp_code_use, whose primary key (person, hash)
 * lets exactly one of two simultaneous requests win; the loser is refused without the code being
 * checked. If the plugin then refuses the code (wrong, expired challenge…), the claim is released, so
 * only accepted codes stay claimed. Claims are kept for 120 s (90 s window + margin for clock drift
 * between app instances) and a person's expired claims are removed at their next claim.
 *
 * Only an HMAC-SHA256 of person and code, keyed with BETTER_AUTH_SECRET, is stored: a plain hash of a
 * 6-digit code could be reversed by trying all million codes.
 */
export const TOTP_CLAIM_SECONDS = 120;

export const totpCodeHash = (secret: string, userId: string, code: string) =>
  createHmac("sha256", secret).update(`totp-used:${userId}:${code}`).digest("hex");

function isDuplicateKey(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 6; depth++) {
    if ((e as { code?: unknown }).code === "ER_DUP_ENTRY" || (e as { errno?: unknown }).errno === 1062) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

/** Claims a code for a person; false when the same code was already claimed and has not expired. */
export async function claimTotpCode(codeHash: string, userId: string, now = new Date()): Promise<boolean> {
  await db.delete(totpCodeUse).where(and(eq(totpCodeUse.userId, userId), lte(totpCodeUse.expiresAt, now)));
  try {
    await db.insert(totpCodeUse).values({ userId, codeHash, expiresAt: new Date(now.getTime() + TOTP_CLAIM_SECONDS * 1000) });
    return true;
  } catch (e) {
    if (isDuplicateKey(e)) return false;
    throw e;
  }
}

/** Gives a claim back (the plugin refused the code, so it was not used). */
export async function releaseTotpCode(codeHash: string, userId: string): Promise<void> {
  await db.delete(totpCodeUse).where(and(eq(totpCodeUse.userId, userId), eq(totpCodeUse.codeHash, codeHash)));
}
