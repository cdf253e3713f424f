/**
 * The request id that ties together every log line of one request (proxy.ts → lib/api route() →
 * the outbox rows and jobs it causes). proxy.ts sets it on the request (overwriting whatever the
 * client sent) and on the response as X-Request-Id. An incoming X-Request-Id is kept only when a
 * trusted proxy stands in front (TRUSTED_PROXY_HOPS > 0, the same rule as lib/client-ip): that
 * proxy must set or overwrite the header itself. With no trusted proxy a client could choose the
 * id and muddle the logs, so a new one is made.
 * No server-only import: proxy.ts uses it.
 */
import { trustedProxyHops } from "@/lib/client-ip";

export const REQUEST_ID_HEADER = "x-request-id";

const SAFE = /^[A-Za-z0-9._:-]{8,128}$/;

/** The id a trusted proxy gave this request, or a new random one. */
export function requestIdFor(headers: Headers, hops = trustedProxyHops()): string {
  const incoming = headers.get(REQUEST_ID_HEADER)?.trim();
  if (hops > 0 && incoming && SAFE.test(incoming)) return incoming;
  return crypto.randomUUID();
}
