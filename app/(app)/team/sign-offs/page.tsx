import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { EvidenceThumbs } from "@/components/signoffs/evidence-thumbs";
import { ReviewForm } from "@/components/signoffs/review-form";
import { SignOffBadge } from "@/components/signoffs/status-badge";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { reviewQueue, waitingCount, type QueueFilter } from "@/lib/signoffs";
import { daysSince, isoDay } from "@/lib/dates";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("team");
  return { title: t("signoffs.title") };
}

const TABS: QueueFilter[] = ["submitted", "approved", "returned"];

const day = (d: Date) => isoDay(d);

export default async function TeamSignOffsPage({ searchParams }: { searchParams: Promise<{ status?: string; org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/sign-offs");
  const t = await getTranslations("team");
  const waited = (d: Date) => t("signoffs.waited", { days: daysSince(d) });
  const sp = await searchParams;
  const filter: QueueFilter = sp.status === "approved" || sp.status === "returned" ? sp.status : "submitted";
  const admin = viewer.role === "admin";
  // admins may narrow the queue to one organization (?org=, as on the other team pages)
  const org = admin && typeof sp.org === "string" && /^[\w-]{1,36}$/.test(sp.org) ? sp.org : null;
  const [items, waiting] = await Promise.all([reviewQueue(viewer, filter, org, 100, localeOf(await getLocale())), waitingCount(viewer, org)]);
  const hrefFor = (key: QueueFilter) => {
    const q = new URLSearchParams({ ...(key === "submitted" ? {} : { status: key }), ...(org ? { org } : {}) }).toString();
    return `/team/sign-offs${q ? `?${q}` : ""}`;
  };

  return (
    <div className="flex flex-col gap-4">
      <PageTitle
        title={t("signoffs.title")}
        lead={t("signoffs.lead", { admin: admin ? "yes" : "no" })}
      />
      <TeamNav current="/team/sign-offs" org={org} />
      <nav aria-label={t("signoffs.statusNav")} className="flex flex-wrap gap-2">
        {TABS.map((key) => (
          <Link
            key={key}
            href={hrefFor(key)}
            aria-current={key === filter ? "page" : undefined}
            className={`inline-flex min-h-11 items-center rounded border px-3 py-2 text-sm font-bold no-underline sm:text-base ${key === filter ? "border-ink bg-ink text-paper" : "border-ink/40 bg-panel text-ink"}`}
          >
            {t(`signoffs.tab.${key}`)}
            {key === "submitted" ? <span className="ml-1 font-mono">({waiting})</span> : null}
          </Link>
        ))}
      </nav>
      {items.length === 0 ? (
        <p className="rounded border border-line bg-panel p-4" role="status">
          {filter === "submitted" ? t("signoffs.nothing") : t("signoffs.none", { filter })}
        </p>
      ) : (
        <ol className="flex flex-col gap-4" aria-label={t("signoffs.listLabel", { filter })}>
          {items.map((s) => {
            const own = s.learner.id === viewer.id;
            return (
              <li key={s.id} className="rounded border border-line bg-panel p-4" data-testid="sign-off-item">
                <div className="flex flex-wrap items-start justify-between gap-2">
                  <div>
                    <h2 className="text-xl">{s.learner.name}</h2>
                    <p className="text-sm text-muted">
                      {[s.teamName, admin ? s.organizationName : null].filter(Boolean).join(" · ") || t("noTeam")} · {t("signoffs.sent", { date: day(s.submittedAt) })}
                      {filter === "submitted" ? ` (${waited(s.submittedAt)})` : ""}
                    </p>
                  </div>
                  <SignOffBadge status={s.status} />
                </div>
                <p className="mt-2">
                  <span className="font-bold">{s.skill?.title ?? s.skillId}</span>
                  <span className="text-muted"> — {s.moduleTitle}</span>
                </p>
                {s.skill ? (
                  <details className="mt-2">
                    <summary className="cursor-pointer font-bold text-water">{t("signoffs.observe")}</summary>
                    <ul className="mt-1 list-disc pl-6">
                      {s.skill.observe.map((o) => (
                        <li key={o}>{o}</li>
                      ))}
                    </ul>
                    <p className="mt-1 text-sm">
                      <span className="font-bold">{t("signoffs.evidence")}</span> {s.skill.evidence}
                    </p>
                  </details>
                ) : null}
                {s.note ? (
                  <p className="mt-2 whitespace-pre-line">
                    <span className="font-bold">{t("signoffs.note")}</span> {s.note}
                  </p>
                ) : null}
                <div className="mt-3">
                  <EvidenceThumbs signOffId={s.id} items={s.evidence} />
                </div>
                {s.status !== "submitted" ? (
                  <p className="mt-3 text-sm">
                    {t("signoffs.reviewed", { status: s.status === "approved" ? "approved" : "returned", name: s.reviewerName ?? "—", date: s.reviewedAt ? day(s.reviewedAt) : "—" })}
                    {s.reviewComment ? `: “${s.reviewComment}”` : ""}
                  </p>
                ) : own ? (
                  <p className="mt-3 rounded border border-line bg-paper p-2 text-sm">{t("signoffs.own")}</p>
                ) : (
                  <div className="mt-3 border-t border-line pt-3">
                    <ReviewForm id={s.id} learnerName={s.learner.name} skillTitle={s.skill?.title ?? s.skillId} />
                  </div>
                )}
              </li>
            );
          })}
        </ol>
      )}
    </div>
  );
}
