import "server-only";
import { clientIpOf } from "@/lib/client-ip";
import { env } from "@/lib/env";
import { hitRateLimit, type RateLimitResult } from "@/lib/rate-limit";

/** The client address (same rule as lib/api's clientIp: forged X-Forwarded-For values are ignored). */
export function ipFromHeaders(headers: Headers): string {
  return clientIpOf(headers);
}

/** One public look-up (page or JSON) by this client; both share one budget per window. */
export function hitVerifyLimit(ip: string): Promise<RateLimitResult> {
  return hitRateLimit(`verify:${ip}`, env.VERIFY_RATE_LIMIT_MAX, env.VERIFY_RATE_LIMIT_WINDOW_S);
}

export const tooManyLookupsMessage = (retryAfterSeconds: number) =>
  `Too many certificate look-ups from your network. Wait ${retryAfterSeconds} second${retryAfterSeconds === 1 ? "" : "s"} and try again.`;
