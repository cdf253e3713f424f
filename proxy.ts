import { connect } from "node:net";
import { NextResponse, type NextRequest } from "next/server";
import { CLIENT_IP_HEADER, clientIpOf } from "@/lib/client-ip";
import { isLocale, LOCALE_HEADER } from "@/lib/i18n/browser";
import { isDatabaseDown } from "@/lib/db-errors";
import { OUTAGE_RETRY_AFTER_S, outageMessage, outagePage } from "@/lib/outage.mjs";
import { REQUEST_ID_HEADER, requestIdFor } from "@/lib/request-id";
import { applySecurityHeaders, contentSecurityPolicy, newNonce } from "@/lib/security-headers.mjs";

/**
 * Quick checks before a route runs: (1) if the database is unreachable, answer 503 at once with a
 * clear page or JSON (a TCP probe, remembered for one second; also when the session read below
 * fails because the database just dropped — lib/outage.mjs has the answer, and scripts/serve.mjs
 * turns the 5xx of a request already past this point into the same 503); (2) statically generated lesson
 * pages get their session checked here, since the page itself holds no per-person data; (3) the
 * client address is worked out once (lib/client-ip) and handed to better-auth; (4) every request gets
 * a request id (lib/request-id), on the request for the handlers' logs and on the response; (5) a
 * signed-in request's cached session copy is renewed when it has expired.
 * Every dynamic page, action and route handler checks access again where the data is (lib/access).
 */
let lastProbe = { at: 0, up: true };
const production = process.env.NODE_ENV === "production";

function probe(url: string): Promise<boolean> {
  const u = new URL(url);
  return new Promise((resolve) => {
    const socket = connect({ host: u.hostname, port: Number(u.port || 3306) });
    const done = (up: boolean) => {
      socket.destroy();
      resolve(up);
    };
    // Only a refused or failed connection means "down". A slow answer (a busy machine) lets the
    // request through: the route's own database call decides, and maps a real outage to 503.
    socket.setTimeout(1500, () => done(true));
    socket.once("connect", () => done(true));
    socket.once("error", () => done(false));
  });
}

let inFlight: Promise<boolean> | null = null;

async function databaseUp(): Promise<boolean> {
  const url = process.env.DATABASE_URL;
  if (!url) return true;
  if (Date.now() - lastProbe.at < 1000) return lastProbe.up;
  // One probe at a time, shared by the requests that arrive meanwhile.
  inFlight ??= probe(url).then((up) => {
    lastProbe = { at: Date.now(), up };
    inFlight = null;
    return up;
  });
  return inFlight;
}

/** Health, readiness and metrics answer for themselves, database or not (app/api/health, app/api/metrics). */
const SELF_REPORTING = /^\/api\/(health(\/(live|ready))?|metrics)$/;

/**
 * Passes the request on with its Content-Security-Policy: a fresh nonce per request, set on the request
 * (Next reads the nonce from it while rendering and stamps its scripts) and on the response.
 * Pages render per request for this (app/layout.tsx); see lib/security-headers.mjs for the policy.
 * The request id goes on the response too.
 */
function nextWithCsp(req: NextRequest, requestHeaders: Headers): NextResponse {
  // JSON and files run no script: only pages get a nonce
  const csp = contentSecurityPolicy(production, req.nextUrl.pathname.startsWith("/api/") ? undefined : newNonce());
  requestHeaders.set("content-security-policy", csp);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set("content-security-policy", csp);
  const requestId = requestHeaders.get(REQUEST_ID_HEADER);
  if (requestId) res.headers.set(REQUEST_ID_HEADER, requestId);
  return res;
}

