import { connect } from "node:net";
import { NextResponse, type NextRequest } from "next/server";
import { CLIENT_IP_HEADER, clientIpOf } from "@/lib/client-ip";
import { applySecurityHeaders, contentSecurityPolicy, newNonce } from "@/lib/security-headers.mjs";

/**
 * Quick checks before a route runs: (1) if the database is unreachable, answer 503 at once with a
 * clear page or JSON (a TCP probe, remembered for one second); (2) statically generated lesson
 * pages get their session checked here, since the page itself holds no per-person data; (3) the
 * client address is worked out once (lib/client-ip) and handed to better-auth.
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

const outagePage = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Riser is briefly unavailable</title></head>
<body style="font-family:system-ui,sans-serif;background:#F7F4EE;color:#14202B;max-width:40rem;margin:3rem auto;padding:0 1rem">
<h1>Riser is briefly unavailable</h1><p>Our database is not answering right now. Nothing you saved is lost. This page will work again as soon as it is back &mdash; try again in a minute.</p></body></html>`;

/**
 * Passes the request on with its Content-Security-Policy: a fresh nonce per request, set on the request
 * (Next reads the nonce from it while rendering and stamps its scripts) and on the response.
 * Pages render per request for this (app/layout.tsx); see lib/security-headers.mjs for the policy.
 */
function nextWithCsp(req: NextRequest, requestHeaders: Headers): NextResponse {
  // JSON and files run no script: only pages get a nonce
  const csp = contentSecurityPolicy(production, req.nextUrl.pathname.startsWith("/api/") ? undefined : newNonce());
  requestHeaders.set("content-security-policy", csp);
  const res = NextResponse.next({ request: { headers: requestHeaders } });
  res.headers.set("content-security-policy", csp);
  return res;
}

export async function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;
  if (pathname === "/api/health") return nextWithCsp(req, new Headers(req.headers));
  if (!(await databaseUp())) {
    // The proxy's own answers carry the same security headers as every other response.
    const headers = applySecurityHeaders(new Headers({ "Retry-After": "10", "Cache-Control": "no-store" }), production);
    if (pathname.startsWith("/api/")) {
      return NextResponse.json({ error: "Riser's database is not reachable right now. Try again in a minute." }, { status: 503, headers });
    }
    headers.set("content-type", "text/html; charset=utf-8");
    return new NextResponse(outagePage, { status: 503, headers });
  }
  if (/^\/modules\/[^/]+\/[^/]+$/.test(pathname) && !pathname.endsWith("/quiz")) {
    const { auth } = await import("@/lib/auth");
    const session = await auth.api.getSession({ headers: req.headers }).catch(() => null);
    if (!session || (session.user as { banned?: boolean }).banned) {
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
  const headers = new Headers(req.headers);
  headers.set(CLIENT_IP_HEADER, clientIpOf(req.headers));
  return nextWithCsp(req, headers);
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico|fonts/|search-index).*)"],
};
