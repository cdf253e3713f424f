import { connect } from "node:net";
import { NextResponse, type NextRequest } from "next/server";

/**
 * Quick checks before a route runs: (1) if the database is unreachable, answer 503 at once with a
 * clear page or JSON (a TCP probe, remembered for one second); (2) statically generated lesson
 * pages get their session checked here, since the page itself holds no per-person data.
 * Every dynamic page, action and route handler checks access again where the data is (lib/access).
 */
let lastProbe = { at: 0, up: true };

function probe(url: string): Promise<boolean> {
  const u = new URL(url);
  return new Promise((resolve) => {
    const socket = connect({ host: u.hostname, port: Number(u.port || 3306) });
    const done = (up: boolean) => {
      socket.destroy();
      resolve(up);
    };
    socket.setTimeout(500, () => done(false));
    socket.once("connect", () => done(true));
    socket.once("error", () => done(false));
  });
}

async function databaseUp(): Promise<boolean> {
  const url = process.env.DATABASE_URL;
  if (!url) return true;
  const now = Date.now();
  if (now - lastProbe.at < 1000) return lastProbe.up;
  lastProbe = { at: now, up: await probe(url) };
  return lastProbe.up;
}

const outagePage = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Riser is briefly unavailable</title></head>
<body style="font-family:system-ui,sans-serif;background:#F7F4EE;color:#14202B;max-width:40rem;margin:3rem auto;padding:0 1rem">
<h1>Riser is briefly unavailable</h1><p>Our database is not answering right now. Nothing you saved is lost. This page will work again as soon as it is back &mdash; try again in a minute.</p></body></html>`;

export async function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;
  if (pathname === "/api/health") return NextResponse.next();
  if (!(await databaseUp())) {
    if (pathname.startsWith("/api/")) {
      return NextResponse.json({ error: "Riser's database is not reachable right now. Try again in a minute." }, { status: 503, headers: { "Retry-After": "10" } });
    }
    return new NextResponse(outagePage, { status: 503, headers: { "content-type": "text/html; charset=utf-8", "Retry-After": "10" } });
  }
  if (/^\/modules\/[^/]+\/[^/]+$/.test(pathname) && !pathname.endsWith("/quiz")) {
    const { auth } = await import("@/lib/auth");
    const session = await auth.api.getSession({ headers: req.headers }).catch(() => null);
    if (!session || (session.user as { banned?: boolean }).banned) {
      const url = req.nextUrl.clone();
      url.pathname = "/sign-in";
      url.search = `?next=${encodeURIComponent(pathname)}`;
      return NextResponse.redirect(url);
    }
  }
  return NextResponse.next();
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico|fonts/|search-index).*)"],
};
