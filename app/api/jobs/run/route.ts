import { json, route } from "@/lib/api";
import { assertJobsSecret } from "@/lib/certificates";
import { runJobs } from "@/lib/jobs";

/**
 * POST /api/jobs/run (header x-jobs-secret = JOBS_SECRET) → runs every scheduled job once, for an
 * external scheduler (cron, a hosted scheduler). A job another server is running is skipped
 * (`skipped: true`). `?job=name` (may repeat) runs only those. 200 when every job succeeded, 500 with the per-job outcome otherwise.
 */
export const POST = route("public", async ({ req }) => {
  assertJobsSecret(req);
  const names = new URL(req.url).searchParams.getAll("job");
  const results = await runJobs(names, "api");
  const ok = results.every((r) => r.ok);
  return json({ ok, results }, ok ? 200 : 500);
});
