import { ApiError, json, route } from "@/lib/api";
import { env } from "@/lib/env";
import { readiness } from "@/lib/health";
import { bearerMatches } from "@/lib/metrics";

export const dynamic = "force-dynamic";

/**
 * GET /api/health/ready (Authorization: Bearer METRICS_SECRET) → 200 { status: "ready" | "degraded", … }
 * when the database and the object store answer (degraded: the mail outbox lags), 503 "not ready"
 * otherwise, with each check's result. 401 without the secret.
 */
export const GET = route("public", async ({ req }) => {
  if (!bearerMatches(req, env.METRICS_SECRET)) throw new ApiError(401, "Readiness details need the metrics secret (Authorization: Bearer …).");
  const r = await readiness();
  return json(r, { status: r.status === "not ready" ? 503 : 200, ...(r.status === "not ready" ? { headers: { "Retry-After": "10" } } : {}) });
});
