import Link from "next/link";
import { useTranslations } from "next-intl";
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
  const t = useTranslations("team");
  return (
    <Table
      label={t("record.modulesLabel")}
      density="compact"
      rows={modules}
      rowKey={(m) => m.slug}
      columns={[
        { key: "module", header: t("board.module"), rowHeader: true, cell: (m) => m.title },
        { key: "status", header: t("board.status"), cell: (m) => (cells[m.slug] ? <StatusBadge status={cells[m.slug]!.status} /> : null) },
        { key: "lessons", header: t("record.lessons"), className: mono, cell: (m) => (cells[m.slug] ? `${cells[m.slug]!.lessonsDone}/${cells[m.slug]!.lessonsTotal}` : "") },
        { key: "attempts", header: t("record.attempts"), className: mono, cell: (m) => cells[m.slug]?.attempts ?? 0 },
        { key: "best", header: t("record.best"), className: mono, cell: (m) => (cells[m.slug]?.bestScore !== null && cells[m.slug]?.bestScore !== undefined ? `${cells[m.slug]!.bestScore}%` : "—") },
        { key: "due", header: t("assign.dueCol"), className: mono, cell: (m) => day(cells[m.slug]?.dueAt ?? null) },
        { key: "valid", header: t("record.validUntil"), className: mono, cell: (m) => day(cells[m.slug]?.expiresAt ?? null) },
      ]}
    />
  );
}

export function PersonAttempts({ attempts }: { attempts: History["attempts"] }) {
  const t = useTranslations("team");
  return (
    <Table
      label={t("person.attempts")}
      density="compact"
      rows={attempts}
      rowKey={(a) => a.id}
      empty={<p>{t("record.noAttempts")}</p>}
      columns={[
        { key: "module", header: t("board.module"), cell: (a) => a.title ?? a.module },
        { key: "started", header: t("record.started"), className: mono, cell: (a) => day(a.startedAt) },
        { key: "submitted", header: t("record.submitted"), className: mono, cell: (a) => day(a.submittedAt) },
        { key: "score", header: t("record.score"), className: mono, cell: (a) => (a.score !== null ? t("record.scoreValue", { score: a.score, pass: a.passMark }) : "—") },
        {
          key: "result",
          header: t("record.result"),
          cell: (a) => (a.status !== "graded" ? t("record.open") : a.passed ? <strong className="text-pass">{t("status.passed")}</strong> : <strong className="text-caution">{t("record.notPassed")}</strong>),
        },
      ]}
    />
  );
}


export function PersonCertificates({ certificates }: { certificates: History["certificates"] }) {
  const t = useTranslations("team");
  return (
    <Table
      label={t("person.certificates")}
      density="compact"
      rows={certificates}
      rowKey={(c) => c.id}
      empty={<p>{t("record.noCertificates")}</p>}
      columns={[
        { key: "serial", header: t("record.serial"), className: mono, cell: (c) => <Link href={`/verify/${c.code}`}>{c.serial}</Link> },
        { key: "title", header: t("assign.item"), cell: (c) => c.title },
        { key: "hours", header: t("record.ceHours"), className: mono, cell: (c) => Number(c.ceHours) },
        { key: "issued", header: t("record.issued"), className: mono, cell: (c) => day(c.issuedAt) },
        { key: "expires", header: t("record.expires"), className: mono, cell: (c) => day(c.expiresAt) },
        { key: "status", header: t("board.status"), cell: (c) => t(`record.cert.${c.status}`) },
      ]}
    />
  );
}

/** Lessons done, grouped by module. */
export function PersonLessons({ lessons }: { lessons: History["lessons"] }) {
  const t = useTranslations("team");
  if (lessons.length === 0) return <p>{t("record.noLessons")}</p>;
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
                {l.deviceReadingSeconds !== null ? <span className="text-muted">{` · ${t("record.offline", { minutes: Math.round(l.deviceReadingSeconds / 60) })}`}</span> : null}
              </li>
            ))}
          </ul>
        </li>
      ))}
    </ul>
  );
}
