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

const STATUS = { running: "running", ok: "finished", error: "failed" } as const;

function seconds(r: JobRunRow): string {
  if (!r.finishedAt) return "—";
  return `${((new Date(r.finishedAt).getTime() - new Date(r.startedAt).getTime()) / 1000).toFixed(1)} s`;
}

const columns: TableColumn<JobRunRow>[] = [
  { key: "job", header: "Job", cell: (r) => <span className="font-mono text-sm">{r.job}</span>, rowHeader: true },
  { key: "started", header: "Started", cell: (r) => <span className="font-mono text-xs whitespace-nowrap">{utcStamp(new Date(r.startedAt))}</span> },
  { key: "took", header: "Took", cell: seconds, className: "text-right tabular-nums" },
  {
    key: "status",
    header: "Result",
    cell: (r) => <span className={r.status === "error" ? "font-bold text-caution" : r.status === "ok" ? "text-pass" : ""}>{STATUS[r.status]}</span>,
  },
  {
    key: "detail",
    header: "Counts or error",
    cell: (r) => <span className="font-mono text-xs break-all">{r.status === "error" ? r.error : r.result === null || r.result === undefined ? "—" : JSON.stringify(r.result)}</span>,
  },
  { key: "where", header: "Where", cell: (r) => <span className="text-sm">{`${r.host} (${r.trigger})`}</span> },
];

/** The latest scheduled-job runs, newest first (server-rendered; the page reloads for news). */
export function JobRuns({ rows }: { rows: JobRunRow[] }) {
  return <Table label="Scheduled job runs, newest first" columns={columns} rows={rows} rowKey={(r) => r.id} density="compact" empty={<p>No job has run on this instance yet.</p>} />;
}
