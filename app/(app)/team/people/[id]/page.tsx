import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { PersonSignOffs } from "@/components/signoffs/person-sign-offs";
import { StatusBadge } from "@/components/team/status-badge";
import { PersonControls } from "@/components/team/person-controls";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { assignedWork } from "@/lib/team/assignments";
import { boardModules } from "@/lib/team/board";
import { personForViewer, personHistory } from "@/lib/team/people";
import { ROLE_LABELS, type InviteRole } from "@/lib/team/schemas";
import { teamsInScope } from "@/lib/team/scope";

export const metadata: Metadata = { title: "Person" };

const day = (d: Date | string | null) => (d ? new Date(d).toISOString().slice(0, 10) : "—");

export default async function PersonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const viewer = await requireViewer("manager", `/team/people/${id}`);
  const found = await personForViewer(viewer, id);
  if (found.state === "missing") notFound();
  if (found.state === "forbidden") forbidden();
  const p = found.person;
  const [{ items, cells }, history, teams] = await Promise.all([
    assignedWork(p),
    personHistory(p.id),
    teamsInScope({ orgId: p.organizationId, orgName: p.orgName }),
  ]);
  const modules = boardModules();
  const lessonsByModule = new Map<string, typeof history.lessons>();
  for (const l of history.lessons) lessonsByModule.set(l.module, [...(lessonsByModule.get(l.module) ?? []), l]);
  const org = viewer.role === "admin" ? p.organizationId : null;

  return (
    <>
      <PageTitle title={p.name} lead={`${p.email} · ${ROLE_LABELS[p.role as InviteRole] ?? p.role} · ${p.team ?? "No team"} · ${p.orgName}`} />
      <TeamNav current="/team/people" org={org} />
      <p className="mb-6">
        <Link href={`/team${org ? `?org=${org}` : ""}`}>← Back to the board</Link>
      </p>

      {p.role === "admin" ? null : <PersonControls person={{ id: p.id, name: p.name, teamId: p.teamId, role: p.role }} teams={teams} self={p.id === viewer.id} />}

      <section aria-labelledby="assigned" className="mb-8">
        <h2 id="assigned" className="mb-3 text-2xl">Assigned work</h2>
        {items.length === 0 ? (
          <p>Nothing assigned. <Link href={`/team/assign${org ? `?org=${org}` : ""}`}>Assign a module or a learning path</Link>.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {items.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel px-3 py-2">
                <StatusBadge status={i.status} />
                <span className="font-bold">{i.title}</span>
                <span className="text-sm text-muted">
                  {i.kind === "path" ? `learning path · ${i.modulesDone} of ${i.modules} modules` : "module"} · due <span className="font-mono">{day(i.dueAt)}</span> · {i.via === "team" ? "through the team" : "assigned directly"}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="modules" className="mb-8">
        <h2 id="modules" className="mb-3 text-2xl">Modules</h2>
        <div role="region" aria-label="Modules of this person" tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
          <table className="w-full border-collapse text-sm">
            <thead>
              <tr className="border-b border-line bg-paper text-left">
                <th scope="col" className="px-2 py-2">Module</th>
                <th scope="col" className="px-2 py-2">Status</th>
                <th scope="col" className="px-2 py-2">Lessons</th>
                <th scope="col" className="px-2 py-2">Attempts</th>
                <th scope="col" className="px-2 py-2">Best score</th>
                <th scope="col" className="px-2 py-2">Due</th>
                <th scope="col" className="px-2 py-2">Valid until</th>
              </tr>
            </thead>
            <tbody>
              {modules.map((m) => {
                const c = cells[m.slug];
                return (
                  <tr key={m.slug} className="border-b border-line last:border-0">
                    <th scope="row" className="px-2 py-2 text-left">{m.title}</th>
                    <td className="px-2 py-2">{c ? <StatusBadge status={c.status} /> : null}</td>
                    <td className="px-2 py-2 font-mono">{c ? `${c.lessonsDone}/${c.lessonsTotal}` : ""}</td>
                    <td className="px-2 py-2 font-mono">{c?.attempts ?? 0}</td>
                    <td className="px-2 py-2 font-mono">{c?.bestScore !== null && c?.bestScore !== undefined ? `${c.bestScore}%` : "—"}</td>
                    <td className="px-2 py-2 font-mono">{day(c?.dueAt ?? null)}</td>
                    <td className="px-2 py-2 font-mono">{day(c?.expiresAt ?? null)}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="attempts" className="mb-8">
        <h2 id="attempts" className="mb-3 text-2xl">Quiz attempts</h2>
        {history.attempts.length === 0 ? (
          <p>No quiz attempts yet.</p>
        ) : (
          <div role="region" aria-label="Quiz attempts" tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr className="border-b border-line bg-paper text-left">
                  <th scope="col" className="px-2 py-2">Module</th>
                  <th scope="col" className="px-2 py-2">Started</th>
                  <th scope="col" className="px-2 py-2">Submitted</th>
                  <th scope="col" className="px-2 py-2">Score</th>
                  <th scope="col" className="px-2 py-2">Result</th>
                </tr>
              </thead>
              <tbody>
                {history.attempts.map((a) => (
                  <tr key={a.id} className="border-b border-line last:border-0">
                    <td className="px-2 py-2">{a.title ?? a.module}</td>
                    <td className="px-2 py-2 font-mono">{day(a.startedAt)}</td>
                    <td className="px-2 py-2 font-mono">{day(a.submittedAt)}</td>
                    <td className="px-2 py-2 font-mono">{a.score !== null ? `${a.score}% (pass ${a.passMark}%)` : "—"}</td>
                    <td className="px-2 py-2">{a.status !== "graded" ? "Open" : a.passed ? <strong className="text-pass">Passed</strong> : <strong className="text-caution">Not passed</strong>}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      <section aria-labelledby="lessons" className="mb-8">
        <h2 id="lessons" className="mb-3 text-2xl">Lessons done</h2>
        {history.lessons.length === 0 ? (
          <p>No lessons done yet.</p>
        ) : (
          <ul className="grid gap-3 md:grid-cols-2">
            {[...lessonsByModule.entries()].map(([slug, list]) => (
              <li key={slug} className="rounded border border-line bg-panel p-3">
                <h3 className="mb-1 text-lg">{list[0]!.moduleTitle}</h3>
                <ul className="text-sm">
                  {list.map((l) => (
                    <li key={l.position}>
                      {l.lesson} <span className="font-mono text-muted">{day(l.completedAt)}</span>
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="certs" className="mb-8">
        <h2 id="certs" className="mb-3 text-2xl">Certificates</h2>
        {history.certificates.length === 0 ? (
          <p>No certificates yet.</p>
        ) : (
          <div role="region" aria-label="Certificates" tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr className="border-b border-line bg-paper text-left">
                  <th scope="col" className="px-2 py-2">Serial</th>
                  <th scope="col" className="px-2 py-2">Module or path</th>
                  <th scope="col" className="px-2 py-2">CE hours</th>
                  <th scope="col" className="px-2 py-2">Issued</th>
                  <th scope="col" className="px-2 py-2">Expires</th>
                  <th scope="col" className="px-2 py-2">Status</th>
                </tr>
              </thead>
              <tbody>
                {history.certificates.map((c) => (
                  <tr key={c.id} className="border-b border-line last:border-0">
                    <td className="px-2 py-2 font-mono">
                      <Link href={`/verify/${c.code}`}>{c.serial}</Link>
                    </td>
                    <td className="px-2 py-2">{c.title}</td>
                    <td className="px-2 py-2 font-mono">{Number(c.ceHours)}</td>
                    <td className="px-2 py-2 font-mono">{day(c.issuedAt)}</td>
                    <td className="px-2 py-2 font-mono">{day(c.expiresAt)}</td>
                    <td className="px-2 py-2">{c.status === "valid" ? "Valid" : c.status === "expiring" ? "Valid, expiring soon" : c.status === "expired" ? "Expired" : "Revoked"}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      <div className="mb-8">
        <PersonSignOffs viewer={viewer} personId={p.id} />
      </div>
    </>
  );
}
