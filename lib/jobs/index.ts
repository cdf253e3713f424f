import "server-only";
/**
 * Every scheduled job, in one list: `npm run jobs:run` (scripts/jobs.ts) and
 * `POST /api/jobs/run` (header x-jobs-secret) both run these. Only one run of a job at a time
 * across all servers (a lease in the database, ./runs.ts; the others skip), and every run is
 * recorded for /admin/jobs. Each job must still be safe to run twice (a lease can expire under a
 * very slow run). Add a job: one entry here, importing its module lazily (so that the environment
 * is set before any server module loads).
 */
import { log, withLogContext } from "@/lib/log";
import { metrics } from "@/lib/metrics";
import { recordEnd, recordStart, releaseLease, takeLease } from "./runs";

export { LEASE_S, recentJobRuns } from "./runs";

export type Job = { name: string; run: () => Promise<unknown> };

export const JOBS: Job[] = [
  { name: "certificate-reminders", run: async () => (await import("@/lib/certificates")).sendExpiryReminders() },
  { name: "completion-retry", run: async () => (await import("@/lib/completion")).retryPendingCompletions() },
  { name: "certificate-backfill", run: async () => (await import("@/lib/certificates")).issueMissingCertificates() },
  { name: "rate-limit-prune", run: async () => (await import("@/lib/rate-limit")).pruneRateLimitBuckets() },
  { name: "evidence-orphans", run: async () => (await import("@/lib/signoffs")).removeOrphanedEvidence({ olderThanMinutes: 60 }) },
  { name: "assignment-reminders", run: async () => (await import("@/lib/team")).sendDueReminders() },
  { name: "unverified-accounts-expire", run: async () => (await import("@/lib/auth")).expireUnverifiedAccounts() },
  { name: "board-counts-fold", run: async () => (await import("@/lib/team")).foldAllBoardCounts() },
  { name: "manager-digest", run: async () => (await import("@/lib/team")).sendManagerDigests() },
  // last, so that the messages the jobs above queued go out in the same run
  { name: "mail-outbox", run: async () => (await import("@/lib/mail")).deliverOutbox() },
];

/** `skipped`: another server (or cron run) held the job, so this call did not run it. */
export type JobOutcome = { name: string; ok: boolean; ms: number; skipped?: boolean; result?: unknown; error?: string };

/** Runs the named jobs (all when none are named) one after another; a failing job does not stop the rest. */
export async function runJobs(names: string[] = [], trigger = "api"): Promise<JobOutcome[]> {
  const out: JobOutcome[] = [];
  for (const job of JOBS.filter((j) => !names.length || names.includes(j.name))) {
    const runId = crypto.randomUUID();
    out.push(await withLogContext({ job: job.name, runId }, () => runLeased(job, runId, trigger)));
  }
  return out;
}

async function runLeased(job: Job, runId: string, trigger: string): Promise<JobOutcome> {
  const t0 = Date.now();
  try {
    if (!(await takeLease(job.name, runId))) {
      metrics.jobRuns.inc({ job: job.name, outcome: "skipped" });
      log().info("job skipped: another run holds it");
      return { name: job.name, ok: true, skipped: true, ms: Date.now() - t0 };
    }
  } catch (err) {
    metrics.jobRuns.inc({ job: job.name, outcome: "error" });
    log().error({ err }, "job could not start");
    return { name: job.name, ok: false, ms: Date.now() - t0, error: err instanceof Error ? err.message : String(err) };
  }
  try {
    await recordStart(job.name, runId, trigger);
    const outcome = await runOne(job);
    await recordEnd(runId, outcome);
    return outcome;
  } catch (err) {
    log().error({ err }, "job run could not be recorded");
    return { name: job.name, ok: false, ms: Date.now() - t0, error: err instanceof Error ? err.message : String(err) };
  } finally {
    await releaseLease(job.name, runId).catch((err) => log().warn({ err }, "job lease not released; it expires on its own"));
  }
}

/** One job run: logged (start, end, result or error) and counted in the metrics. */
async function runOne(job: Job): Promise<JobOutcome> {
  const t0 = Date.now();
  log().info("job started");
  try {
    const result = await job.run();
    const ms = Date.now() - t0;
    metrics.jobRuns.inc({ job: job.name, outcome: "ok" });
    metrics.jobDuration.observe({ job: job.name }, ms / 1000);
    log().info({ ms, result }, "job finished");
    return { name: job.name, ok: true, ms, result };
  } catch (err) {
    const ms = Date.now() - t0;
    metrics.jobRuns.inc({ job: job.name, outcome: "error" });
    metrics.jobDuration.observe({ job: job.name }, ms / 1000);
    log().error({ ms, err }, "job failed");
    return { name: job.name, ok: false, ms, error: err instanceof Error ? err.message : String(err) };
  }
}
