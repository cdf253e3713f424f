// Liveness, readiness and metrics of the running app server, and the request id proxy.ts hands out:
// readiness details and metrics refuse anyone without the bearer METRICS_SECRET; metrics count
// requests by route pattern (never an id), quiz submits, certificates and job runs as they happen.
import { afterAll, describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import { APP, anonymous, fetchFrom, freshIp, postJson } from "../helpers/http";
import { clientOf, createTestOrganization, fixturePerson } from "../helpers/fixtures";

const SECRET = process.env.METRICS_SECRET!;
const bearer = (s: string) => ({ authorization: `Bearer ${s}` });

async function scrape(): Promise<string> {
  const res = await fetchFrom(freshIp(), `${APP}/api/metrics`, { headers: bearer(SECRET) });
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toMatch(/^text\/plain; version=0\.0\.4/);
  return res.text();
}

/** The value of one sample ("name{labels} value"), 0 when absent. */
function sample(text: string, name: string, labels: Record<string, string>): number {
  const line = text.split("\n").find((l) => l.startsWith(`${name}{`) && Object.entries(labels).every(([k, v]) => l.includes(`${k}="${v}"`)));
  return line ? Number(line.split(" ").pop()) : 0;
}

afterAll(() => pool.end());

describe("health", () => {
  it("/api/health stays public for start scripts and /api/health/live answers without any dependency", async () => {
    expect((await anonymous().fetch("/api/health")).status).toBe(200);
    const live = await anonymous().fetch("/api/health/live");
    expect(live.status).toBe(200);
    expect((await live.json()).status).toBe("live");
  });

  it("/api/health/ready refuses anonymous and wrong secrets, and reports each dependency with the secret", async () => {
    expect(SECRET?.length).toBeGreaterThanOrEqual(16);
    expect((await anonymous().fetch("/api/health/ready")).status).toBe(401);
    expect((await anonymous().fetch("/api/health/ready", { headers: bearer(`${SECRET}x`) })).status).toBe(401);
    expect((await anonymous().fetch("/api/health/ready", { headers: { "x-metrics-secret": SECRET } })).status).toBe(401);
    const res = await anonymous().fetch("/api/health/ready", { headers: bearer(SECRET) });
    const body = await res.json();
    expect(res.status, JSON.stringify(body)).toBe(200);
    expect(body.database.ok).toBe(true);
    expect(body.objectStore.ok).toBe(true);
    expect(typeof body.mailOutbox.due).toBe("number");
    expect(["ready", "degraded"]).toContain(body.status);
  });
});

describe("request id", () => {
  it("is new for every request and never the one a client sends (no trusted proxy on the test profile)", async () => {
    const forged = "forged-request-id-0001";
    const a = await anonymous().fetch("/api/health/live", { headers: { "x-request-id": forged } });
    const b = await anonymous().fetch("/api/search?q=antifreeze");
    const idA = a.headers.get("x-request-id");
    const idB = b.headers.get("x-request-id");
    expect(idA).toMatch(/^[0-9a-f-]{36}$/);
    expect(idB).toMatch(/^[0-9a-f-]{36}$/);
    expect(idA).not.toBe(forged);
    expect(idA).not.toBe(idB);
  });
});

describe("metrics", () => {
  it("refuses anonymous access and a wrong secret", async () => {
    expect((await anonymous().fetch("/api/metrics")).status).toBe(401);
    expect((await anonymous().fetch("/api/metrics", { headers: bearer("not-the-metrics-secret-at-all") })).status).toBe(401);
    expect((await anonymous().fetch("/api/metrics", { headers: { authorization: SECRET } })).status).toBe(401);
  });

  it("counts requests by route pattern, quiz submits and job runs", async () => {
    const before = await scrape();
    const code = "NoSuchCode0123456789abcd";
    expect((await anonymous().fetch(`/api/verify/${code}`)).status).toBe(404);
    expect((await anonymous().fetch("/api/health/live")).status).toBe(200);

    // a learner of our own submits an empty attempt (graded: failed)
    const org = await createTestOrganization("Metrics Fire Co");
    const learner = await fixturePerson(org, { name: "Metrics Learner", teamId: org.teamId });
    const client = await clientOf(learner.id);
    const started = await postJson(client, "/api/quiz/attempts", { module: "freeze-protection" });
    expect(started.status, started.text).toBe(201);
    const submitted = await postJson(client, `/api/quiz/attempts/${started.json.id}/submit`, {});
    expect(submitted.status, submitted.text).toBe(200);

    const jobs = await fetchFrom(freshIp(), `${APP}/api/jobs/run?job=rate-limit-prune`, { method: "POST", headers: { "x-jobs-secret": process.env.JOBS_SECRET! } });
    expect(jobs.status).toBe(200);

    const after = await scrape();
    expect(after).not.toContain(code);
    const verify = { route: "/api/verify/[code]", method: "GET", status: "404" };
    expect(sample(after, "riser_http_requests_total", verify)).toBe(sample(before, "riser_http_requests_total", verify) + 1);
    const live = { route: "/api/health/live", method: "GET", status: "200" };
    expect(sample(after, "riser_http_requests_total", live)).toBe(sample(before, "riser_http_requests_total", live) + 1);
    expect(sample(after, "riser_http_request_duration_seconds_count", { route: "/api/verify/[code]", method: "GET" })).toBeGreaterThanOrEqual(1);
    expect(sample(after, "riser_quiz_submits_total", { result: "failed" })).toBe(sample(before, "riser_quiz_submits_total", { result: "failed" }) + 1);
    const submitRoute = { route: "/api/quiz/attempts/[id]/submit", method: "POST", status: "200" };
    expect(sample(after, "riser_http_requests_total", submitRoute)).toBe(sample(before, "riser_http_requests_total", submitRoute) + 1);
    const prune = { job: "rate-limit-prune", outcome: "ok" };
    expect(sample(after, "riser_job_runs_total", prune)).toBe(sample(before, "riser_job_runs_total", prune) + 1);
    for (const name of ["riser_certificates_issued_total", "riser_mail_total", "riser_job_duration_seconds"]) expect(after).toContain(`# TYPE ${name}`);
  });
});
