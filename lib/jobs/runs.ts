import "server-only";
/**
 * One run of a job at a time across every app server and cron host: a lease row per job
 * (job_lease), taken with one conditional UPDATE — the server whose UPDATE changes the row wins,
 * the others skip — and released when the run ends (or expires after LEASE_S if a server dies
 * mid-run). Times come from the database clock, so app servers' clocks do not matter. Every run
 * that wins is recorded in job_run (start, end, result or error), read by /admin/jobs.
 * The database client is imported lazily: scripts/jobs.ts sets the environment after importing JOBS.
 */
import { hostname } from "node:os";
import { and, desc, eq, lt, sql } from "drizzle-orm";

/** How long a run may hold its job before another server may take it over. */
export const LEASE_S = 15 * 60;

const dbModule = () => import("@/db/client");
const schema = () => import("@/db/schema");

/** Takes the job's lease for `runId`; false when another run holds it. */
export async function takeLease(job: string, runId: string, leaseSeconds = LEASE_S): Promise<boolean> {
  const { db } = await dbModule();
  const { jobLease } = await schema();
  await db.insert(jobLease).ignore().values({ job, runId: null, leaseUntil: new Date(0) });
  const [res] = await db
    .update(jobLease)
    .set({ runId, leaseUntil: sql`NOW(3) + INTERVAL ${leaseSeconds} SECOND` })
    .where(and(eq(jobLease.job, job), lt(jobLease.leaseUntil, sql`NOW(3)`)));
  return res.affectedRows === 1;
}

export async function releaseLease(job: string, runId: string): Promise<void> {
  const { db } = await dbModule();
  const { jobLease } = await schema();
  await db.update(jobLease).set({ runId: null, leaseUntil: new Date(0) }).where(and(eq(jobLease.job, job), eq(jobLease.runId, runId)));
}

export async function recordStart(job: string, runId: string, trigger: string): Promise<void> {
  const { db } = await dbModule();
  const { jobRun } = await schema();
  await db.insert(jobRun).values({ runId, job, host: hostname().slice(0, 120), trigger: trigger.slice(0, 20), status: "running", startedAt: new Date() });
}

export async function recordEnd(runId: string, outcome: { ok: boolean; result?: unknown; error?: string }): Promise<void> {
  const { db } = await dbModule();
  const { jobRun } = await schema();
  await db
    .update(jobRun)
    .set({ status: outcome.ok ? "ok" : "error", finishedAt: new Date(), result: outcome.ok ? (outcome.result ?? null) : null, error: outcome.error?.slice(0, 2000) ?? null })
    .where(eq(jobRun.runId, runId));
}

/** The latest runs, newest first (admin page). */
export async function recentJobRuns(limit = 100) {
  const { db } = await dbModule();
  const { jobRun } = await schema();
  return db.select().from(jobRun).orderBy(desc(jobRun.startedAt), desc(jobRun.id)).limit(limit);
}
