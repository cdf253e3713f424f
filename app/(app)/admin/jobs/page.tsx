import type { Metadata } from "next";
import { JobRuns } from "@/components/admin/job-runs";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { recentJobRuns } from "@/lib/jobs";

export const metadata: Metadata = { title: "Jobs · Admin" };
export const dynamic = "force-dynamic";

export default async function AdminJobsPage() {
  await requireViewer("admin", "/admin/jobs");
  const runs = await recentJobRuns(100);
  const rows = runs.map((r) => ({ ...r, startedAt: r.startedAt.toISOString(), finishedAt: r.finishedAt?.toISOString() ?? null }));
  return (
    <>
      <PageTitle
        title="Scheduled jobs"
        lead="The latest 100 runs of reminders, digests, expiry, clean-up and mail delivery, newest first. A scheduler starts them (README, “Scheduled jobs”); a job already running on another server is skipped, not run twice."
      />
      <JobRuns rows={rows} />
    </>
  );
}
