import "server-only";
// The board's summary over a whole scope: totals per team and completions per week (the charts).
import { sql } from "drizzle-orm";
import type { OrgScope } from "@/lib/access";
import { addDays, isoDay } from "@/lib/dates";
import { aggregatedPeople, rows } from "./board";
import { isDone } from "./status";

export type TeamTotal = {
  teamId: string | null;
  team: string;
  orgName: string;
  people: number;
  cells: number;
  passed: number;
  failed: number;
  overdue: number;
  expiring: number;
  expired: number;
};

/**
 * Totals per team over the whole scope (the board's summary and the "by team" chart). Without
 * lesson counts: "in progress" and "not started" are not told apart here.
 */
export async function teamTotals(scope: OrgScope, now = new Date()): Promise<TeamTotal[]> {
  const { list } = await aggregatedPeople(scope, { sort: "team" }, now);
  const orgNames = new Map(
    (await rows<{ id: string; name: string }>(sql`SELECT id, name FROM organization ${scope.orgId ? sql`WHERE id = ${scope.orgId}` : sql``}`)).map((o) => [o.id, o.name]),
  );
  const totals = new Map<string, TeamTotal>();
  for (const { person: p, statuses } of list) {
    const key = `${p.organizationId}/${p.teamId ?? ""}`;
    let t = totals.get(key);
    if (!t) {
      t = { teamId: p.teamId, team: p.team ?? "No team", orgName: orgNames.get(p.organizationId) ?? "", people: 0, cells: 0, passed: 0, failed: 0, overdue: 0, expiring: 0, expired: 0 };
      totals.set(key, t);
    }
    t.people++;
    for (const s of statuses) {
      t.cells++;
      if (isDone(s)) t.passed++;
      if (s === "failed") t.failed++;
      if (s === "overdue") t.overdue++;
      if (s === "expiring") t.expiring++;
      if (s === "expired") t.expired++;
    }
  }
  return [...totals.values()].sort((a, b) => a.orgName.localeCompare(b.orgName) || (a.teamId === null ? 1 : 0) - (b.teamId === null ? 1 : 0) || a.team.localeCompare(b.team));
}

export type WeekPoint = { week: string; completions: number };

/** Module completions per week (weeks start on Monday, UTC) over the last `weeks` weeks. */
export async function completionsPerWeek(scope: OrgScope, weeks = 12, now = new Date()): Promise<WeekPoint[]> {
  const monday = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
  monday.setUTCDate(monday.getUTCDate() - ((monday.getUTCDay() + 6) % 7));
  const start = addDays(monday, -(weeks - 1) * 7);
  const orgFilter = scope.orgId ? sql`u.organization_id = ${scope.orgId}` : sql`u.organization_id IS NOT NULL`;
  const result = await rows<{ wk: unknown; n: number | string }>(sql`
SELECT DATE_FORMAT(DATE_SUB(DATE(c.completed_at), INTERVAL WEEKDAY(c.completed_at) DAY), '%Y-%m-%d') AS wk, COUNT(*) AS n
FROM module_completion c JOIN user u ON u.id = c.user_id
WHERE ${orgFilter} AND u.role <> 'admin' AND c.completed_at >= ${start} AND c.completed_at <= ${now}
GROUP BY wk`);
  const byWeek = new Map(result.map((r) => [String(r.wk), Number(r.n)]));
  const out: WeekPoint[] = [];
  for (let i = 0; i < weeks; i++) {
    const d = isoDay(addDays(start, i * 7));
    out.push({ week: d, completions: byWeek.get(d) ?? 0 });
  }
  return out;
}
