/**
 * The session cookie cache (better-auth `session.cookieCache`): a signed (HMAC-SHA256, "compact")
 * copy of the session and user in a short-lived cookie, so that the proxy, pages and route handlers
 * check a session without a database round trip. What bounds a stale copy:
 *
 * - the copy expires after SESSION_CACHE_SECONDS (60 s at most; shorter only on a local instance,
 *   for the test that proves the bound), after which the session is read from the database again:
 *   a ban, role change, removal or sign-out everywhere made on any app server takes effect on every
 *   app server within that time;
 * - on the app server where the change is made it takes effect at once: every change to a person's
 *   account or sessions calls `forgetCachedSessions(userId)`, which moves that person's cache
 *   version on this server, so copies written before the change no longer match.
 *
 * The versions live in this process only (kept on globalThis so that the proxy's and the routes'
 * bundles share one map). Servers that never saw a change agree on version 0, so a copy written by one
 * server is trusted by the others; a server where the person changed misses until its copy is rewritten.
 */
import { env, sessionCacheSeconds } from "@/lib/env";

/** How long a cached session is trusted here: 60 s (README "Security model"). */
export const SESSION_CACHE_SECONDS = sessionCacheSeconds(env);

const KEY = Symbol.for("riser.session-cache-versions");
type Registry = { versions: Map<string, number> };
const registry: Registry = ((globalThis as Record<symbol, Registry | undefined>)[KEY] ??= { versions: new Map() });

/** The version a cached copy of this person's session must carry to be trusted on this server. */
export function cachedSessionVersion(userId: string | undefined): string {
  return String(userId ? (registry.versions.get(userId) ?? 0) : 0);
}

/** Call after a change to a person's role, ban, organization, team, name or sessions has committed. */
export function forgetCachedSessions(userId: string): void {
  registry.versions.set(userId, (registry.versions.get(userId) ?? 0) + 1);
}
