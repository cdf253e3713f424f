/**
 * Scheduled jobs (lib/jobs): a lease per job so that of several app servers (or a cron run and a
 * server) only one runs a job at a time, and a record of every run that admins read at /admin/jobs.
 */
import { datetime, index, int, json, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";

export const jobLease = mysqlTable("job_lease", {
  job: varchar("job", { length: 60 }).primaryKey(),
  /** the run holding the lease; another run may take it once lease_until has passed */
  runId: varchar("run_id", { length: 36 }),
  leaseUntil: datetime("lease_until", { fsp: 3 }).notNull(),
});

export const jobRun = mysqlTable(
  "job_run",
  {
    id: int("id").autoincrement().primaryKey(),
    runId: varchar("run_id", { length: 36 }).notNull(),
    job: varchar("job", { length: 60 }).notNull(),
    /** the machine that ran it (os.hostname) and what started it: "api", "cli", … */
    host: varchar("host", { length: 120 }).notNull(),
    trigger: varchar("trigger", { length: 20 }).notNull(),
    status: varchar("status", { length: 12 }).$type<"running" | "ok" | "error">().notNull(),
    startedAt: datetime("started_at", { fsp: 3 }).notNull(),
    finishedAt: datetime("finished_at", { fsp: 3 }),
    /** what the job reports (counts), as JSON */
    result: json("result"),
    error: text("error"),
  },
  (t) => [index("job_run_job_started_idx").on(t.job, t.startedAt), index("job_run_started_idx").on(t.startedAt)],
);

export type JobRun = typeof jobRun.$inferSelect;
