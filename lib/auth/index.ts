import "server-only";
import { eq } from "drizzle-orm";
import { betterAuth } from "better-auth";
import { APIError, createAuthMiddleware } from "better-auth/api";
import { drizzleAdapter } from "@better-auth/drizzle-adapter";
import { admin, twoFactor } from "better-auth/plugins";
import { nextCookies } from "better-auth/next-js";
import { db } from "@/db/client";
import * as schema from "@/db/schema";
import { env } from "@/lib/env";
import { mailTranslator, sendMail } from "@/lib/mail";
import { nameProblem, normalizeName } from "@/lib/names";
import { CLIENT_IP_HEADER } from "@/lib/client-ip";
import { isDatabaseDown } from "@/lib/db-errors";
import { log } from "@/lib/log";
import { noteOutage } from "@/lib/outage.mjs";
import { signupContext } from "./signup-context";
import { assertEmailChangeAllowed, assertFieldLengths, assertPasswordAllowed, assertPasswordLength } from "./guards";
import { MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR } from "./password-policy";
import { afterEmailVerified, takeChoosePasswordUrl } from "./signup";
import { hitSignInFromClient, lockedMessage, recordFailedSignIn, signInLock } from "./throttle";
import { SESSION_CACHE_SECONDS, cachedSessionVersion, forgetCachedSessions } from "./session-cache";
import { readSessionWith } from "./session-read";
import { afterSecondStep, beforeSecondStep, SECOND_STEP_PATHS } from "./second-factor";

/** the language a person chose (stored on their account), for mail written to them */
async function storedLanguageOf(userId: string): Promise<string | null> {
  const [row] = await db.select({ language: schema.user.language }).from(schema.user).where(eq(schema.user.id, userId));
  return row?.language ?? null;
}

const signInEmailOf = (body: unknown) => {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === "string" && email.length <= 255 ? email.trim().toLowerCase() : null;
};

