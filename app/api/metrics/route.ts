import { ApiError, route } from "@/lib/api";
import { env } from "@/lib/env";
import { bearerMatches, metrics } from "@/lib/metrics";

export const dynamic = "force-dynamic";

/**
 * GET /api/metrics (Authorization: Bearer METRICS_SECRET) → this app server's metrics in the
 * Prometheus text format (lib/metrics). 401 without the secret. Scrape every app server.
 */
export const GET = route("public", async ({ req }) => {
  if (!bearerMatches(req, env.METRICS_SECRET)) throw new ApiError(401, "Metrics need the metrics secret (Authorization: Bearer …).");
  const body = await metrics.registry.metrics();
  return new Response(body, { status: 200, headers: { "content-type": metrics.registry.contentType, "cache-control": "no-store" } });
});