export async function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;
  const requestId = requestIdFor(req.headers);
  // handlers read the id from the request: always this one, never what the client sent
  const headers = new Headers(req.headers);
  headers.set(REQUEST_ID_HEADER, requestId);
  // the signed-in person's language travels on this header (lib/i18n/locale.ts): only the proxy sets it
  headers.delete(LOCALE_HEADER);
  if (SELF_REPORTING.test(pathname)) return nextWithCsp(req, headers);
  if (!(await databaseUp())) return outageAnswer(pathname, requestId);
  // A signed-in request: the session is checked from its signed cookie copy (lib/auth/session-cache.ts,
  // no database round trip); an expired copy is read again from the database and renewed here, for
  // the route below (request cookie) and for the browser (Set-Cookie).
  const signedIn = !pathname.startsWith("/api/auth/") && SESSION_COOKIE.test(req.headers.get("cookie") ?? "");
  const checked = signedIn ? await checkSession(req.headers) : { session: null, setCookies: [], databaseDown: false };
  // the database dropped after the probe: 503 now, not a sign-in redirect or a failing page below
  if (checked.databaseDown) return outageAnswer(pathname, requestId);
  if (/^\/modules\/[^/]+\/[^/]+$/.test(pathname) && !pathname.endsWith("/quiz")) {
    if (!checked.session || (checked.session.user as { banned?: boolean }).banned) {
      const url = req.nextUrl.clone();
      url.pathname = "/sign-in";
      url.search = `?next=${encodeURIComponent(pathname)}`;
      const res = NextResponse.redirect(url);
      applySecurityHeaders(res.headers, production);
      return res;
    }
  }
  // better-auth reads the client address from this header (lib/auth): set here from the real peer
  // and the trusted proxies only, overwriting whatever the client sent under that name.
  headers.set(CLIENT_IP_HEADER, clientIpOf(req.headers));
  const language = (checked.session?.user as { language?: unknown } | undefined)?.language;
  if (isLocale(language)) headers.set(LOCALE_HEADER, language);
  if (checked.setCookies.length) headers.set("cookie", withCookies(req.headers.get("cookie") ?? "", checked.setCookies));
  const res = nextWithCsp(req, headers);
  for (const c of checked.setCookies) res.headers.append("set-cookie", c);
  return res;
}

const SESSION_COOKIE = /(?:^|;\s*)(?:__Secure-)?better-auth\.session_token=/;

async function checkSession(requestHeaders: Headers) {
  const { readSession } = await import("@/lib/auth");
  try {
    return { ...(await readSession(requestHeaders)), databaseDown: false };
  } catch (err) {
    return { session: null, setCookies: [], databaseDown: isDatabaseDown(err) };
  }
}

/** The 503 answer while the database is unreachable; it carries the same security headers as every other response. */
function outageAnswer(pathname: string, requestId: string): NextResponse {
  const answer = applySecurityHeaders(new Headers({ "Retry-After": String(OUTAGE_RETRY_AFTER_S), "Cache-Control": "no-store", [REQUEST_ID_HEADER]: requestId }), production);
  if (pathname.startsWith("/api/")) return NextResponse.json({ error: outageMessage("database") }, { status: 503, headers: answer });
  answer.set("content-type", "text/html; charset=utf-8");
  return new NextResponse(outagePage("database"), { status: 503, headers: answer });
}

/** The request's Cookie header with the cookies just set (or expired) applied. */
function withCookies(cookieHeader: string, setCookies: string[]): string {
  const jar = new Map<string, string>();
  for (const part of cookieHeader.split(";")) {
    const i = part.indexOf("=");
    if (i > 0) jar.set(part.slice(0, i).trim(), part.slice(i + 1).trim());
  }
  for (const c of setCookies) {
    const [pair = "", ...attrs] = c.split(";");
    const i = pair.indexOf("=");
    if (i <= 0) continue;
    const name = pair.slice(0, i).trim();
    const value = pair.slice(i + 1).trim();
    if (!value || attrs.some((a) => /^\s*max-age\s*=\s*0\s*$/i.test(a))) jar.delete(name);
    else jar.set(name, value);
  }
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico|fonts/|search-index).*)"],
};
