import "server-only";
import { APIError } from "better-auth/api";
import { CLIENT_IP_HEADER } from "@/lib/client-ip";
import { lockedMessage, recordFailedSignIn, signInLock } from "./throttle";
import { claimTotpCode, releaseTotpCode, totpCodeHash } from "./totp-replay";

/**
 * Two-step sign-in (better-auth's twoFactor plugin, TOTP + backup codes) with Riser's own rules,
 * run from the hooks in lib/auth/index.ts:
 *  - the second step of a sign-in shares the per-account throttle of passwords (lib/auth/throttle.ts):
 *    a paused account is refused before the code is checked, and every wrong code counts as a failed
 *    sign-in of that account, from whatever address it comes (NIST SP 800-63B-4 §3.2.2);
 *  - Riser asks for the code at every sign-in: "trust this device" is refused;
 *  - a TOTP code signs in once (RFC 6238 §5.2, lib/auth/totp-replay.ts): a code already accepted is
 *    refused with 409 `TOTP_CODE_ALREADY_USED`. A replay is not counted against the per-account
 *    throttle: that budget limits guessing (a replayed code is no guess and is refused anyway), and a
 *    double submit or a second tab must not eat the owner's budget.
 */
export const SECOND_STEP_PATHS = new Set(["/two-factor/verify-totp", "/two-factor/verify-backup-code"]);

type HookCtx = {
  path: string;
  body?: unknown;
  headers?: Headers | null;
  getSignedCookie: (name: string, secret: string) => Promise<string | null | false | undefined>;
  context: {
    secret: string;
    createAuthCookie: (name: string) => { name: string };
    internalAdapter: {
      findVerificationValue: (identifier: string) => Promise<{ value: string } | null | undefined>;
      findUserById: (id: string) => Promise<{ email: string } | null | undefined>;
    };
    returned?: unknown;
  };
};

/** The account a pending sign-in (password accepted, code still due) belongs to, from its signed cookie. */
async function pendingAccount(ctx: HookCtx): Promise<{ userId: string; email: string } | null> {
  const cookie = ctx.context.createAuthCookie("two_factor");
  const identifier = await ctx.getSignedCookie(cookie.name, ctx.context.secret);
  if (!identifier) return null;
  const pending = await ctx.context.internalAdapter.findVerificationValue(identifier);
  if (!pending) return null;
  const person = await ctx.context.internalAdapter.findUserById(pending.value);
  return person ? { userId: pending.value, email: person.email.toLowerCase() } : null;
}

/**
 * TOTP claims made by a request's before-hook, keyed by that request's body object (the after-hook of
 * the same request sees the same object): only the request that claimed a code may release it.
 */
const claims = new WeakMap<object, { userId: string; codeHash: string }>();

/** Before a code is checked: no "trust this device", and a paused account is refused (429). */
export async function beforeSecondStep(ctx: HookCtx): Promise<void> {
  if ((ctx.body as { trustDevice?: unknown } | undefined)?.trustDevice) {
    throw new APIError("BAD_REQUEST", { message: "Riser asks for a code at every sign-in; devices are not remembered.", code: "TRUST_DEVICE_NOT_OFFERED" });
  }
  const account = await pendingAccount(ctx);
  if (!account) return; // enrolment (signed in) or no pending sign-in: better-auth answers itself
  const lock = await signInLock(account.email);
  if (lock.locked) throw new APIError("TOO_MANY_REQUESTS", { message: lockedMessage(lock.retryAfterSeconds), code: "ACCOUNT_SIGN_IN_PAUSED" });
  const body = ctx.body as { code?: unknown } | undefined;
  if (ctx.path !== "/two-factor/verify-totp" || !body || typeof body.code !== "string") return; // backup codes: single-use in the plugin
  const codeHash = totpCodeHash(ctx.context.secret, account.userId, body.code);
  if (!(await claimTotpCode(codeHash, account.userId))) {
    throw new APIError("CONFLICT", {
      message: "That code was already used to sign in. Wait for your authenticator app to show the next code (at most 30 seconds) and enter that one.",
      code: "TOTP_CODE_ALREADY_USED",
    });
  }
  claims.set(body, { userId: account.userId, codeHash });
}

/**
 * After the plugin answered a sign-in's second step: a code it refused is released (it was not used),
 * and a wrong code is counted against the account like a wrong password.
 */
export async function afterSecondStep(ctx: HookCtx): Promise<void> {
  const returned = ctx.context.returned as { statusCode?: number } | undefined;
  if (!(returned instanceof APIError)) return;
  const claim = ctx.body && typeof ctx.body === "object" ? claims.get(ctx.body) : undefined;
  if (claim) await releaseTotpCode(claim.codeHash, claim.userId);
  if (returned.statusCode !== 401) return;
  const account = await pendingAccount(ctx);
  if (account) await recordFailedSignIn(account.email, ctx.headers?.get(CLIENT_IP_HEADER) ?? "unknown");
}
