import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { TeamsManager } from "@/components/team/teams-manager";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { allOrganizations, pageScope } from "@/lib/access";
import { listTeams, managerTwoFactorRequired, orgDefaultLanguage } from "@/lib/team";
import { OrgLanguage } from "@/components/team/org-language";
import { ManagerTwoFactor } from "@/components/team/manager-two-factor";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("team");
  return { title: t("nav.teams") };
}

export default async function TeamsPage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/teams");
  const t = await getTranslations("team");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const teams = scope.orgId ? await listTeams(scope.orgId) : [];
  return (
    <>
      <PageTitle title={t("nav.teams")} lead={t("teams.lead")} />
      <TeamNav current="/team/teams" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={await allOrganizations()} current={scope.orgId} allowAll={false} action="/team/teams" /> : null}
      {scope.orgId ? (
        <>
          <TeamsManager teams={teams.map((x) => ({ id: x.id, name: x.name, archived: x.archivedAt !== null, people: x.people }))} org={adminOrg} />
          <OrgLanguage language={await orgDefaultLanguage(scope.orgId)} org={adminOrg} />
          <ManagerTwoFactor required={await managerTwoFactorRequired(scope.orgId)} org={adminOrg} />
        </>
      ) : (
        <p>{t("teams.chooseOrg")}</p>
      )}
    </>
  );
}
