"use client";
import { useState, type ReactNode } from "react";
import { useTranslations } from "next-intl";
import useSWR from "swr";
import { getJson } from "@/lib/fetcher";
import type { Paged } from "@/lib/admin/browser";
import { utcStamp } from "@/lib/dates";
import { Table } from "./table";

export type Column<R> = {
  key: string;
  label: string;
  /** the server's sort key; absent = not sortable */
  sort?: string;
  render: (row: R) => ReactNode;
  className?: string;
};

type Sort = { key: string; dir: "asc" | "desc" };

type Props<R, X> = {
  endpoint: string;
  filters: Record<string, string | undefined>;
  columns: Column<R>[];
  rowKey: (row: R) => string;
  initialSort: Sort;
  caption: string;
  /** plural noun for messages: "people", "messages" */
  noun: string;
  emptyText: string;
  pageSize?: number;
  /** extra data of the answer (facets) for the parent */
  onData?: (data: Paged<R> & X) => void;
};

/** The SWR key prefix of a table, for revalidating it after a change: mutate(tableKey("/api/admin/people")). */
export const tableKey = (endpoint: string) => (key: unknown) => typeof key === "string" && key.startsWith(`${endpoint}?`);

function queryString(filters: Record<string, string | undefined>, page: number, pageSize: number, sort: Sort): string {
  const qs = new URLSearchParams();
  for (const [k, v] of Object.entries(filters)) if (v) qs.set(k, v);
  qs.set("page", String(page));
  qs.set("pageSize", String(pageSize));
  qs.set("sort", sort.key);
  qs.set("dir", sort.dir);
  return qs.toString();
}

/** A server-paginated, sortable table fetched with SWR, with loading, empty and error states (markup: ./table). */
export function DataTable<R, X = unknown>({ endpoint, filters, columns, rowKey, initialSort, caption, noun, emptyText, pageSize = 25, onData }: Props<R, X>) {
  const t = useTranslations("ui");
  const [page, setPage] = useState(1);
  const [sort, setSort] = useState<Sort>(initialSort);
  const filterKey = JSON.stringify(filters);
  const [seenFilters, setSeenFilters] = useState(filterKey);
  if (filterKey !== seenFilters) {
    // New filters start again on the first page.
    setSeenFilters(filterKey);
    setPage(1);
  }
  const key = `${endpoint}?${queryString(filters, page, pageSize, sort)}`;
  const { data, error, isLoading, isValidating, mutate } = useSWR<Paged<R> & X>(key, getJson, { keepPreviousData: true, ...(onData ? { onSuccess: onData } : {}) });

  function toggleSort(k: string) {
    setSort((s) => (s.key === k ? { key: k, dir: s.dir === "asc" ? "desc" : "asc" } : { key: k, dir: k === "at" || k === "createdAt" ? "desc" : "asc" }));
    setPage(1);
  }

  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const first = data && data.total ? (data.page - 1) * data.pageSize + 1 : 0;
  const last = data ? Math.min(data.total, data.page * data.pageSize) : 0;

  return (
    <div className="flex flex-col gap-3" aria-busy={isLoading || isValidating}>
      {error ? (
        <div role="alert" className="flex flex-wrap items-center gap-3 rounded border border-caution bg-caution-light px-3 py-2 text-caution">
          <span>
            {t("loadFailed", { noun })} {(error as Error).message}
          </span>
          <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-caution bg-panel px-3 font-bold">
            {t("tryAgain")}
          </button>
        </div>
      ) : null}
      {!data && isLoading ? <p className="text-muted">{t("loading", { noun })}</p> : null}
      {data && data.total === 0 ? <p className="rounded border border-line bg-panel px-3 py-4">{emptyText}</p> : null}
      {data && data.total > 0 ? (
        <>
          <Table
            label={caption}
            rows={data.rows}
            rowKey={rowKey}
            columns={columns.map((c) => {
              const active = c.sort && sort.key === c.sort;
              return {
                key: c.key,
                className: c.className,
                headerClassName: `px-3 py-1 align-middle whitespace-nowrap ${c.className ?? ""}`,
                headerProps: { "aria-sort": active ? (sort.dir === "asc" ? "ascending" : "descending") : undefined },
                cell: c.render,
                header: c.sort ? (
                  <button type="button" onClick={() => toggleSort(c.sort!)} className="inline-flex min-h-11 items-center gap-1 font-bold text-water underline-offset-2 hover:underline">
                    {c.label}
                    <span aria-hidden="true" className="font-mono text-xs">
                      {active ? (sort.dir === "asc" ? "▲" : "▼") : "↕"}
                    </span>
                    <span className="sr-only">{active ? t(sort.dir === "asc" ? "sortedAscending" : "sortedDescending") : t("sortBy")}</span>
                  </button>
                ) : (
                  c.label
                ),
              };
            })}
          />
          <nav aria-label={t("pagesOf", { noun })} className="flex flex-wrap items-center justify-between gap-3 text-sm">
            <p>
              <span className="font-mono">
                {first}–{last}
              </span>{" "}
              {t.rich("pageSummary", { noun, total: data.total, page: data.page, pages, mono: (c) => <span className="font-mono">{c}</span> })}
            </p>
            <div className="flex gap-2">
              <button type="button" disabled={page <= 1} onClick={() => setPage((p) => p - 1)} className="min-h-11 rounded border border-ink/40 bg-panel px-3 disabled:opacity-50">
                {t("previousPage")}
              </button>
              <button type="button" disabled={page >= pages} onClick={() => setPage((p) => p + 1)} className="min-h-11 rounded border border-ink/40 bg-panel px-3 disabled:opacity-50">
                {t("nextPage")}
              </button>
            </div>
          </nav>
        </>
      ) : null}
    </div>
  );
}

/** Date and time in UTC (the same on every screen and in every export), in a monospace for scanning. */
export function When({ iso }: { iso: string | null }) {
  if (!iso) return <span className="text-muted">—</span>;
  const d = new Date(iso);
  return (
    <time dateTime={iso} className="font-mono text-xs whitespace-nowrap" suppressHydrationWarning>
      {utcStamp(d)}
    </time>
  );
}
