import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { localeOf } from "@/lib/i18n/browser";
import { AssignForm } from "@/components/team/assign-form";
import { OrgPicker } from "@/components/team/org-picker";
import { RemoveAssignment } from "@/components/team/remove-assignment";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { localizedCatalog } from "@/lib/content";
import { listAssignments } from "@/lib/team";
import { allOrganizations, pageScope, teamsInScope } from "@/lib/access";
import { Table } from "@/components/ui/table";
import { isoDay } from "@/lib/dates";
import { InviteeWork } from "@/components/team/invitee-work";
import { listInvitations } from "@/lib/team";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("team");
  return { title: t("nav.assign") };
}

export default async function AssignPage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/assign");
  const t = await getTranslations("team");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const catalog = localizedCatalog(localeOf(await getLocale()));
  const [teams, assignments, orgs, invites] = await Promise.all([
    scope.orgId ? teamsInScope(scope) : Promise.resolve([]),
    listAssignments(scope, new Date(), localeOf(await getLocale())),
    viewer.role === "admin" ? allOrganizations() : Promise.resolve([]),
    scope.orgId ? listInvitations(scope.orgId) : Promise.resolve([]),
  ]);
  const invitees = invites
    .filter((i) => i.status === "pending")
    .map((i) => ({ id: i.id, email: i.email, name: i.name, items: i.assignOnAccept ?? [] }));
  return (
    <>
      <PageTitle title={t("nav.assign")} lead={t("assign.lead")} />
      <TeamNav current="/team/assign" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={orgs} current={scope.orgId} allowAll={false} action="/team/assign" /> : null}
      {scope.orgId ? (
        <AssignForm
          modules={catalog.modules.map((m) => ({ slug: m.slug, title: m.meta.title }))}
          paths={catalog.paths.map((p) => ({ slug: p.slug, title: p.title }))}
          teams={teams.map((x) => ({ id: x.id, name: x.name }))}
          org={adminOrg}
        />
      ) : (
        <p>{t("assign.chooseOrg")}</p>
      )}
      {scope.orgId ? (
        <InviteeWork
          invitees={invitees}
          modules={catalog.modules.map((m) => ({ slug: m.slug, title: m.meta.title }))}
          paths={catalog.paths.map((p) => ({ slug: p.slug, title: p.title }))}
          org={adminOrg}
        />
      ) : null}
      <section aria-labelledby="current" className="mt-10">
        <h2 id="current" className="mb-3 text-2xl">{t("assign.current")}</h2>
        <Table
          label={t("assign.current")}
          density="compact"
          rows={assignments}
          rowKey={(a) => a.id}
          empty={<p>{t("assign.nothing")}</p>}
          columns={[
            {
              key: "due",
              header: t("assign.dueCol"),
              cell: (a) => (
                <span className={`font-mono ${a.past ? "font-bold text-caution" : ""}`}>
                  {isoDay(a.dueAt)}
                  {a.past ? ` ${t("assign.past")}` : ""}
                </span>
              ),
            },
            { key: "what", header: t("assign.item"), cell: (a) => <>{a.title} <span className="text-muted">({a.kind === "path" ? t("assign.kindPath") : t("assign.kindModule")})</span></> },
            { key: "who", header: t("assign.to"), cell: (a) => <>{a.target} <span className="text-muted">({a.targetType === "team" ? t("assign.wholeTeam") : t("assign.person")})</span></> },
            { key: "actions", header: <span className="sr-only">{t("invitePage.actions")}</span>, className: "text-right", cell: (a) => <RemoveAssignment id={a.id} label={t("assign.forTarget", { title: a.title, target: a.target })} /> },
          ]}
        />
      </section>
    </>
  );
}
