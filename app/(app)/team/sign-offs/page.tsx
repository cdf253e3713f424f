import type { Metadata } from "next";
import { getLocale } from "next-intl/server";
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

export const metadata: Metadata = { title: "Sign-offs to review" };

const TABS: { key: QueueFilter; label: string }[] = [
  { key: "submitted", label: "Waiting" },
  { key: "approved", label: "Approved" },
  { key: "returned", label: "Returned" },
];

const day = (d: Date) => isoDay(d);
function waited(d: Date): string {
  const days = daysSince(d);
  return days === 0 ? "today" : days === 1 ? "1 day ago" : `${days} days ago`;
}

export default async function TeamSignOffsPage({ searchParams }: { searchParams: Promise<{ status?: string; org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/sign-offs");
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
        title="Sign-offs to review"
        lead={`Practical skills your ${admin ? "organizations'" : "organization's"} people performed in front of an observer. Check the evidence against what the observer must see, then approve it or return it with a comment. The learner is e-mailed either way, and every decision goes into the audit log.`}
      />
      <TeamNav current="/team/sign-offs" org={org} />
      <nav aria-label="Sign-off status" className="flex flex-wrap gap-2">
        {TABS.map((t) => (
          <Link
            key={t.key}
            href={hrefFor(t.key)}
            aria-current={t.key === filter ? "page" : undefined}
            className={`inline-flex min-h-11 items-center rounded border px-3 py-2 text-sm font-bold no-underline sm:text-base ${t.key === filter ? "border-ink bg-ink text-paper" : "border-ink/40 bg-panel text-ink"}`}
          >
            {t.label}
            {t.key === "submitted" ? <span className="ml-1 font-mono">({waiting})</span> : null}
          </Link>
        ))}
      </nav>
      {items.length === 0 ? (
        <p className="rounded border border-line bg-panel p-4" role="status">
          {filter === "submitted" ? "Nothing is waiting for review." : `No ${filter} sign-offs yet.`}
        </p>
      ) : (
        <ol className="flex flex-col gap-4" aria-label={`${TABS.find((t) => t.key === filter)!.label} sign-offs`}>
          {items.map((s) => {
            const own = s.learner.id === viewer.id;
            return (
              <li key={s.id} className="rounded border border-line bg-panel p-4" data-testid="sign-off-item">
                <div className="flex flex-wrap items-start justify-between gap-2">
                  <div>
                    <h2 className="text-xl">{s.learner.name}</h2>
                    <p className="text-sm text-muted">
                      {[s.teamName, admin ? s.organizationName : null].filter(Boolean).join(" · ") || "No team"} · sent {day(s.submittedAt)}
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
                    <summary className="cursor-pointer font-bold text-water">What the observer must see</summary>
                    <ul className="mt-1 list-disc pl-6">
                      {s.skill.observe.map((o) => (
                        <li key={o}>{o}</li>
                      ))}
                    </ul>
                    <p className="mt-1 text-sm">
                      <span className="font-bold">Evidence asked for:</span> {s.skill.evidence}
                    </p>
                  </details>
                ) : null}
                {s.note ? (
                  <p className="mt-2 whitespace-pre-line">
                    <span className="font-bold">Note:</span> {s.note}
                  </p>
                ) : null}
                <div className="mt-3">
                  <EvidenceThumbs signOffId={s.id} items={s.evidence} />
                </div>
                {s.status !== "submitted" ? (
                  <p className="mt-3 text-sm">
                    {s.status === "approved" ? "Approved" : "Returned"} by {s.reviewerName ?? "—"} on {s.reviewedAt ? day(s.reviewedAt) : "—"}
                    {s.reviewComment ? `: “${s.reviewComment}”` : ""}
                  </p>
                ) : own ? (
                  <p className="mt-3 rounded border border-line bg-paper p-2 text-sm">This is your own sign-off: another manager or an admin reviews it.</p>
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
