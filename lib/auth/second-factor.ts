import "server-only";
import { APIError } from "better-auth/api";
import { CLIENT_IP_HEADER } from "@/lib/client-ip";
import { lockedMessage, recordFailedSignIn, signInLock } from "./throttle";

/**
 * Two-step sign-in (better-auth's twoFactor plugin, TOTP + backup codes) with Riser's own rules,
 * run from the hooks in lib/auth/index.ts:
 *  - the second step of a sign-in shares the per-account throttle of passwords (lib/auth/throttle.ts):
 *    a paused account is refused before the code is checked, and every wrong code counts as a failed
 *    sign-in of that account, from whatever address it comes (NIST SP 800-63B-4 §3.2.2);
 *  - Riser asks for the code at every sign-in: "trust this device" is refused.
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
async function pendingAccountEmail(ctx: HookCtx): Promise<string | null> {
  const cookie = ctx.context.createAuthCookie("two_factor");
  const identifier = await ctx.getSignedCookie(cookie.name, ctx.context.secret);
  if (!identifier) return null;
  const pending = await ctx.context.internalAdapter.findVerificationValue(identifier);
  if (!pending) return null;
  const person = await ctx.context.internalAdapter.findUserById(pending.value);
  return person?.email.toLowerCase() ?? null;
}

/** Before a code is checked: no "trust this device", and a paused account is refused (429). */
export async function beforeSecondStep(ctx: HookCtx): Promise<void> {
  if ((ctx.body as { trustDevice?: unknown } | undefined)?.trustDevice) {
    throw new APIError("BAD_REQUEST", { message: "Riser asks for a code at every sign-in; devices are not remembered.", code: "TRUST_DEVICE_NOT_OFFERED" });
  }
  const email = await pendingAccountEmail(ctx);
  if (!email) return; // enrolment (signed in) or no pending sign-in: better-auth answers itself
  const lock = await signInLock(email);
  if (lock.locked) throw new APIError("TOO_MANY_REQUESTS", { message: lockedMessage(lock.retryAfterSeconds), code: "ACCOUNT_SIGN_IN_PAUSED" });
}

/** After a wrong code in a sign-in's second step: counted against the account like a wrong password. */
export async function afterSecondStep(ctx: HookCtx): Promise<void> {
  const returned = ctx.context.returned as { statusCode?: number } | undefined;
  if (!(returned instanceof APIError) || returned.statusCode !== 401) return;
  const email = await pendingAccountEmail(ctx);
  if (email) await recordFailedSignIn(email, ctx.headers?.get(CLIENT_IP_HEADER) ?? "unknown");
}
