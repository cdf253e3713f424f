"use client";
// Just over 300 lines: the board table, its filters and its paging share one SWR state; the cell
// details are in ./board-cell.tsx.
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { useTranslations } from "next-intl";
import { useEffect, useMemo, useState } from "react";
import useSWR from "swr";
import { FormError } from "@/components/ui/field";
import { serverFirst } from "@/components/ui/server-first";
import { useDebounced } from "@/components/ui/use-debounced";
import { getJson } from "@/lib/fetcher";
import type { BoardPage } from "@/lib/team";
import type { RichRow } from "@/lib/team";
import { BOARD_STATUSES, type BoardSort, type BoardStatus } from "@/lib/team/browser";
import { isLocale, LANGUAGE_NAMES } from "@/lib/i18n/browser";
import { isoDay } from "@/lib/dates";
import { BoardCellView } from "./board-cell";

export type BoardFilters = { team: string; status: string; module: string; dueBefore: string; q: string; sort: BoardSort; dir: "" | "asc" | "desc"; page: number; pageSize: number };

type Props = {
  modules: { slug: string; title: string }[];
  teams: { id: string; name: string; orgName: string }[];
  org: string | null;
  showOrgNames: boolean;
  initial: BoardFilters;
  /** the page of the board the server already rendered for `initial` (not fetched again on mount) */
  initialPage?: RichPage;
};

const PAGE_SIZES = [10, 25, 50, 100];
/** table column id → the server's sort key */
const SORT_OF: Record<string, BoardSort> = { name: "name", team: "team", passed: "progress", overdue: "overdue", nextDue: "due" };

function queryString(f: BoardFilters, org: string | null, withPage = true): string {
  const p = new URLSearchParams();
  if (org) p.set("org", org);
  for (const k of ["team", "status", "module", "dueBefore", "q", "dir"] as const) if (f[k]) p.set(k, f[k]);
  if (f.sort !== "name") p.set("sort", f.sort);
  if (withPage) {
    if (f.page > 1) p.set("page", String(f.page));
    if (f.pageSize !== 25) p.set("pageSize", String(f.pageSize));
  }
  return p.toString();
}


const col = createColumnHelper<RichRow>();
type RichPage = Omit<BoardPage, "rows"> & { rows: RichRow[] };

