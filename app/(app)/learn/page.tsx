import type { Metadata } from "next";
import Link from "next/link";
import { getFormatter, getLocale, getTranslations } from "next-intl/server";
import { StatusBadge } from "@/components/team/status-badge";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { certificatesOfHolder } from "@/lib/certificates";
import { localeOf } from "@/lib/i18n/browser";
import { localizedModule, type ContentLocale } from "@/lib/content";
import { lastCompletedLesson } from "@/lib/progress";
import { assignedWork, type AssignedItem } from "@/lib/team";
import type { BoardCell } from "@/lib/team";
import { FirstDayChecklist } from "@/components/team/first-day";
import { firstDayCounts } from "@/lib/team";
import { firstDaySteps, showFirstDay } from "@/lib/team";
import { RefresherCard } from "@/components/refreshers/refresher-card";
import { refreshersOf } from "@/lib/refreshers";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("learn"))("metaTitle") };
}

type T = Awaited<ReturnType<typeof getTranslations<"learn">>>;

/** Where "continue" leads: the lesson after the last one done, else that module's quiz, else the next assigned module. */
function continueTarget(t: T, last: { module: string; lesson: string } | null, items: AssignedItem[], lessonsDone: (m: string) => number, locale: ContentLocale): { href: string; label: string } | null {
  if (last) {
    const mod = localizedModule(last.module, locale);
    if (mod) {
      const i = mod.lessons.findIndex((l) => l.slug === last.lesson);
      const next = mod.lessons[i + 1];
      if (next) return { href: `/modules/${mod.slug}/${next.slug}`, label: `${mod.meta.title}: ${next.meta.title}` };
      if (lessonsDone(mod.slug) >= mod.lessons.length && !items.some((it) => it.kind === "module" && it.slug === mod.slug && (it.status === "passed" || it.status === "expiring"))) {
        return { href: `/modules/${mod.slug}/quiz`, label: t("theQuiz", { module: mod.meta.title }) };
      }
    }
  }
  const open = items.find((it) => it.nextModule && it.status !== "passed" && it.status !== "expiring");
  const mod = open?.nextModule ? localizedModule(open.nextModule, locale) : undefined;
  return mod ? { href: `/modules/${mod.slug}`, label: mod.meta.title } : null;
}

export default async function LearnPage() {
  const viewer = await requireViewer("signed-in", "/learn");
  const [t, format, tag] = await Promise.all([getTranslations("learn"), getFormatter(), getLocale()]);
  const day = (iso: string) => format.dateTime(new Date(iso), { weekday: "short", month: "short", day: "numeric", year: "numeric" });
  const person = viewer.organizationId
    ? { id: viewer.id, name: viewer.name, email: viewer.email, role: viewer.role, teamId: viewer.teamId, team: null, organizationId: viewer.organizationId }
    : null;
  const locale = localeOf(tag);
  const [work, last, certs, refreshers] = await Promise.all([person ? assignedWork(person, new Date(), locale) : Promise.resolve({ items: [] as AssignedItem[], cells: {} as Record<string, BoardCell> }), lastCompletedLesson(viewer.id), certificatesOfHolder(viewer.id, new Date(), locale), refreshersOf(viewer, locale)]);
  const next = continueTarget(t, last, work.items, (m) => work.cells[m]?.lessonsDone ?? 0, locale);
  // A manager whose organization is not set up yet lands on the first-day checklist.
  const counts = viewer.role === "manager" && viewer.organizationId ? await firstDayCounts(viewer.organizationId) : null;
  const firstDay = counts && showFirstDay(viewer.role, counts) ? firstDaySteps(counts) : null;
  const shownCerts = certs.filter((c) => c.status !== "revoked").slice(0, 3);

  return (
    <>
      <PageTitle
        title={t("hello", { name: viewer.name })}
        lead={firstDay ? t("leadFirstDay") : t("lead")}
      />
      {firstDay ? <FirstDayChecklist steps={firstDay} /> : null}

      {refreshers.length ? (
        <section aria-labelledby="refreshers" className="mb-8">
          <h2 id="refreshers" className="mb-1 text-2xl">{t("refresherDue")}</h2>
          <p className="mb-3 text-muted">{t("refresherLead")}</p>
          <ul className="flex flex-col gap-3">
            {refreshers.map((r) => (
              <RefresherCard key={r.module} r={r} />
            ))}
          </ul>
        </section>
      ) : null}

      {next ? (
        <section aria-labelledby="resume" className="mb-8 rounded border border-water/40 bg-water-light p-4">
          <h2 id="resume" className="text-xl">{last ? t("continue") : t("startHere")}</h2>
          <p className="mt-2">
            <Link href={next.href} className="font-bold">
              {next.label} →
            </Link>
          </p>
        </section>
      ) : null}

      <section aria-labelledby="assigned" className="mb-8">
        <h2 id="assigned" className="mb-3 text-2xl">{t("assigned")}</h2>
        {work.items.length === 0 ? (
          <p>{t.rich("nothingAssigned", { link: (c) => <Link href="/modules">{c}</Link> })}</p>
        ) : (
          <ol className="flex flex-col gap-2" aria-label={t("assignedLabel")}>
            {work.items.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 rounded border border-line bg-panel px-3 py-3">
                <StatusBadge status={i.status} />
                <Link href={i.kind === "module" ? `/modules/${i.slug}` : `/modules?path=${i.slug}`} className="font-bold">
                  {i.title}
                </Link>
                <span className="text-sm text-muted">
                  {i.kind === "path" ? t("pathProgress", { done: i.modulesDone, total: i.modules }) : t("module")} · {t("due")} <span className="font-mono">{day(i.dueAt)}</span>
                  {i.via === "team" ? ` · ${t("forTeam")}` : ""}
                </span>
              </li>
            ))}
          </ol>
        )}
      </section>

      <section aria-labelledby="certs" className="mb-8">
        <h2 id="certs" className="mb-3 text-2xl">{t("yourCertificates")}</h2>
        {shownCerts.length === 0 ? (
          <p>{t("noCertificates")}</p>
        ) : (
          <ul className="mb-2 flex flex-col gap-1">
            {shownCerts.map((c) => (
              <li key={c.id}>
                {c.subjectTitle} <span className="text-sm text-muted">· {c.status === "expired" ? t("expired") : c.expiringSoon ? t("expiresSoon") : t("validUntil")} <span className="font-mono">{format.dateTime(new Date(c.expiresAt), "short")}</span></span>
              </li>
            ))}
          </ul>
        )}
        <p>
          <Link href="/certificates">{t("allCertificates")}</Link> · <Link href="/modules">{t("browseModules")}</Link>
        </p>
      </section>
    </>
  );
}
