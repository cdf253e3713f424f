"use client";
import { useTranslations } from "next-intl";
import useSWR from "swr";
import type { ContentStatus as Status } from "@/lib/admin";
import { getJson } from "@/lib/fetcher";
import { serverFirst } from "@/components/ui/server-first";
import { When } from "@/components/ui/data-table";
import { SyncButton } from "./sync-button";
import { Table } from "@/components/ui/table";

const KINDS = [
  { key: "modules", label: "modules" },
  { key: "lessons", label: "lessons" },
  { key: "cards", label: "codeCards" },
  { key: "paths", label: "learningPaths" },
  { key: "questions", label: "quizQuestions" },
] as const;

const KEY = "/api/admin/content";

/** `initial`: the status the server page already loaded (not fetched again on mount; the sync button refreshes it). */
export function ContentStatus({ initial }: { initial?: Status }) {
  const t = useTranslations("adminConsole");
  const { data, error, isLoading, mutate } = useSWR<Status>(KEY, getJson, serverFirst(KEY, initial && { key: KEY, data: initial }));
  if (error) {
    return (
      <div role="alert" className="flex flex-wrap items-center gap-3 rounded border border-caution bg-caution-light px-3 py-2 text-caution">
        <span>{t("statusLoadFailed", { message: (error as Error).message })}</span>
        <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-caution bg-panel px-3 font-bold">
          {t("tryAgain")}
        </button>
      </div>
    );
  }
  if (isLoading || !data) return <p className="text-muted">{t("loadingTheContentStatus")}</p>;
  const repo = data.repository;
  const last = data.lastSync;
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="sync-h" className="flex flex-col gap-3">
        <h2 id="sync-h" className="text-2xl">
          {t("lastSync")}
        </h2>
        {last ? (
          <p>
            <When iso={last.at} /> —{" "}
            {last.ok ? <span className="font-bold text-pass">{t("finishedWithoutProblems")}</span> : <span className="font-bold text-caution">{t("failedTheContentHadProblemsNothing")}</span>}
          </p>
        ) : (
          <p>{t("theCatalogHasNeverBeenSynced")}</p>
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
          {t("whatIsSynced")}
        </h2>
        {!repo.ok ? (
          <div role="alert" className="rounded border border-caution bg-caution-light px-3 py-2 text-caution">
            <p className="font-bold">{t("repoInvalid", { count: repo.problems.length })}</p>
            <ul className="mt-2 list-disc pl-6 font-mono text-sm">
              {repo.problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </div>
        ) : null}
        <Table
          label={t("syncedContentCounts")}
          caption={t("contentCountsInTheDatabaseAnd")}
          rows={KINDS.map((k) => ({ ...k, db: data.database[k.key], inRepo: repo.ok ? repo.counts[k.key] : null }))}
          rowKey={(r) => r.key}
          columns={[
            { key: "kind", header: t("kind"), rowHeader: true, className: "text-left", cell: (r) => t(r.label) },
            { key: "live", header: t("inUse"), headerClassName: "px-3 py-2 text-right align-bottom", className: "text-right font-mono", cell: (r) => r.db.live },
            { key: "retired", header: t("retired"), headerClassName: "px-3 py-2 text-right align-bottom", className: "text-right font-mono", cell: (r) => r.db.retired },
            {
              key: "repo",
              header: t("inTheRepository"),
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
        <p className="text-sm text-muted">{t("retiredQuizQuestionsCountOldVersions")}</p>
      </section>

      <section aria-labelledby="retired-h" className="flex flex-col gap-3">
        <h2 id="retired-h" className="text-2xl">
          {t("retiredItems")}
        </h2>
        {data.retired.length === 0 ? (
          <p>{t("nothingIsRetiredEverySyncedItem")}</p>
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
            {t("recentSyncs")}
          </h2>
          <ol className="flex flex-col gap-1">
            {data.recentSyncs.map((s) => (
              <li key={s.id}>
                <When iso={s.at} /> — {s.ok ? t("syncOk") : <span className="text-caution">{t("syncFailed", { count: s.problems.length })}</span>}
                {s.ok && Object.keys(s.counts).length ? <span className="ml-2 font-mono text-xs text-muted">{Object.entries(s.counts).map(([k, v]) => `${k} ${v}`).join(" · ")}</span> : null}
              </li>
            ))}
          </ol>
        </section>
      ) : null}
    </div>
  );
}
