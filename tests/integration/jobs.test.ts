// Scheduled jobs on several machines at once: the app server (POST /api/jobs/run) and a cron host
// (npm run jobs:run, another process) started together run each job at most once at a time — the
// recorded runs never overlap and every other start is reported as skipped; a job whose lease
// another server holds is skipped without a record; every run is recorded and shown at /admin/jobs.
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { and, eq, gt, inArray, sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { jobLease, jobRun } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { APP, fetchFrom, freshIp, signIn } from "../helpers/http";
import { clientOf, createPerson, createTestOrganization } from "../helpers/fixtures";

const run = promisify(execFile);
const SECRET = process.env.JOBS_SECRET!;
type Outcome = { name: string; ok: boolean; skipped?: boolean };

async function viaApi(jobs: string[]): Promise<Outcome[]> {
  const res = await fetchFrom(freshIp(), `${APP}/api/jobs/run?${jobs.map((j) => `job=${j}`).join("&")}`, { method: "POST", headers: { "x-jobs-secret": SECRET } });
  expect(res.status).toBe(200);
  return ((await res.json()) as { results: Outcome[] }).results;
}

async function viaCli(jobs: string[]): Promise<Outcome[]> {
  const { stdout } = await run("npm", ["run", "--silent", "jobs:run", "--", ...jobs], { env: process.env, timeout: 120_000 });
  return jobs.map((name) => ({ name, ok: true, skipped: new RegExp(`\\[jobs\\] ${name}: skipped`).test(stdout) }));
}

/** The newest run id so far: runs recorded later have larger ids. */
const lastRunId = async () => (await db.select({ id: sql<number>`COALESCE(MAX(${jobRun.id}), 0)` }).from(jobRun))[0]!.id;
const runsAfter = (jobs: string[], afterId: number) => db.select().from(jobRun).where(and(inArray(jobRun.job, jobs), gt(jobRun.id, afterId))).orderBy(jobRun.startedAt, jobRun.id);

afterAll(() => pool.end());

describe("scheduled jobs", () => {
  it("skip a job whose lease another server holds, and run and record it once the lease is free", async () => {
    const job = "rate-limit-prune";
    const t0 = await lastRunId();
    await db
      .insert(jobLease)
      .values({ job, runId: "held-by-another-server", leaseUntil: sql`NOW(3) + INTERVAL 60 SECOND` })
      .onDuplicateKeyUpdate({ set: { runId: "held-by-another-server", leaseUntil: sql`NOW(3) + INTERVAL 60 SECOND` } });
    const [held] = await viaApi([job]);
    expect(held).toMatchObject({ name: job, ok: true, skipped: true });
    expect(await runsAfter([job], t0)).toEqual([]);

    await db.update(jobLease).set({ runId: null, leaseUntil: new Date(0) }).where(eq(jobLease.job, job));
    const [ran] = await viaApi([job]);
    expect(ran!.skipped).toBeUndefined();
    const runs = await runsAfter([job], t0);
    expect(runs).toHaveLength(1);
    expect(runs[0]).toMatchObject({ job, status: "ok", trigger: "api" });
    expect(runs[0]!.finishedAt!.getTime()).toBeGreaterThanOrEqual(runs[0]!.startedAt.getTime());
    expect(runs[0]!.result).toBeTypeOf("object");
    const [lease] = await db.select().from(jobLease).where(eq(jobLease.job, job));
    expect(lease!.runId).toBeNull(); // released at the end of the run
  });

  it("started on the app server three times and by cron at once, never run twice at the same time", async () => {
    const jobs = ["certificate-reminders", "evidence-orphans", "rate-limit-prune"];
    const t0 = await lastRunId();
    const results = (await Promise.all([viaApi(jobs), viaApi(jobs), viaApi(jobs), viaCli(jobs)])).flat();
    expect(results.every((r) => r.ok)).toBe(true);
    const runs = await runsAfter(jobs, t0);
    for (const job of jobs) {
      const mine = runs.filter((r) => r.job === job);
      const skipped = results.filter((r) => r.name === job && r.skipped).length;
      expect(mine.length + skipped, job).toBe(4);
      expect(mine.length, job).toBeGreaterThanOrEqual(1);
      for (const r of mine) expect(r.status, job).toBe("ok");
      // one at a time: each recorded run starts after the previous one ended
      for (let i = 1; i < mine.length; i++) expect(mine[i]!.startedAt.getTime(), job).toBeGreaterThanOrEqual(mine[i - 1]!.finishedAt!.getTime());
    }
  });

  it("are listed for admins at /admin/jobs, and for nobody else", async () => {
    const org = await createTestOrganization("Jobs Page Co");
    // admins work only with two-step sign-in on: the demo admin is enrolled (its sign-in enters a code);
    // an admin without it is sent to set it up instead of seeing the page
    const admin = await signIn(demoByRole("admin").email);
    const unenrolled = await clientOf((await createPerson({ tag: "jobs-admin", role: "admin" })).id);
    expect((await unenrolled.fetch("/admin/jobs", { redirect: "manual" })).status).toBe(307);
    const learner = await clientOf((await createPerson({ tag: "jobs-learner", organizationId: org.id })).id);
    const page = await admin.fetch("/admin/jobs");
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Scheduled jobs");
    expect(html).toContain("rate-limit-prune");
    expect((await learner.fetch("/admin/jobs")).status).toBe(403);
  });
});
