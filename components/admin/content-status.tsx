"use client";
import useSWR from "swr";
import type { ContentStatus as Status } from "@/lib/admin";
import { getJson } from "@/lib/fetcher";
import { serverFirst } from "@/components/ui/server-first";
import { When } from "@/components/ui/data-table";
import { SyncButton } from "./sync-button";
import { Table } from "@/components/ui/table";

const KINDS = [
  { key: "modules", label: "Modules" },
  { key: "lessons", label: "Lessons" },
  { key: "cards", label: "Code cards" },
  { key: "paths", label: "Learning paths" },
  { key: "questions", label: "Quiz questions" },
] as const;

const KEY = "/api/admin/content";

/** `initial`: the status the server page already loaded (not fetched again on mount; the sync button refreshes it). */
export function ContentStatus({ initial }: { initial?: Status }) {
  const { data, error, isLoading, mutate } = useSWR<Status>(KEY, getJson, serverFirst(KEY, initial && { key: KEY, data: initial }));
  if (error) {
    return (
      <div role="alert" className="flex flex-wrap items-center gap-3 rounded border border-caution bg-caution-light px-3 py-2 text-caution">
        <span>Could not load the content status: {(error as Error).message}</span>
        <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-caution bg-panel px-3 font-bold">
          Try again
        </button>
      </div>
    );
  }
  if (isLoading || !data) return <p className="text-muted">Loading the content status…</p>;
  const repo = data.repository;
  const last = data.lastSync;
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="sync-h" className="flex flex-col gap-3">
        <h2 id="sync-h" className="text-2xl">
          Last sync
        </h2>
        {last ? (
          <p>
            <When iso={last.at} /> —{" "}
            {last.ok ? <span className="font-bold text-pass">finished without problems</span> : <span className="font-bold text-caution">failed: the content had problems, nothing changed</span>}
          </p>
        ) : (
          <p>The catalog has never been synced on this instance.</p>
        )}
        {last && !last.ok && last.problems.length ? (
          <ul className="list-disc pl-6 font-mono text-sm text-caution">
            {last.problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        ) : null}
        <SyncButton onSynced={() => mutate()} />
      </section>

      <section aria-labelledby="counts-h" className="flex flex-col gap-3">
        <h2 id="counts-h" className="text-2xl">
          What is synced
        </h2>
        {!repo.ok ? (
          <div role="alert" className="rounded border border-caution bg-caution-light px-3 py-2 text-caution">
            <p className="font-bold">The content in the repository does not pass validation ({repo.problems.length} problem{repo.problems.length === 1 ? "" : "s"}):</p>
            <ul className="mt-2 list-disc pl-6 font-mono text-sm">
              {repo.problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </div>
        ) : null}
        <Table
          label="Synced content counts"
          caption="Content counts: in the database and in the repository"
          rows={KINDS.map((k) => ({ ...k, db: data.database[k.key], inRepo: repo.ok ? repo.counts[k.key] : null }))}
          rowKey={(r) => r.key}
          columns={[
            { key: "kind", header: "Kind", rowHeader: true, className: "text-left", cell: (r) => r.label },
            { key: "live", header: "In use", headerClassName: "px-3 py-2 text-right align-bottom", className: "text-right font-mono", cell: (r) => r.db.live },
            { key: "retired", header: "Retired", headerClassName: "px-3 py-2 text-right align-bottom", className: "text-right font-mono", cell: (r) => r.db.retired },
            {
              key: "repo",
              header: "In the repository",
              headerClassName: "px-3 py-2 text-right align-bottom",
              className: "text-right font-mono",
              cell: (r) => {
                const differs = r.inRepo !== null && r.inRepo !== r.db.live;
                return (
                  <span className={differs ? "font-bold text-caution" : ""}>
                    {r.inRepo ?? "—"}
                    {differs ? " (not synced yet)" : ""}
                  </span>
                );
              },
            },
          ]}
        />
        <p className="text-sm text-muted">Retired quiz questions count old versions kept so that earlier attempts still show what was asked.</p>
      </section>

      <section aria-labelledby="retired-h" className="flex flex-col gap-3">
        <h2 id="retired-h" className="text-2xl">
          Retired items
        </h2>
        {data.retired.length === 0 ? (
          <p>Nothing is retired: every synced item is still in the content.</p>
        ) : (
          <ul className="flex flex-col gap-1">
            {data.retired.map((r) => (
              <li key={`${r.kind}:${r.slug}:${r.title}`} className="flex flex-wrap gap-x-3">
                <span className="font-mono text-xs uppercase text-muted">{r.kind}</span>
                <span className="font-mono text-sm">{r.slug}</span>
                <span>{r.title}</span>
                <When iso={r.retiredAt} />
              </li>
            ))}
          </ul>
        )}
      </section>

      {data.recentSyncs.length > 1 ? (
        <section aria-labelledby="history-h" className="flex flex-col gap-3">
          <h2 id="history-h" className="text-2xl">
            Recent syncs
          </h2>
          <ol className="flex flex-col gap-1">
            {data.recentSyncs.map((s) => (
              <li key={s.id}>
                <When iso={s.at} /> — {s.ok ? "ok" : <span className="text-caution">failed ({s.problems.length} problems)</span>}
                {s.ok && Object.keys(s.counts).length ? <span className="ml-2 font-mono text-xs text-muted">{Object.entries(s.counts).map(([k, v]) => `${k} ${v}`).join(" · ")}</span> : null}
              </li>
            ))}
          </ol>
        </section>
      ) : null}
    </div>
  );
}
