import "server-only";
// Reads of the board_cell table (db/schema/board.ts, kept by triggers in the same transaction as
// every write to its sources): the facts of a page of people in one query, and the scope-wide
// questions (who has a cell in status X, totals per team) answered in SQL with the status rule of
// ./status.ts written as one CASE expression over a cell's stored facts and "now".
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import type { BoardStatus } from "./schemas";
import { EXPIRING_DAYS, NO_FACTS, type CellFacts } from "./status";

type ModuleInfo = { slug: string };

async function rows<T>(query: SQL): Promise<T[]> {
  const [result] = (await db.execute(query)) as unknown as [T[]];
  return result;
}

const list = (xs: string[]) =>
  sql.join(
    xs.map((x) => sql`${x}`),
    sql`, `,
  );

/**
 * lib/team/status.ts cellStatus as one SQL condition per status over the cell alias `c` (the
 * first-match-wins order written out, NULL-safe). `c.expires_at` is expiryOf, a stored generated
 * column: the latest unrevoked certificate's end, else the completion plus the module's validity.
 */
export function statusIs(status: Exclude<BoardStatus, "not_started">, now: Date): SQL {
  const horizon = new Date(now.getTime() + EXPIRING_DAYS * 86_400_000);
  const notValid = sql`(c.expires_at IS NULL OR c.expires_at <= ${now})`;
  const notOverdue = sql`(c.due_at IS NULL OR c.due_at >= ${now})`;
  const failed = sql`(c.last_graded_at IS NOT NULL AND (c.last_pass_at IS NULL OR c.last_pass_at < c.last_graded_at))`;
  switch (status) {
    case "expiring":
      return sql`(c.expires_at > ${now} AND c.expires_at <= ${horizon})`;
    case "passed":
      return sql`(c.expires_at > ${horizon})`;
    case "overdue":
      return sql`(c.due_at < ${now} AND ${notValid})`;
    case "expired":
      return sql`(c.expires_at <= ${now} AND ${notOverdue})`;
    case "failed":
      return sql`(c.expires_at IS NULL AND ${notOverdue} AND ${failed})`;
    case "in_progress":
      return sql`(c.expires_at IS NULL AND ${notOverdue} AND NOT ${failed} AND (c.lessons_done > 0 OR c.attempts > 0))`;
  }
}

const started = (now: Date) => sql`(${sql.join(
  (["expiring", "passed", "overdue", "expired", "failed", "in_progress"] as const).map((s) => statusIs(s, now)),
  sql` OR `,
)})`;

/** SQL condition on person alias `u`: at least one shown module of theirs stands in `status`. */
export function hasStatusSql(status: BoardStatus, modules: ModuleInfo[], now: Date): SQL {
  const slugs = list(modules.map((m) => m.slug));
  if (status === "not_started") {
    // a module without a cell row is not started: fewer started cells than shown modules
    return sql`(SELECT COUNT(*) FROM board_cell c WHERE c.user_id = u.id AND c.module_slug IN (${slugs}) AND ${started(now)}) < ${modules.length}`;
  }
  return sql`EXISTS (SELECT 1 FROM board_cell c WHERE c.user_id = u.id AND c.module_slug IN (${slugs}) AND ${statusIs(status, now)})`;
}

/**
 * How many people of an organization (optionally one team, "none": no team) have a cell in
 * `status`, counted over the organization's cells through its indexes (the cells carry the
 * person's current organization and team).
 */
export async function countWithStatus(orgId: string, team: string | undefined, status: BoardStatus, modules: ModuleInfo[], now: Date): Promise<number> {
  const slugs = list(modules.map((m) => m.slug));
  const where = sql`c.organization_id = ${orgId} ${team === "none" ? sql`AND c.team_id IS NULL` : team ? sql`AND c.team_id = ${team}` : sql``} AND c.module_slug IN (${slugs})`;
  if (status === "not_started") {
    const [all, done] = await Promise.all([
      rows<{ n: number | string }>(
        sql`SELECT COUNT(*) AS n FROM user u WHERE u.organization_id = ${orgId} ${team === "none" ? sql`AND u.team_id IS NULL` : team ? sql`AND u.team_id = ${team}` : sql``}`,
      ),
      rows<{ n: number | string }>(sql`SELECT COUNT(*) AS n FROM (SELECT c.user_id FROM board_cell c WHERE ${where} AND ${started(now)} GROUP BY c.user_id HAVING COUNT(*) = ${modules.length}) x`),
    ]);
    return Number(all[0]?.n ?? 0) - Number(done[0]?.n ?? 0);
  }
  const [r] = await rows<{ n: number | string }>(sql`SELECT COUNT(DISTINCT c.user_id) AS n FROM board_cell c WHERE ${where} AND ${statusIs(status, now)}`);
  return Number(r?.n ?? 0);
}

type CellRow = {
  user_id: string;
  module_slug: string;
  organization_id: string | null;
  lessons_done: number;
  attempts: number;
  best_score: number | null;
  last_graded_at: Date | null;
  last_pass_at: Date | null;
  completed_at: Date | null;
  certificates: number;
  valid_until: Date | null;
  due_at: Date | null;
};
const date = (v: unknown): Date | null => (v === null || v === undefined ? null : v instanceof Date ? v : new Date(String(v)));

