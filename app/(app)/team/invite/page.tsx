import type { Metadata } from "next";
import Link from "next/link";
import { BulkInvite } from "@/components/team/bulk-invite";
import { ActionButton } from "@/components/team/action-button";
import { InviteForm } from "@/components/team/invite-form";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { INVITE_STATUS_LABELS, listInvitations } from "@/lib/team";
import { plural } from "@/lib/plural";
import { ROLE_LABELS, type InviteRole } from "@/lib/team";
import { allOrganizations, pageScope, teamsInScope } from "@/lib/access";
import { BILLING_PATH, seatUsage } from "@/lib/billing";

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
  const [teams, usage, all] = await Promise.all([teamsInScope(scope), seatUsage(scope.orgId), listInvitations(scope.orgId)]);
  const open = all.filter((i) => i.status === "pending" || i.status === "expired");
  const closed = all.filter((i) => i.status !== "pending" && i.status !== "expired").slice(0, 50);
  const q = adminOrg ? `?org=${adminOrg}` : "";
  const used = usage.members + usage.pending;
  return (
    <>
      {head}
      <p className="mb-6 rounded border border-line bg-panel px-3 py-2">
        <strong>{scope.orgName}</strong>: {used} of {usage.seats} seats taken ({plural(usage.members, "member")}, {plural(usage.pending, "open invitation")}).{" "}
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
        <h2 id="open" className="mb-3 text-2xl">Invitations</h2>
        <p className="mb-3 text-sm text-muted">
          An open invitation holds a seat until it is accepted, revoked or expires. Revoke frees the seat at once; Resend mails a new link (the old one stops working).
        </p>
        {open.length === 0 ? <p>No open invitations.</p> : <InviteTable rows={open} actions q={q} />}
        {closed.length ? (
          <details className="mt-4">
            <summary className="cursor-pointer font-bold">Accepted, revoked and replaced ({closed.length})</summary>
            <InviteTable rows={closed} q={q} />
          </details>
        ) : null}
      </section>
    </>
  );
}

type Row = Awaited<ReturnType<typeof listInvitations>>[number];

function InviteTable({ rows, actions, q }: { rows: Row[]; actions?: boolean; q: string }) {
  const day = (d: Date | null) => (d ? d.toISOString().slice(0, 10) : "—");
  return (
    <div role="region" aria-label="Invitations" tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-line bg-paper text-left">
            <th scope="col" className="px-2 py-2">E-mail</th>
            <th scope="col" className="px-2 py-2">Name</th>
            <th scope="col" className="px-2 py-2">Role</th>
            <th scope="col" className="px-2 py-2">Team</th>
            <th scope="col" className="px-2 py-2">Status</th>
            <th scope="col" className="px-2 py-2">Sent</th>
            <th scope="col" className="px-2 py-2">Link expires</th>
            {actions ? <th scope="col" className="px-2 py-2">Actions</th> : null}
          </tr>
        </thead>
        <tbody>
          {rows.map((i) => (
            <tr key={i.id} className="border-b border-line last:border-0">
              <td className="px-2 py-2 break-all">{i.email}</td>
              <td className="px-2 py-2">{i.name ?? ""}</td>
              <td className="px-2 py-2">{ROLE_LABELS[i.role as InviteRole] ?? i.role}</td>
              <td className="px-2 py-2">{i.team ?? "No team"}</td>
              <td className="px-2 py-2">{INVITE_STATUS_LABELS[i.status]}{i.assignOnAccept?.length ? ` · ${plural(i.assignOnAccept.length, "item")} to assign on acceptance` : ""}</td>
              <td className="px-2 py-2 font-mono">{day(i.lastSentAt ?? i.createdAt)}{i.sendCount > 1 ? ` (${plural(i.sendCount, "time")})` : ""}</td>
              <td className="px-2 py-2 font-mono">{day(i.expiresAt)}</td>
              {actions ? (
                <td className="px-2 py-2">
                  <span className="flex flex-wrap gap-2">
                    <ActionButton url={`/api/team/invites/${i.id}/resend${q}`} label="Resend" busyLabel="Sending…" ariaLabel={`Resend the invitation to ${i.email}`} />
                    {i.status === "pending" ? (
                      <ActionButton url={`/api/team/invites/${i.id}/revoke${q}`} label="Revoke" busyLabel="Revoking…" danger ariaLabel={`Revoke the invitation to ${i.email}`} confirm={`Revoke the invitation to ${i.email}? The link stops working and the seat is free at once.`} />
                    ) : null}
                  </span>
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
