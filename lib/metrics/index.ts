import "server-only";
/**
 * Prometheus metrics (prom-client) of this app server, served by GET /api/metrics (bearer
 * METRICS_SECRET). Each app server counts its own requests; Prometheus scrapes every instance and
 * sums. The registry lives on globalThis so that every route bundle and the mail worker count into
 * the same one. Labels are route patterns ("/api/certificates/[id]/pdf"), never ids or people.
 */
import { timingSafeEqual } from "node:crypto";
import { collectDefaultMetrics, Counter, Histogram, Registry } from "prom-client";

function create() {
  const registry = new Registry();
  collectDefaultMetrics({ register: registry, prefix: "riser_" });
  const r = { registers: [registry] };
  return {
    registry,
    requests: new Counter({ name: "riser_http_requests_total", help: "Route handler requests by route pattern, method and status", labelNames: ["route", "method", "status"] as const, ...r }),
    latency: new Histogram({
      name: "riser_http_request_duration_seconds",
      help: "Route handler time from the handler's start to its response, by route pattern and method",
      labelNames: ["route", "method"] as const,
      buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
      ...r,
    }),
    quizSubmits: new Counter({ name: "riser_quiz_submits_total", help: "Quiz attempts graded, by result", labelNames: ["result"] as const, ...r }),
    certificatesIssued: new Counter({ name: "riser_certificates_issued_total", help: "Certificates issued", labelNames: ["kind"] as const, ...r }),
    mail: new Counter({ name: "riser_mail_total", help: "Outbox deliveries by outcome: sent, retry (failed, will try again), failed (gave up)", labelNames: ["outcome"] as const, ...r }),
    jobRuns: new Counter({ name: "riser_job_runs_total", help: "Scheduled job runs by job and outcome (ok, error, skipped: another server held it)", labelNames: ["job", "outcome"] as const, ...r }),
    jobDuration: new Histogram({ name: "riser_job_duration_seconds", help: "Scheduled job run time", labelNames: ["job"] as const, buckets: [0.05, 0.25, 1, 5, 15, 60, 300], ...r }),
  };
}

type Metrics = ReturnType<typeof create>;
const holder = globalThis as unknown as { riserMetrics?: Metrics };
export const metrics: Metrics = (holder.riserMetrics ??= create());

/** The route pattern of a request: each param value in the path replaced by its name ("[id]", "[...all]"). */
export function routePattern(pathname: string, params: Record<string, unknown> | undefined): string {
  if (!params) return pathname;
  const segments = pathname.split("/");
  for (const [name, value] of Object.entries(params)) {
    if (Array.isArray(value)) {
      const tail = value.map((v) => encodeURIComponent(String(v)));
      const at = segments.length - tail.length;
      if (at > 0 && tail.every((t, i) => segments[at + i] === t || decodeURIComponent(segments[at + i]!) === value[i])) segments.splice(at, tail.length, `[...${name}]`);
    } else if (typeof value === "string") {
      const i = segments.findIndex((s) => s === value || s === encodeURIComponent(value) || safeDecode(s) === value);
      if (i > 0) segments[i] = `[${name}]`;
    }
  }
  return segments.join("/");
}

function safeDecode(s: string): string {
  try {
    return decodeURIComponent(s);
  } catch {
    return s;
  }
}

/** Counts one finished route handler request. */
export function observeRequest(route: string, method: string, status: number, seconds: number): void {
  metrics.requests.inc({ route, method, status: String(status) });
  metrics.latency.observe({ route, method }, seconds);
}

/** Whether the request carries `Authorization: Bearer <secret>` (compared in constant time). */
export function bearerMatches(req: Request, secret: string | undefined): boolean {
  if (!secret) return false;
  const m = /^Bearer\s+(\S+)$/i.exec(req.headers.get("authorization") ?? "");
  if (!m) return false;
  const given = Buffer.from(m[1]!);
  const want = Buffer.from(secret);
  return given.length === want.length && timingSafeEqual(given, want);
}