/** The stored facts of the given people (one query), keyed person → module. */
export async function cellFacts(people: { id: string; organizationId: string }[], only?: string): Promise<Map<string, Map<string, CellFacts>>> {
  const out = new Map<string, Map<string, CellFacts>>();
  if (people.length === 0) return out;
  const orgOf = new Map(people.map((p) => [p.id, p.organizationId]));
  const found: CellRow[] = [];
  for (let i = 0; i < people.length; i += 5000) {
    const ids = people.slice(i, i + 5000).map((p) => p.id);
    found.push(
      ...(await rows<CellRow>(sql`
SELECT c.user_id, c.module_slug, c.organization_id, c.lessons_done, c.attempts, c.best_score, c.last_graded_at, c.last_pass_at,
  c.completed_at, c.certificates, c.valid_until, c.due_at
FROM board_cell c WHERE c.user_id IN (${list(ids)}) ${only ? sql`AND c.module_slug = ${only}` : sql``}`)),
    );
  }
  for (const r of found) {
    if (r.organization_id !== orgOf.get(r.user_id)) continue; // read across a move: the trigger rebuilds it
    let m = out.get(r.user_id);
    if (!m) out.set(r.user_id, (m = new Map()));
    m.set(r.module_slug, {
      ...NO_FACTS,
      lessonsDone: Number(r.lessons_done),
      attempts: Number(r.attempts),
      bestScore: r.best_score === null ? null : Number(r.best_score),
      lastGradedAt: date(r.last_graded_at),
      lastPassAt: date(r.last_pass_at),
      completedAt: date(r.completed_at),
      certificates: Number(r.certificates),
      validUntil: date(r.valid_until),
      dueAt: date(r.due_at),
    });
  }
  return out;
}

export type { TeamCounts } from "./board-counts";
import type { TeamCounts } from "./board-counts";

/**
 * The status counts of a group of cells packed in one exact decimal sum: each status its own
 * 12-digit field (a group never holds 10^12 cells), so one SUM per group counts all five.
 */
const FIELD = 10n ** 12n;
const PACKED = { passed: 1n, expiring: FIELD, overdue: FIELD ** 2n, expired: FIELD ** 3n, failed: FIELD ** 4n } as const;

/**
 * lib/team/status.ts cellStatus as one first-match-wins CASE over the cell alias `c`, each status
 * worth its PACKED weight (in progress and not started: 0). The same rule as statusIs, written in
 * precedence order so that every branch tests only what the earlier ones left open.
 */
function packedStatus(now: Date): SQL {
  const horizon = new Date(now.getTime() + EXPIRING_DAYS * 86_400_000);
  const w = (x: bigint) => sql.raw(x.toString());
  return sql`CASE WHEN c.expires_at > ${horizon} THEN ${w(PACKED.passed)}
  WHEN c.expires_at > ${now} THEN ${w(PACKED.expiring)}
  WHEN c.due_at < ${now} THEN ${w(PACKED.overdue)}
  WHEN c.expires_at IS NOT NULL THEN ${w(PACKED.expired)}
  WHEN c.last_graded_at IS NOT NULL AND (c.last_pass_at IS NULL OR c.last_pass_at < c.last_graded_at) THEN ${w(PACKED.failed)}
  ELSE 0 END`;
}

/**
 * A recount from scratch (the team summary reads the stored totals instead, ./board-counts.ts):
 * cells per status, per organization and team, over the scope's people: one index-only scan of
 * board_cell_org_idx (organization, team, module, …) grouped in the index's own order (no
 * temporary table), each cell's status evaluated once; the shown modules are picked per group
 * here rather than per cell in SQL. The index is named so that the plan cannot drift to another
 * index on (organization, team, …) without the module, which needs a temporary table (measured
 * three times slower). `passed` counts every valid cell (passed or expiring).
 */
export async function recountTeamCounts(orgId: string | null, modules: ModuleInfo[], now: Date): Promise<TeamCounts[]> {
  const scope = orgId ? sql`c.organization_id = ${orgId}` : sql`c.organization_id IS NOT NULL`;
  const found = await rows<{ organization_id: string; team_id: string | null; module_slug: string; packed: string }>(sql`
SELECT c.organization_id, c.team_id, c.module_slug, CAST(SUM(${packedStatus(now)}) AS CHAR) AS packed
FROM board_cell c FORCE INDEX (board_cell_org_idx) WHERE ${scope}
GROUP BY c.organization_id, c.team_id, c.module_slug`);
  const shown = new Set(modules.map((m) => m.slug));
  const out = new Map<string, TeamCounts>();
  for (const r of found) {
    if (!shown.has(r.module_slug)) continue;
    const key = `${r.organization_id}/${r.team_id ?? ""}`;
    let t = out.get(key);
    if (!t) out.set(key, (t = { organizationId: String(r.organization_id), teamId: r.team_id ?? null, passed: 0, failed: 0, overdue: 0, expiring: 0, expired: 0 }));
    const packed = BigInt(r.packed);
    const field = (weight: bigint) => Number((packed / weight) % FIELD);
    const expiring = field(PACKED.expiring);
    t.passed += field(PACKED.passed) + expiring;
    t.expiring += expiring;
    t.overdue += field(PACKED.overdue);
    t.expired += field(PACKED.expired);
    t.failed += field(PACKED.failed);
  }
  return [...out.values()];
}

/**
 * Catalog-sync step: a module whose validity changed re-derives its cells' expiry (the generated
 * column follows validity_months); lessons retired by this sync no longer count, so the cells are
 * rebuilt from their sources (rare: a content release that drops lessons).
 */
export async function syncBoardCells(_catalog: unknown, now: Date): Promise<Record<string, never>> {
  await db.execute(sql`UPDATE board_cell c JOIN catalog_module m ON m.slug = c.module_slug SET c.validity_months = m.validity_months WHERE c.validity_months <> m.validity_months`);
  const [r] = await rows<{ n: number | string }>(sql`SELECT COUNT(*) AS n FROM catalog_lesson WHERE retired_at = ${now}`);
  if (Number(r?.n ?? 0) > 0) await db.execute(sql`CALL board_rebuild(NULL, NULL)`);
  return {};
}
