import type { Metadata } from "next";
import Link from "next/link";
import { BulkInvite } from "@/components/team/bulk-invite";
import { InviteForm } from "@/components/team/invite-form";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { openInvitations } from "@/lib/team/invites";
import { ROLE_LABELS, type InviteRole } from "@/lib/team/schemas";
import { allOrganizations, pageScope, teamsInScope } from "@/lib/team/scope";
import { BILLING_PATH, seatUsage } from "@/lib/team/seats";
import { isoDay } from "@/lib/dates";
import { Table } from "@/components/ui/table";

export const metadata: Metadata = { title: "Invite people" };

export default async function InvitePage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/invite");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const head = (
    <>
      <PageTitle title="Invite people" lead="Invite one person, or a whole roster from a CSV file. Each invitation mail carries a single-use link that expires." />
      <TeamNav current="/team/invite" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={await allOrganizations()} current={scope.orgId} allowAll={false} action="/team/invite" /> : null}
    </>
  );
  if (!scope.orgId) {
    return (
      <>
        {head}
        <p>Choose the organization the invitations are for.</p>
      </>
    );
  }
  const [teams, usage, open] = await Promise.all([teamsInScope(scope), seatUsage(scope.orgId), openInvitations(scope.orgId)]);
  const used = usage.members + usage.pending;
  return (
    <>
      {head}
      <p className="mb-6 rounded border border-line bg-panel px-3 py-2">
        <strong>{scope.orgName}</strong>: {used} of {usage.seats} seats taken ({usage.members} members, {usage.pending} open invitations).{" "}
        {used >= usage.seats ? <strong className="text-caution">All seats are taken. </strong> : null}
        <Link href={BILLING_PATH}>Seats and billing</Link>
      </p>
      <div className="grid gap-10">
        <section aria-labelledby="one" className="min-w-0">
          <h2 id="one" className="mb-3 text-2xl">One person</h2>
          <InviteForm teams={teams.map((t) => ({ id: t.id, name: t.name }))} org={adminOrg} />
        </section>
        <section aria-labelledby="bulk" className="min-w-0">
          <h2 id="bulk" className="mb-3 text-2xl">A roster from a CSV file</h2>
          <BulkInvite org={adminOrg} />
        </section>
      </div>
      <section aria-labelledby="open" className="mt-10">
        <h2 id="open" className="mb-3 text-2xl">Open invitations</h2>
        <Table
          label="Open invitations"
          density="compact"
          rows={open}
          rowKey={(i) => i.id}
          empty={<p>No open invitations.</p>}
          columns={[
            { key: "email", header: "E-mail", className: "break-all", cell: (i) => i.email },
            { key: "name", header: "Name", cell: (i) => i.name ?? "" },
            { key: "role", header: "Role", cell: (i) => ROLE_LABELS[i.role as InviteRole] ?? i.role },
            { key: "team", header: "Team", cell: (i) => i.team ?? "No team" },
            { key: "sent", header: "Sent", className: "font-mono", cell: (i) => isoDay(i.createdAt) },
            { key: "expires", header: "Link expires", className: "font-mono", cell: (i) => isoDay(i.expiresAt) },
          ]}
        />
      </section>
    </>
  );
}
