import { useTranslations } from "next-intl";
import { Table, type TableColumn } from "@/components/ui/table";
import { utcStamp } from "@/lib/dates";

export type JobRunRow = {
  id: number;
  job: string;
  host: string;
  trigger: string;
  status: "running" | "ok" | "error";
  startedAt: string;
  finishedAt: string | null;
  result: unknown;
  error: string | null;
};


function seconds(r: JobRunRow): string {
  if (!r.finishedAt) return "—";
  return `${((new Date(r.finishedAt).getTime() - new Date(r.startedAt).getTime()) / 1000).toFixed(1)} s`;
}

function columnsFor(t: (key: string) => string): TableColumn<JobRunRow>[] {
  return [
  { key: "job", header: t("jobs.job"), cell: (r) => <span className="font-mono text-sm">{r.job}</span>, rowHeader: true },
  { key: "started", header: t("jobs.started"), cell: (r) => <span className="font-mono text-xs whitespace-nowrap">{utcStamp(new Date(r.startedAt))}</span> },
  { key: "took", header: t("jobs.took"), cell: seconds, className: "text-right tabular-nums" },
  {
    key: "status",
    header: t("jobs.result"),
    cell: (r) => <span className={r.status === "error" ? "font-bold text-caution" : r.status === "ok" ? "text-pass" : ""}>{t(`jobs.status.${r.status}`)}</span>,
  },
  {
    key: "detail",
    header: t("jobs.detail"),
    cell: (r) => <span className="font-mono text-xs break-all">{r.status === "error" ? r.error : r.result === null || r.result === undefined ? "—" : JSON.stringify(r.result)}</span>,
  },
  { key: "where", header: t("jobs.where"), cell: (r) => <span className="text-sm">{`${r.host} (${r.trigger})`}</span> },
  ];
}

/** The latest scheduled-job runs, newest first (server-rendered; the page reloads for news). */
export function JobRuns({ rows }: { rows: JobRunRow[] }) {
  const t = useTranslations("admin");
  return <Table label={t("jobs.label")} columns={columnsFor((key) => t(key))} rows={rows} rowKey={(r) => r.id} density="compact" empty={<p>{t("jobs.none")}</p>} />;
}
