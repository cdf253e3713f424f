/**
 * The client's address, learned without trusting the client. scripts/serve.mjs appends the
 * connected peer's address to X-Forwarded-For; each trusted proxy in front (TRUSTED_PROXY_HOPS,
 * default 0) appends one more. Counting that many addresses from the right lands on the address the
 * first trusted hop saw; everything further left was written by the client and is ignored.
 * No server-only import: proxy.ts uses it too.
 */

/** How many proxies in front of the app append to X-Forwarded-For (0: the app faces clients directly). */
export function trustedProxyHops(raw = process.env.TRUSTED_PROXY_HOPS): number {
  const n = Number(raw ?? 0);
  return Number.isInteger(n) && n >= 0 && n <= 10 ? n : 0;
}

/** IPv4-mapped IPv6 as plain IPv4, lower case, no port or brackets. */
function normalize(address: string): string {
  const a = address.trim().toLowerCase();
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/.exec(a);
  if (mapped) return mapped[1]!;
  const v4port = /^(\d+\.\d+\.\d+\.\d+):\d+$/.exec(a);
  if (v4port) return v4port[1]!;
  const bracketed = /^\[([0-9a-f:.]+)\](?::\d+)?$/.exec(a);
  return bracketed ? bracketed[1]! : a;
}

/** The client address from an X-Forwarded-For value, `hops` trusted proxies counted from the right. */
export function clientIpFrom(forwarded: string | null | undefined, hops = trustedProxyHops()): string {
  const list = (forwarded ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  if (!list.length) return "unknown";
  // Fewer entries than hops + 1 means a proxy is missing; the leftmost is then the best we have.
  const picked = list[Math.max(0, list.length - 1 - hops)]!;
  const ip = normalize(picked);
  return /^[0-9a-f:.]{2,45}$/.test(ip) ? ip : "unknown";
}

/** The header proxy.ts sets (overwriting any client value) for better-auth's rate limit and sessions. */
export const CLIENT_IP_HEADER = "x-riser-client-ip";

export function clientIpOf(headers: Headers): string {
  return clientIpFrom(headers.get("x-forwarded-for"));
}
