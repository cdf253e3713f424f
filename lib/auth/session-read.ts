import { SESSION_CACHE_SECONDS, cachedSessionVersion } from "./session-cache";

/**
 * Reads the request's session (better-auth getSession) for the proxy and for pages, and remembers a
 * session this process has just accepted from its signed cookie copy, so that the same cookies are
 * not verified again (two HMAC checks, cookie parsing and the endpoint pipeline: a few milliseconds)
 * by the proxy and then the page of the same request, or by the next request of the same browser.
 *
 * What is remembered, and for how long, is exactly what better-auth would decide again:
 * - only a session that getSession accepted from the cookie copy without setting any cookie (a read
 *   from the database, a renewed or expired copy always sets one, and is never remembered); nothing
 *   is remembered for a refused or missing session;
 * - keyed by the whole Cookie header, so that any change to any cookie is a fresh check;
 * - until the earlier of the copy's own expiry and the session's expiry (both in the signed copy, so
 *   the SESSION_CACHE_SECONDS bound of lib/auth/session-cache.ts is unchanged);
 * - only while the person's cache version on this server is the one the copy carried: every change to
 *   an account or its sessions (`forgetCachedSessions`) ends the remembered session at once, as it ends
 *   the copy itself.
 */
type SessionResult = { session: object; user: { id: string } };
type GetSession<S> = (o: { headers: Headers; returnHeaders: true }) => Promise<{ response: S | null; headers: Headers } | null>;
type Entry = { result: SessionResult; userId: string; version: string; until: number };

const MAX_ENTRIES = 5_000;
/** Longer Cookie headers are checked every time rather than kept. */
const MAX_KEY_LENGTH = 8_192;
const remembered = new Map<string, Entry>();

const SESSION_DATA = /(?:^|;\s*)(?:__Secure-)?better-auth\.session_data=([^;]*)/;

/**
 * From the signed copy getSession has just accepted: whose it is, the cache version it carries, and
 * the earlier of its own expiry and the session's expiry (ms).
 */
function copyOf(cookieHeader: string): { userId: string; version: string; until: number } | null {
  // exactly one copy and one session token, unchunked: otherwise which one better-auth read is not
  // certain here, and nothing is kept
  if (cookieHeader.split("better-auth.session_data").length !== 2 || cookieHeader.split("better-auth.session_token").length !== 2) return null;
  const value = SESSION_DATA.exec(cookieHeader)?.[1];
  if (!value) return null;
  try {
    const parsed = JSON.parse(Buffer.from(decodeURIComponent(value), "base64url").toString("utf8")) as {
      expiresAt?: unknown;
      session?: { session?: { expiresAt?: unknown }; user?: { id?: unknown }; version?: unknown };
    };
    const copyExpires = typeof parsed.expiresAt === "number" ? parsed.expiresAt : NaN;
    const sessionExpires = new Date(parsed.session?.session?.expiresAt as string).getTime();
    // never longer than a copy may be trusted at all, whatever it says
    const until = Math.min(copyExpires, sessionExpires, Date.now() + SESSION_CACHE_SECONDS * 1000);
    const userId = parsed.session?.user?.id;
    // better-auth reads a copy without a version as "1"
    const version = parsed.session?.version ?? "1";
    if (!Number.isFinite(until) || typeof userId !== "string" || typeof version !== "string") return null;
    return { userId, version, until };
  } catch {
    return null;
  }
}

/** `getSession`: better-auth's (lib/auth exports `readSession`, this bound to it). */
export async function readSessionWith<S extends SessionResult>(getSession: GetSession<S>, requestHeaders: Headers): Promise<{ session: S | null; setCookies: string[] }> {
  const cookieHeader = requestHeaders.get("cookie") ?? "";
  const hit = cookieHeader ? remembered.get(cookieHeader) : undefined;
  if (hit) {
    if (Date.now() < hit.until && cachedSessionVersion(hit.userId) === hit.version) return { session: hit.result as S, setCookies: [] };
    remembered.delete(cookieHeader);
  }
  const r = await getSession({ headers: requestHeaders, returnHeaders: true });
  const session = r?.response ?? null;
  const setCookies = r?.headers.getSetCookie() ?? [];
  if (session && setCookies.length === 0 && cookieHeader && cookieHeader.length <= MAX_KEY_LENGTH) {
    // the version the accepted copy carries (not the one read now): a change committed while
    // getSession ran makes the entry miss at once, never the reverse
    const copy = copyOf(cookieHeader);
    if (copy && copy.userId === session.user.id && Date.now() < copy.until) {
      if (remembered.size >= MAX_ENTRIES) remembered.clear();
      Object.freeze(session.session);
      Object.freeze(session.user);
      remembered.set(cookieHeader, { result: Object.freeze(session), ...copy });
    }
  }
  return { session, setCookies };
}
