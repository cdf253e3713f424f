/**
 * Which settings only a local instance may use (no side effects: lib/env.ts validates with these at
 * start, and unit tests call them directly). A local instance is RISER_LOCAL=1 on a loopback APP_URL;
 * the scripts in scripts/ set both. Mail catcher, /dev/mail, insecure cookies, the payment fake over
 * http and demo data exist only there.
 */
export const DEFAULT_APP_URL = "http://127.0.0.1:3000";

/** A loopback host: 127.0.0.0/8, ::1 or localhost. */
export function isLoopbackUrl(url: string): boolean {
  try {
    const host = new URL(url).hostname.replace(/^\[|\]$/g, "");
    return host === "localhost" || host === "::1" || /^127\.\d+\.\d+\.\d+$/.test(host);
  } catch {
    return false;
  }
}

type LocalView = {
  NODE_ENV: string;
  RISER_LOCAL: "0" | "1";
  APP_URL: string;
  MAIL_CATCHER_URL?: string;
  INSECURE_COOKIES: "0" | "1";
  STRIPE_API_HOST?: string;
  STRIPE_API_PORT?: number;
  STRIPE_API_PROTOCOL?: "http" | "https";
};

/** Settings that only a local instance may use, each with the reason it is refused elsewhere. */
export function localOnlyProblems(e: LocalView): { variable: string; message: string }[] {
  const out: { variable: string; message: string }[] = [];
  const loopback = isLoopbackUrl(e.APP_URL);
  if (e.RISER_LOCAL === "1" && !loopback) {
    out.push({ variable: "RISER_LOCAL", message: `is for local use on a loopback APP_URL only (APP_URL is ${e.APP_URL})` });
  }
  const local = e.RISER_LOCAL === "1" && loopback;
  if (local) return out;
  if (e.MAIL_CATCHER_URL) out.push({ variable: "MAIL_CATCHER_URL", message: "the local mail catcher (and /dev/mail) is for local use only: unset it and send through SMTP_URL" });
  if (e.INSECURE_COOKIES === "1") out.push({ variable: "INSECURE_COOKIES", message: "cookies without Secure are for local use only: serve over https and unset it" });
  if (e.STRIPE_API_PROTOCOL === "http") out.push({ variable: "STRIPE_API_PROTOCOL", message: "payment API calls over plain http are for the local fake only: unset STRIPE_API_HOST, STRIPE_API_PORT and STRIPE_API_PROTOCOL" });
  if (e.NODE_ENV === "production" && e.APP_URL === DEFAULT_APP_URL) out.push({ variable: "APP_URL", message: "must be set to the public https:// address of this instance" });
  if (e.NODE_ENV === "production" && !e.APP_URL.startsWith("https://")) out.push({ variable: "APP_URL", message: "must be an https:// address in production" });
  return out;
}

/** True on a developer's machine or a test run: RISER_LOCAL=1 and a loopback APP_URL. */
export const isLocalInstance = (e: { RISER_LOCAL: "0" | "1"; APP_URL: string }) => e.RISER_LOCAL === "1" && isLoopbackUrl(e.APP_URL);

/** The longest a signed session copy is trusted anywhere (lib/auth/session-cache.ts). */
export const SESSION_CACHE_MAX_SECONDS = 60;

/**
 * Seconds a signed session copy is trusted: 60, or a shorter SESSION_CACHE_MAX_AGE_S on a local
 * instance only (the bound test); anywhere else the variable is ignored.
 */
export function sessionCacheSeconds(e: { RISER_LOCAL: "0" | "1"; APP_URL: string; SESSION_CACHE_MAX_AGE_S?: number }): number {
  const asked = e.SESSION_CACHE_MAX_AGE_S;
  return asked !== undefined && isLocalInstance(e) ? Math.min(Math.max(1, asked), SESSION_CACHE_MAX_SECONDS) : SESSION_CACHE_MAX_SECONDS;
}

