import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { localeOf } from "@/lib/i18n/browser";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { PersonSignOffs } from "@/components/signoffs/person-sign-offs";
import { PersonAttempts, PersonCertificates, PersonLessons, PersonModules } from "@/components/team/person-record";
import { StatusBadge } from "@/components/team/status-badge";
import { PersonControls } from "@/components/team/person-controls";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer, type RecordWindow } from "@/lib/access";
import { assignedWork, boardModules, INVITE_ROLES, personForViewer, personHistory, type InviteRole } from "@/lib/team";
import { isLocale, LANGUAGE_NAMES } from "@/lib/i18n/browser";
import { isoDay } from "@/lib/dates";
import { teamsInScope } from "@/lib/access";
import type { ReactNode } from "react";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("team");
  return { title: t("person.title") };
}

const day = (d: Date | string | null) => isoDay(d, "—");

export default async function PersonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await requireViewer("manager", `/team/people/${id}`);
  const t = await getTranslations("team");
  const found = await personForViewer(viewer, id);
  if (found.state === "missing") notFound();
  if (found.state === "forbidden") forbidden();
  const p = found.person;
  if (found.state === "former") return <FormerMember person={p} window={found.window} />;
  const [{ items, cells }, history, teams] = await Promise.all([
    assignedWork(p, new Date(), localeOf(await getLocale())),
    personHistory(p.id, new Date(), found.window),
    teamsInScope({ orgId: p.organizationId, orgName: p.orgName }),
  ]);
  const modules = boardModules();
  const org = viewer.role === "admin" ? p.organizationId : null;

  return (
    <>
      <PageTitle title={p.name} lead={[p.email, (INVITE_ROLES as readonly string[]).includes(p.role) ? t(`role.${p.role as InviteRole}`) : p.role, p.team ?? t("noTeam"), p.orgName, isLocale(p.language) ? LANGUAGE_NAMES[p.language] : null].filter(Boolean).join(" · ")} />
      <TeamNav current="/team/people" org={org} />
      <p className="mb-6">
        <Link href={`/team${org ? `?org=${org}` : ""}`}>{t("person.back")}</Link>
      </p>

      {p.role === "admin" ? null : <PersonControls person={{ id: p.id, name: p.name, teamId: p.teamId, role: p.role }} teams={teams} self={p.id === viewer.id} />}

      <section aria-labelledby="assigned" className="mb-8">
        <h2 id="assigned" className="mb-3 text-2xl">{t("person.assigned")}</h2>
        {items.length === 0 ? (
          <p>{t.rich("person.nothing", { link: (c) => <Link href={`/team/assign${org ? `?org=${org}` : ""}`}>{c}</Link> })}</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {items.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel px-3 py-2">
                <StatusBadge status={i.status} />
                <span className="font-bold">{i.title}</span>
                <span className="text-sm text-muted">
                  {i.kind === "path" ? t("person.pathProgress", { done: i.modulesDone, total: i.modules }) : t("assign.kindModule")} · {t.rich("person.due", { date: day(i.dueAt), mono: (c) => <span className="font-mono">{c}</span> })} · {i.via === "team" ? t("person.viaTeam") : t("person.direct")}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="modules" className="mb-8">
        <h2 id="modules" className="mb-3 text-2xl">{t("person.modules")}</h2>
        <PersonModules modules={modules} cells={cells} />
      </section>

      <RecordSections history={history}>
        <p className="mb-3 flex flex-wrap gap-3" data-testid="person-training-history">
          <a href={`/api/team/people/${p.id}/training-history?format=pdf`} download>{t("person.historyPdf")}</a>
          <a href={`/api/team/people/${p.id}/training-history?format=csv`} download>{t("person.historyCsv")}</a>
        </p>
      </RecordSections>

      <div className="mb-8">
        <PersonSignOffs viewer={viewer} personId={p.id} />
      </div>
    </>
  );
}

/**
 * A person an admin moved to another organization, seen by a manager of the one they left: read only,
 * the records of the time they were its member (lib/access/records.ts), and no controls.
 */
async function FormerMember({ person, window }: { person: { id: string; name: string }; window: RecordWindow }) {
  const history = await personHistory(person.id, new Date(), window);
  const t = await getTranslations("team");
  return (
    <>
      <PageTitle title={person.name} lead={t("person.former", { date: day(window.until) })} />
      <TeamNav current="/team/people" org={null} />
      <RecordSections history={history} />
    </>
  );
}

/** Attempts, lessons and certificates: the same sections for a member and for a former member. */
async function RecordSections({ history, children }: { history: Awaited<ReturnType<typeof personHistory>>; children?: ReactNode }) {
  const t = await getTranslations("team");
  return (
    <>
      <section aria-labelledby="attempts" className="mb-8">
        <h2 id="attempts" className="mb-3 text-2xl">{t("person.attempts")}</h2>
        <PersonAttempts attempts={history.attempts} />
      </section>

      <section aria-labelledby="lessons" className="mb-8">
        <h2 id="lessons" className="mb-3 text-2xl">{t("person.lessons")}</h2>
        <PersonLessons lessons={history.lessons} />
      </section>

      <section aria-labelledby="certs" className="mb-8">
        <h2 id="certs" className="mb-3 text-2xl">{t("person.certificates")}</h2>
        {children}
        <PersonCertificates certificates={history.certificates} />
      </section>
    </>
  );
}
