import type { Metadata } from "next";
import { AssignForm } from "@/components/team/assign-form";
import { OrgPicker } from "@/components/team/org-picker";
import { RemoveAssignment } from "@/components/team/remove-assignment";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { loadCatalog } from "@/lib/content/load";
import { listAssignments } from "@/lib/team/assignments";
import { allOrganizations, pageScope, teamsInScope } from "@/lib/team/scope";
import { InviteeWork } from "@/components/team/invitee-work";
import { listInvitations } from "@/lib/team/invite-admin";

export const metadata: Metadata = { title: "Assign work" };

export default async function AssignPage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/assign");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const catalog = loadCatalog();
  const [teams, assignments, orgs, invites] = await Promise.all([
    scope.orgId ? teamsInScope(scope) : Promise.resolve([]),
    listAssignments(scope),
    viewer.role === "admin" ? allOrganizations() : Promise.resolve([]),
    scope.orgId ? listInvitations(scope.orgId) : Promise.resolve([]),
  ]);
  const invitees = invites
    .filter((i) => i.status === "pending")
    .map((i) => ({ id: i.id, email: i.email, name: i.name, items: i.assignOnAccept ?? [] }));
  return (
    <>
      <PageTitle title="Assign work" lead="Give people or whole teams a module or a learning path with a due date. Learners see it on their own page, soonest first, and get reminders." />
      <TeamNav current="/team/assign" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={orgs} current={scope.orgId} allowAll={false} action="/team/assign" /> : null}
      {scope.orgId ? (
        <AssignForm
          modules={catalog.modules.map((m) => ({ slug: m.slug, title: m.meta.title }))}
          paths={catalog.paths.map((p) => ({ slug: p.slug, title: p.title }))}
          teams={teams.map((t) => ({ id: t.id, name: t.name }))}
          org={adminOrg}
        />
      ) : (
        <p>Choose the organization to assign work in.</p>
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
        <h2 id="current" className="mb-3 text-2xl">Current assignments</h2>
        {assignments.length === 0 ? (
          <p>Nothing assigned yet.</p>
        ) : (
          <div role="region" aria-label="Current assignments" tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr className="border-b border-line bg-paper text-left">
                  <th scope="col" className="px-2 py-2">Due</th>
                  <th scope="col" className="px-2 py-2">Module or path</th>
                  <th scope="col" className="px-2 py-2">Assigned to</th>
                  <th scope="col" className="px-2 py-2"><span className="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody>
                {assignments.map((a) => (
                  <tr key={a.id} className="border-b border-line last:border-0">
                    <td className={`px-2 py-2 font-mono ${a.past ? "font-bold text-caution" : ""}`}>
                      {a.dueAt.slice(0, 10)}
                      {a.past ? " (past)" : ""}
                    </td>
                    <td className="px-2 py-2">
                      {a.title} <span className="text-muted">({a.kind === "path" ? "learning path" : "module"})</span>
                    </td>
                    <td className="px-2 py-2">
                      {a.target} <span className="text-muted">({a.targetType === "team" ? "whole team" : "person"})</span>
                    </td>
                    <td className="px-2 py-2 text-right">
                      <RemoveAssignment id={a.id} label={`${a.title} for ${a.target}`} />
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </>
  );
}