export const auth = betterAuth({
  appName: "Riser",
  baseURL: env.APP_URL,
  secret: env.BETTER_AUTH_SECRET,
  trustedOrigins: [env.APP_URL],
  database: drizzleAdapter(db, {
    provider: "mysql",
    schema: {
      user: schema.user,
      session: schema.session,
      account: schema.account,
      verification: schema.verification,
      rateLimit: schema.rateLimit,
      twoFactor: schema.twoFactor,
    },
  }),
  emailAndPassword: {
    enabled: true,
    requireEmailVerification: true,
    // the floor for accounts with a second factor; the hook below asks 15 of every other (guards.ts)
    minPasswordLength: MIN_PASSWORD_LENGTH_WITH_SECOND_FACTOR,
    maxPasswordLength: 128,
    revokeSessionsOnPasswordReset: true,
    resetPasswordTokenExpiresIn: 60 * 60,
    sendResetPassword: async ({ user, url }) => {
      // written in the recipient's stored language (English when none)
      const t = mailTranslator(await storedLanguageOf(user.id));
      await sendMail({
        to: user.email,
        kind: "password-reset",
        subject: t("auth.reset.subject"),
        text: `${t("helloName", { name: user.name })}\n\n${t("auth.reset.body", { url })}`,
      });
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    autoSignInAfterVerification: false,
    // a confirmation from another browser than the one that signed up clears the password (lib/auth/signup.ts)
    afterEmailVerification: async (verified, request) => afterEmailVerified(verified, request),
    expiresIn: 60 * 60 * 24,
    sendVerificationEmail: async ({ user, url }) => {
      // An e-mail change (account settings) sends this to the new address while the stored one is still the old.
      const [stored] = await db.select({ email: schema.user.email, language: schema.user.language }).from(schema.user).where(eq(schema.user.id, user.id));
      if (stored && stored.email.toLowerCase() !== user.email.toLowerCase()) {
        const t = mailTranslator(stored.language);
        await sendMail({
          to: user.email,
          kind: "change-email",
          subject: t("auth.changeEmail.subject"),
          text: `${t("helloName", { name: user.name })}\n\n${t("auth.changeEmail.body", { oldEmail: stored.email, url })}`,
        });
        await sendMail({
          to: stored.email,
          kind: "change-email-notice",
          subject: t("auth.changeNotice.subject"),
          text: `${t("helloName", { name: user.name })}\n\n${t("auth.changeNotice.body", { newEmail: user.email })}`,
        });
        return;
      }
      // Accounts created from an invitation are verified at creation (the link proved the address).
      if (user.emailVerified) return;
      const t = mailTranslator(stored?.language);
      await sendMail({
        to: user.email,
        kind: "verify-email",
        subject: t("auth.verify.subject"),
        text: `${t("helloName", { name: user.name })}\n\n${t("auth.verify.body", { url })}`,
      });
    },
  },
  user: {
    // Account settings: the new address gets a verification link; the change happens when it is opened.
    changeEmail: { enabled: true },
    additionalFields: {
      organizationId: { type: "string", required: false, input: false },
      teamId: { type: "string", required: false, input: false },
      // set through /api/account/language (validated there), never from a sign-up body
      language: { type: "string", required: false, input: false, defaultValue: "en" },
    },
  },
  session: {
    expiresIn: 60 * 60 * 24 * 7,
    updateAge: 60 * 60 * 24,
    // a signed copy of the session in a cookie, trusted for at most 60 s (lib/auth/session-cache.ts)
    cookieCache: { enabled: true, strategy: "compact", maxAge: SESSION_CACHE_SECONDS, version: (_session, u) => cachedSessionVersion(u?.id) },
  },
  rateLimit: {
    enabled: true,
    storage: "database",
    window: 60,
    max: 200,
    // better-auth's counter keeps a window open while requests keep coming (each allowed request moves
    // its start), so a busy shared address — an office or a job-site trailer behind one router — would
    // never get out of it. Sign-in per client is counted in fixed windows instead (lib/auth/throttle.ts,
    // in the hook below), and reading one's own session is never limited: every page asks for it.
    customRules: {
      "/sign-in/email": false,
      "/get-session": false,
      "/sign-up/email": { window: 60, max: 10 },
      "/request-password-reset": { window: 60, max: 5 },
      // account settings: guessing the current password or flooding someone's inbox
      "/change-password": { window: 60, max: 10 },
      "/change-email": { window: 60, max: 5 },
    },
  },
  // better-auth answers its own failures with a 500: one caused by a database outage is noted on the
  // request so that scripts/serve.mjs answers 503 instead (lib/outage.mjs); other failures are logged.
  onAPIError: {
    onError(e) {
      if (isDatabaseDown(e)) return noteOutage("database");
      const status = (e as { statusCode?: unknown } | null)?.statusCode;
      if (typeof status !== "number" || status >= 500) log().error({ err: e }, "better-auth failed");
    },
  },
  advanced: {
    useSecureCookies: env.INSECURE_COOKIES !== "1",
    defaultCookieAttributes: { httpOnly: true, sameSite: "lax" },
    // proxy.ts sets this header from the real peer and TRUSTED_PROXY_HOPS (lib/client-ip),
    // replacing any client value: a forged X-Forwarded-For never reaches the rate limit or sessions.
    ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
    database: { generateId: () => crypto.randomUUID() },
  },
  hooks: {
    // Per-account throttle (lib/auth/throttle.ts): a paused account is refused before its password
    // is checked, whatever address the attempt comes from; every wrong password is counted.
    before: createAuthMiddleware(async (ctx) => {
      assertFieldLengths(ctx.body);
      assertPasswordAllowed(ctx.path, ctx.body);
      await assertPasswordLength(ctx as unknown as Parameters<typeof assertPasswordLength>[0]);
      if (ctx.path === "/change-email") return assertEmailChangeAllowed(ctx as unknown as Parameters<typeof assertEmailChangeAllowed>[0]);
      if (SECOND_STEP_PATHS.has(ctx.path)) return beforeSecondStep(ctx as unknown as Parameters<typeof beforeSecondStep>[0]);
      if (ctx.path !== "/sign-in/email") return;
      const perClient = await hitSignInFromClient(ctx.headers?.get(CLIENT_IP_HEADER) ?? "unknown");
      if (!perClient.allowed) throw new APIError("TOO_MANY_REQUESTS", { message: "Too many sign-in attempts from this network. Wait a minute and try again.", code: "CLIENT_SIGN_IN_LIMIT" });
      const email = signInEmailOf(ctx.body);
      if (!email) return;
      const lock = await signInLock(email);
      if (lock.locked) throw new APIError("TOO_MANY_REQUESTS", { message: lockedMessage(lock.retryAfterSeconds), code: "ACCOUNT_SIGN_IN_PAUSED" });
    }),
    after: createAuthMiddleware(async (ctx) => {
      if (ctx.path === "/verify-email") {
        // the mailbox's owner confirmed someone else's sign-up: they choose the password now
        const url = takeChoosePasswordUrl(typeof ctx.query?.token === "string" ? ctx.query.token : undefined);
        if (url) throw ctx.redirect(url);
        return;
      }
      if (SECOND_STEP_PATHS.has(ctx.path)) return afterSecondStep(ctx as unknown as Parameters<typeof afterSecondStep>[0]);
      if (ctx.path !== "/sign-in/email") return;
      const returned = ctx.context.returned;
      if (!(returned instanceof APIError) || returned.statusCode !== 401) return;
      const email = signInEmailOf(ctx.body);
      if (email) await recordFailedSignIn(email, ctx.headers?.get(CLIENT_IP_HEADER) ?? "unknown");
    }),
  },
  databaseHooks: {
    user: {
      create: {
        before: async (user) => {
          const placement = signupContext.getStore();
          if (!placement) {
            throw new APIError("FORBIDDEN", { message: "Create an account from the sign-up page or an invitation." });
          }
          return { data: { ...user, ...placement, name: checkedName(user.name) } };
        },
      },
      // every name change (account settings, admin tools) passes the same rule as sign-up
      update: {
        before: async (data) => ("name" in data && data.name !== undefined ? { data: { ...data, name: checkedName(data.name) } } : { data }),
        after: async (u) => forgetCachedSessions(u.id),
      },
    },
    // sign-out, revoked sessions, password changes and resets: cached copies stop at once here
    session: { delete: { after: async (s) => forgetCachedSessions(s.userId) } },
  },
  plugins: [
    // TOTP (RFC 6238: 6 digits, 30 s) with ten single-use backup codes, both stored encrypted; switched on
    // only once a first code is verified. Wrong codes share the per-account throttle (second-factor.ts),
    // and the plugin's own lock (same figures) backs it up. Who must use it: lib/access (admins always;
    // managers where their organization asks).
    twoFactor({
      issuer: "Riser",
      backupCodeOptions: { amount: 10, length: 10 },
      accountLockout: { maxFailedAttempts: env.SIGN_IN_LOCK_FAILURES, durationSeconds: env.SIGN_IN_LOCK_WINDOW_S },
    }),
    admin({ defaultRole: "learner", adminRoles: ["admin"], bannedUserMessage: "This account is banned from Riser. If you think this is a mistake, ask your training manager." }),
    nextCookies(),
  ],
});

export type Auth = typeof auth;

/** The request's session for the proxy, pages and route handlers (an accepted copy is remembered: ./session-read.ts). */
export const readSession = (requestHeaders: Headers) => readSessionWith((o) => auth.api.getSession(o), requestHeaders);

/** The server's name rule (lib/names.ts): the stored form, or a 400 with the reason. */
function checkedName(name: unknown): string {
  const problem = nameProblem(name);
  if (problem) throw new APIError("BAD_REQUEST", { message: `Name: ${problem}` });
  return normalizeName(name as string);
}
export * from "./schemas";
export * from "./signup";
export * from "./signup-context";
export { forgetCachedSessions, SESSION_CACHE_SECONDS } from "./session-cache";
export { resetTokenHasSecondFactor } from "./guards";
