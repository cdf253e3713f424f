import type { Metadata } from "next";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { TeamsManager } from "@/components/team/teams-manager";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { allOrganizations, pageScope } from "@/lib/access";
import { listTeams, managerTwoFactorRequired } from "@/lib/team";
import { ManagerTwoFactor } from "@/components/team/manager-two-factor";

export const metadata: Metadata = { title: "Teams" };

export default async function TeamsPage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/teams");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const teams = scope.orgId ? await listTeams(scope.orgId) : [];
  return (
    <>
      <PageTitle title="Teams" lead="Crews, sales offices, design offices: the groups you invite people into, assign work to and filter the board by." />
      <TeamNav current="/team/teams" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={await allOrganizations()} current={scope.orgId} allowAll={false} action="/team/teams" /> : null}
      {scope.orgId ? (
        <>
          <TeamsManager teams={teams.map((t) => ({ id: t.id, name: t.name, archived: t.archivedAt !== null, people: t.people }))} org={adminOrg} />
          <ManagerTwoFactor required={await managerTwoFactorRequired(scope.orgId)} org={adminOrg} />
        </>
      ) : (
        <p>Choose the organization whose teams you want to manage.</p>
      )}
    </>
  );
}
