/**
 * Where to go after signing in: the `next` parameter, parsed the way a browser would parse it
 * against this site's origin (WHATWG URL: backslashes, tabs and newlines included), and kept only
 * when it stays on this origin. Only its path and query survive; anything else gives `fallback`.
 * The one helper for every place that reads `next` (browser and server: no server-only import).
 */
export function safeNext(next: string | null | undefined, origin: string, fallback = "/learn"): string {
  if (!next) return fallback;
  let base: URL;
  let url: URL;
  try {
    base = new URL(origin);
    url = new URL(next, base);
  } catch {
    return fallback;
  }
  if (url.origin !== base.origin || (url.protocol !== "http:" && url.protocol !== "https:")) return fallback;
  const path = `${url.pathname}${url.search}`;
  // "//host" or "/\host" would be read as another site by the router or an older browser
  if (!path.startsWith("/") || path.startsWith("//") || path.startsWith("/\\")) return fallback;
  return path;
}