export function TeamBoard({ modules, teams, org, showOrgNames, initial, initialPage }: Props) {
  const t = useTranslations("team");
  const [f, setF] = useState<BoardFilters>(initial);
  const [search, setSearch] = useState(initial.q);
  const qs = queryString(f, org);
  const key = `/api/team/board?${qs}`;
  const [first] = useState(() => (initialPage ? { key: `/api/team/board?${queryString(initial, org)}`, data: initialPage } : undefined));
  const { data, error, isLoading, isValidating, mutate } = useSWR<RichPage>(key, getJson, { keepPreviousData: true, revalidateOnFocus: false, ...serverFirst(key, first) });

  // Keep the address in step with the filters, so a view can be bookmarked or shared.
  useEffect(() => {
    const next = qs ? `?${qs}` : window.location.pathname;
    window.history.replaceState(null, "", next);
  }, [qs]);
  // Search as one types, after a pause.
  const settledSearch = useDebounced(search.trim(), 300);
  const [seenSearch, setSeenSearch] = useState(settledSearch);
  if (settledSearch !== seenSearch) {
    setSeenSearch(settledSearch);
    setF((old) => (old.q === settledSearch ? old : { ...old, q: settledSearch, page: 1 }));
  }

  const set = (patch: Partial<BoardFilters>) => setF((old) => ({ ...old, page: 1, ...patch }));
  const shownModules = f.module ? modules.filter((m) => m.slug === f.module) : modules;

  const columns = useMemo(
    () => [
      col.accessor("name", {
        header: t("board.col.person"),
        cell: (c) => (
          <div className="min-w-40">
            <Link href={`/team/people/${c.row.original.id}`} className="font-bold">
              {c.getValue()}
            </Link>
            <div className="text-xs text-muted">{c.row.original.email}</div>
          </div>
        ),
      }),
      col.accessor("team", {
        header: t("invite.team"),
        cell: (c) => {
          const name = c.getValue();
          const orgName = showOrgNames ? teams.find((x) => x.id === c.row.original.teamId)?.orgName : null;
          return <span className="whitespace-nowrap">{name ?? <span className="text-muted">{t("noTeam")}</span>}{orgName ? <span className="block text-xs text-muted">{orgName}</span> : null}</span>;
        },
      }),
      col.accessor("language", {
        header: t("board.col.language"),
        enableSorting: false,
        cell: (c) => {
          const l = c.getValue();
          return isLocale(l) ? (
            <span lang={l} className="whitespace-nowrap" data-testid="person-language">
              {LANGUAGE_NAMES[l]}
            </span>
          ) : null;
        },
      }),
      ...shownModules.map((m) =>
        col.display({
          id: `m:${m.slug}`,
          header: () => <span className="block max-w-28 text-xs leading-tight">{m.title}</span>,
          enableSorting: false,
          cell: (c) => {
            const cell = c.row.original.cells[m.slug];
            if (!cell) return null;
            return <BoardCellView cell={cell} person={c.row.original.name} module={m.title} personId={c.row.original.id} />;
          },
        }),
      ),
      col.accessor("passed", {
        header: t("board.col.passed"),
        cell: (c) => (
          <span className="font-mono">
            {c.getValue()}/{shownModules.length}
          </span>
        ),
      }),
      col.accessor("overdue", { header: t("board.col.overdue"), cell: (c) => <span className={`font-mono ${c.getValue() ? "font-bold text-caution" : ""}`}>{c.getValue()}</span> }),
      col.accessor("nextDue", { header: t("board.col.nextDue"), cell: (c) => (c.getValue() ? <span className="whitespace-nowrap font-mono text-sm">{isoDay(c.getValue())}</span> : <span className="text-muted">—</span>) }),
    ],
    [shownModules, showOrgNames, teams, t],
  );

  const sortColumn = Object.entries(SORT_OF).find(([, v]) => v === f.sort)?.[0] ?? "name";
  const sorting: SortingState = [{ id: sortColumn, desc: f.dir ? f.dir === "desc" : f.sort === "progress" || f.sort === "overdue" }];
  // TanStack Table returns fresh functions each render; the React Compiler skips this component.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: data?.rows ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    manualSorting: true,
    pageCount: data?.pages ?? -1,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      if (!s) return set({ sort: "name", dir: "" });
      set({ sort: SORT_OF[s.id] ?? "name", dir: s.desc ? "desc" : "asc" });
    },
  });

  const filtered = Boolean(f.team || f.status || f.module || f.dueBefore || f.q);
  const exportQs = queryString(f, org, false);
  const from = data && data.total ? (data.page - 1) * data.pageSize + 1 : 0;
  const to = data ? Math.min(data.total, data.page * data.pageSize) : 0;

  return (
    <section aria-labelledby="board-heading" className="mb-10">
      <h2 id="board-heading" className="mb-3 text-2xl">
        {t("board.heading")}
      </h2>
      <form role="search" aria-label={t("board.filterLabel")} className="mb-4 grid grid-cols-1 gap-3 rounded border border-line bg-panel p-3 sm:grid-cols-2 lg:grid-cols-6" onSubmit={(e) => e.preventDefault()}>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="board-team" className="text-sm font-bold">{t("invite.team")}</label>
          <select id="board-team" value={f.team} onChange={(e) => set({ team: e.target.value })} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-2">
            <option value="">{t("board.allTeams")}</option>
            {teams.map((x) => (
              <option key={x.id} value={x.id}>{showOrgNames ? `${x.orgName} · ${x.name}` : x.name}</option>
            ))}
            <option value="none">{t("noTeam")}</option>
          </select>
        </div>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="board-status" className="text-sm font-bold">{t("board.status")}</label>
          <select id="board-status" value={f.status} onChange={(e) => set({ status: e.target.value })} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-2">
            <option value="">{t("board.anyStatus")}</option>
            {BOARD_STATUSES.map((s) => (
              <option key={s} value={s}>{t(`status.${s}`)}</option>
            ))}
          </select>
        </div>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="board-module" className="text-sm font-bold">{t("board.module")}</label>
          <select id="board-module" value={f.module} onChange={(e) => set({ module: e.target.value })} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-2">
            <option value="">{t("board.allModules")}</option>
            {modules.map((m) => (
              <option key={m.slug} value={m.slug}>{m.title}</option>
            ))}
          </select>
        </div>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="board-due" className="text-sm font-bold">{t("board.dueBy")}</label>
          <input id="board-due" type="date" value={f.dueBefore} onChange={(e) => set({ dueBefore: e.target.value })} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-2" />
        </div>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="board-q" className="text-sm font-bold">{t("board.search")}</label>
          <input id="board-q" type="search" value={search} onChange={(e) => setSearch(e.target.value)} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-2" />
        </div>
        <div className="flex items-end">
          <button
            type="button"
            disabled={!filtered}
            onClick={() => {
              setSearch("");
              set({ team: "", status: "", module: "", dueBefore: "", q: "" });
            }}
            className="min-h-11 w-full rounded border border-ink/40 bg-paper px-4 font-bold disabled:opacity-50"
          >
            {t("board.clear")}
          </button>
        </div>
      </form>

      <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
        <p role="status" aria-live="polite" className="text-sm">
          {isLoading && !data ? t("board.loading") : data ? (data.total ? t("board.showing", { from, to, total: data.total }) : t("board.nobody")) : ""}
          {isValidating && data ? <span className="ml-2 text-muted">{t("board.updating")}</span> : null}
        </p>
        <p className="flex flex-wrap gap-4 text-sm">
          <a href={`/api/team/board.csv${exportQs ? `?${exportQs}` : ""}`} download>{t("board.csvView")}</a>
          <a href={`/api/team/certificates.csv${org ? `?org=${encodeURIComponent(org)}` : ""}`} download>{t("board.csvCertificates")}</a>
        </p>
      </div>

      {error ? (
        <div className="mb-4 flex flex-col items-start gap-2">
          <FormError message={t("board.loadFailed", { message: (error as Error).message })} />
          <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-ink/40 bg-panel px-4 font-bold">
            {t("tryAgain")}
          </button>
        </div>
      ) : null}

      {isLoading && !data ? (
        <div aria-hidden="true" className="h-64 animate-pulse rounded border border-line bg-panel" />
      ) : data && data.rows.length === 0 ? (
        <div className="rounded border border-line bg-panel p-6">
          {filtered ? (
            <p>{t("board.noMatch")}</p>
          ) : (
            <p>
              {t.rich("board.empty", { link: (c) => <Link href={`/team/invite${org ? `?org=${encodeURIComponent(org)}` : ""}`}>{c}</Link> })}
            </p>
          )}
        </div>
      ) : data ? (
        <div role="region" aria-label={t("board.tableLabel")} tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
          <table className="w-full min-w-max border-collapse text-sm" aria-busy={isValidating}>
            <caption className="sr-only">{f.status ? t("board.captionStatus", { status: t(`status.${f.status as BoardStatus}`) }) : t("board.caption")}</caption>
            <thead>
              {table.getHeaderGroups().map((hg) => (
                <tr key={hg.id} className="border-b border-line bg-paper">
                  {hg.headers.map((h, i) => {
                    const sortable = h.column.getCanSort() && h.column.id in SORT_OF;
                    const dir = h.column.getIsSorted();
                    return (
                      <th
                        key={h.id}
                        scope="col"
                        aria-sort={dir ? (dir === "asc" ? "ascending" : "descending") : undefined}
                        className={`px-2 py-2 text-left align-bottom ${i === 0 ? "sticky left-0 z-30 bg-paper shadow-[2px_0_0_0_var(--color-line)]" : ""}`}
                      >
                        {sortable ? (
                          <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex min-h-11 items-end gap-1 text-left font-bold underline decoration-dotted underline-offset-4">
                            {flexRender(h.column.columnDef.header, h.getContext())}
                            <span aria-hidden="true">{dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}</span>
                          </button>
                        ) : (
                          flexRender(h.column.columnDef.header, h.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {table.getRowModel().rows.map((r) => (
                <tr key={r.id} className="border-b border-line align-top last:border-0" data-person={r.original.name}>
                  {r.getVisibleCells().map((c, i) => (
                    <td key={c.id} className={`px-2 py-2 ${i === 0 ? "sticky left-0 z-10 bg-panel shadow-[2px_0_0_0_var(--color-line)]" : ""}`}>
                      {flexRender(c.column.columnDef.cell, c.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}

      {data && data.total > 0 ? (
        <nav aria-label={t("board.pagesLabel")} className="mt-3 flex flex-wrap items-center gap-3">
          <button type="button" disabled={data.page <= 1} onClick={() => setF((o) => ({ ...o, page: o.page - 1 }))} className="min-h-11 rounded border border-ink/40 bg-panel px-4 font-bold disabled:opacity-50">
            {t("board.previous")}
          </button>
          <span className="text-sm">
            {t("board.page", { page: data.page, pages: data.pages })}
          </span>
          <button type="button" disabled={data.page >= data.pages} onClick={() => setF((o) => ({ ...o, page: o.page + 1 }))} className="min-h-11 rounded border border-ink/40 bg-panel px-4 font-bold disabled:opacity-50">
            {t("board.next")}
          </button>
          <label htmlFor="board-size" className="ml-auto text-sm font-bold">
            {t("board.perPage")}
          </label>
          <select id="board-size" value={f.pageSize} onChange={(e) => set({ pageSize: Number(e.target.value) })} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-2">
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>{n}</option>
            ))}
          </select>
        </nav>
      ) : null}
    </section>
  );
}
