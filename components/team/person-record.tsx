import Link from "next/link";
import { StatusBadge } from "@/components/team/status-badge";
import { Table } from "@/components/ui/table";
import { isoDay } from "@/lib/dates";
import type { assignedWork } from "@/lib/team";
import type { boardModules } from "@/lib/team";
import type { personHistory } from "@/lib/team";

type History = Awaited<ReturnType<typeof personHistory>>;
type Work = Awaited<ReturnType<typeof assignedWork>>;
type Module = ReturnType<typeof boardModules>[number];

const day = (d: Date | string | null) => isoDay(d, "—");
const mono = "font-mono";

/** One person's modules: status, lessons, attempts, best score, due and valid-until dates. */
export function PersonModules({ modules, cells }: { modules: Module[]; cells: Work["cells"] }) {
  return (
    <Table
      label="Modules of this person"
      density="compact"
      rows={modules}
      rowKey={(m) => m.slug}
      columns={[
        { key: "module", header: "Module", rowHeader: true, cell: (m) => m.title },
        { key: "status", header: "Status", cell: (m) => (cells[m.slug] ? <StatusBadge status={cells[m.slug]!.status} /> : null) },
        { key: "lessons", header: "Lessons", className: mono, cell: (m) => (cells[m.slug] ? `${cells[m.slug]!.lessonsDone}/${cells[m.slug]!.lessonsTotal}` : "") },
        { key: "attempts", header: "Attempts", className: mono, cell: (m) => cells[m.slug]?.attempts ?? 0 },
        { key: "best", header: "Best score", className: mono, cell: (m) => (cells[m.slug]?.bestScore !== null && cells[m.slug]?.bestScore !== undefined ? `${cells[m.slug]!.bestScore}%` : "—") },
        { key: "due", header: "Due", className: mono, cell: (m) => day(cells[m.slug]?.dueAt ?? null) },
        { key: "valid", header: "Valid until", className: mono, cell: (m) => day(cells[m.slug]?.expiresAt ?? null) },
      ]}
    />
  );
}

export function PersonAttempts({ attempts }: { attempts: History["attempts"] }) {
  return (
    <Table
      label="Quiz attempts"
      density="compact"
      rows={attempts}
      rowKey={(a) => a.id}
      empty={<p>No quiz attempts yet.</p>}
      columns={[
        { key: "module", header: "Module", cell: (a) => a.title ?? a.module },
        { key: "started", header: "Started", className: mono, cell: (a) => day(a.startedAt) },
        { key: "submitted", header: "Submitted", className: mono, cell: (a) => day(a.submittedAt) },
        { key: "score", header: "Score", className: mono, cell: (a) => (a.score !== null ? `${a.score}% (pass ${a.passMark}%)` : "—") },
        {
          key: "result",
          header: "Result",
          cell: (a) => (a.status !== "graded" ? "Open" : a.passed ? <strong className="text-pass">Passed</strong> : <strong className="text-caution">Not passed</strong>),
        },
      ]}
    />
  );
}

const CERT_STATUS = { valid: "Valid", expiring: "Valid, expiring soon", expired: "Expired", revoked: "Revoked" } as const;

export function PersonCertificates({ certificates }: { certificates: History["certificates"] }) {
  return (
    <Table
      label="Certificates"
      density="compact"
      rows={certificates}
      rowKey={(c) => c.id}
      empty={<p>No certificates yet.</p>}
      columns={[
        { key: "serial", header: "Serial", className: mono, cell: (c) => <Link href={`/verify/${c.code}`}>{c.serial}</Link> },
        { key: "title", header: "Module or path", cell: (c) => c.title },
        { key: "hours", header: "CE hours", className: mono, cell: (c) => Number(c.ceHours) },
        { key: "issued", header: "Issued", className: mono, cell: (c) => day(c.issuedAt) },
        { key: "expires", header: "Expires", className: mono, cell: (c) => day(c.expiresAt) },
        { key: "status", header: "Status", cell: (c) => CERT_STATUS[c.status] },
      ]}
    />
  );
}

/** Lessons done, grouped by module. */
export function PersonLessons({ lessons }: { lessons: History["lessons"] }) {
  if (lessons.length === 0) return <p>No lessons done yet.</p>;
  const byModule = new Map<string, History["lessons"]>();
  for (const l of lessons) byModule.set(l.module, [...(byModule.get(l.module) ?? []), l]);
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {[...byModule.entries()].map(([slug, list]) => (
        <li key={slug} className="rounded border border-line bg-panel p-3">
          <h3 className="mb-1 text-lg">{list[0]!.moduleTitle}</h3>
          <ul className="text-sm">
            {list.map((l) => (
              <li key={l.position}>
                {l.lesson} <span className="font-mono text-muted">{day(l.completedAt)}</span>
                {l.deviceReadingSeconds !== null ? <span className="text-muted">{` · marked offline, ${Math.round(l.deviceReadingSeconds / 60)} min reported by the phone`}</span> : null}
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ul>
  );
}
