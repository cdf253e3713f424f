import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import { JobRuns } from "@/components/admin/job-runs";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { recentJobRuns } from "@/lib/jobs";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: `${t("jobs.nav")} · ${t("title")}` };
}
export const dynamic = "force-dynamic";

export default async function AdminJobsPage() {
  await requireViewer("admin", "/admin/jobs");
  const t = await getTranslations("admin");
  const runs = await recentJobRuns(100);
  const rows = runs.map((r) => ({ ...r, startedAt: r.startedAt.toISOString(), finishedAt: r.finishedAt?.toISOString() ?? null }));
  return (
    <>
      <PageTitle
        title={t("jobs.title")}
        lead={t("jobs.lead")}
      />
      <JobRuns rows={rows} />
    </>
  );
}
