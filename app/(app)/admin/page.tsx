import { getTranslations } from "next-intl/server";
import type { Metadata } from "next";
import Link from "next/link";
import { When } from "@/components/ui/data-table";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { adminOverview } from "@/lib/admin";
import { Figure } from "@/components/admin/figure";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("admin");
  return { title: t("title") };
}

export default async function AdminPage() {
  await requireViewer("admin", "/admin");
  const t = await getTranslations("admin");
  const o = await adminOverview();
  return (
    <>
      <PageTitle title={t("title")} lead={t("lead")} />
      <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Figure label={t("fig.orgs")} value={o.organizations} href="/admin/organizations" />
        <Figure label={t("fig.people")} value={o.people} href="/admin/people" />
        <Figure label={t("fig.banned")} value={o.banned} href="/admin/people" warn={o.banned > 0} />
        <Figure label={t("fig.mailFailed")} value={o.mailFailedWeek} href="/admin/mail" warn={o.mailFailedWeek > 0} />
      </ul>
      <section aria-labelledby="sync-h" className="mt-8">
        <h2 id="sync-h" className="text-2xl">{t("overview.content")}</h2>
        <p className="mt-2">
          {o.lastSync ? (
            <>
              {t("overview.lastSynced")} <When iso={o.lastSync.at.toISOString()} /> {o.lastSync.ok ? t("overview.ok") : <strong className="text-caution">{t("overview.problems")}</strong>}.{" "}
            </>
          ) : (
            `${t("overview.never")} `
          )}
          <Link href="/admin/content">{t("overview.contentLink")}</Link>
        </p>
      </section>
      <section aria-labelledby="recent-h" className="mt-8">
        <h2 id="recent-h" className="text-2xl">{t("overview.recent")}</h2>
        {o.recent.length ? (
          <ol className="mt-2 flex flex-col gap-2">
            {o.recent.map((r) => (
              <li key={r.id} className="rounded border border-line bg-panel px-3 py-2">
                <p className="flex flex-wrap items-baseline gap-x-3">
                  <span className="font-mono font-bold">{r.action}</span>
                  <When iso={r.at} />
                </p>
                <p className="text-sm break-words">
                  {r.actorEmail ?? t("overview.riser")} → {r.targetLabel ?? `${r.targetType} ${r.targetId}`}
                  {r.reason ? <span className="text-muted">{` · “${r.reason}”`}</span> : null}
                </p>
              </li>
            ))}
          </ol>
        ) : (
          <p className="mt-2">{t("overview.nothing")}</p>
        )}
        <p className="mt-2">
          <Link href="/admin/audit">{t("overview.auditLink")}</Link>
        </p>
      </section>
    </>
  );
}
