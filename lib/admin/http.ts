import "server-only";
import { AccessError } from "@/lib/access";
import { clientIp } from "@/lib/api";
import { env } from "@/lib/env";
import type { RequestContext } from "./people";

/** The query string as a plain object, for a zod schema. */
export const queryOf = (req: Request): Record<string, string> => Object.fromEntries(new URL(req.url).searchParams);

/**
 * Admin changes come only from Riser's own pages: a request another site's page sent (its Origin or
 * Sec-Fetch-Site says so) is refused, on top of the SameSite session cookie.
 */
export function assertSameOrigin(req: Request): void {
  const origin = req.headers.get("origin");
  const site = req.headers.get("sec-fetch-site");
  if ((origin && origin !== new URL(env.APP_URL).origin) || site === "cross-site") {
    throw new AccessError(403, "This change must come from Riser's own pages.");
  }
}

export const requestContext = (req: Request): RequestContext => ({ headers: req.headers, ip: clientIp(req) });
