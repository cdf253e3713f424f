import "server-only";
// The board's summary over a whole scope: totals per team and completions per week (the charts).
import { sql } from "drizzle-orm";
import type { OrgScope } from "@/lib/access";
import { addDays, isoDay } from "@/lib/dates";
import { boardModules, rows } from "./board";
import { storedTeamCounts } from "./board-counts";

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
 * Totals per team over the whole scope (the board's summary and the "by team" chart), from the
 * stored totals per team and module (./board-counts.ts: exact at `now`), plus the people per team (counted on
 * user_org_idx alone; team names joined to the groups, not to every person). Without lesson counts:
 * "in progress" and "not started" are not told apart here.
 */
export async function teamTotals(scope: OrgScope, now = new Date()): Promise<TeamTotal[]> {
  const modules = boardModules();
  const orgFilter = scope.orgId ? sql`u.organization_id = ${scope.orgId}` : sql`u.organization_id IS NOT NULL`;
  const orgs = await rows<{ id: string; name: string }>(sql`SELECT id, name FROM organization ${scope.orgId ? sql`WHERE id = ${scope.orgId}` : sql``}`);
  const [people, counts] = await Promise.all([
    rows<{ organization_id: string; team_id: string | null; team_name: string | null; n: number | string }>(sql`
SELECT p.organization_id, p.team_id, t.name AS team_name, p.n
FROM (SELECT u.organization_id, u.team_id, COUNT(*) AS n FROM user u WHERE ${orgFilter} GROUP BY u.organization_id, u.team_id) p
LEFT JOIN team t ON t.id = p.team_id`),
    storedTeamCounts(
      orgs.map((o) => o.id),
      modules,
      now,
    ),
  ]);
  const orgNames = new Map(orgs.map((o) => [o.id, o.name]));
  const countsOf = new Map(counts.map((c) => [`${c.organizationId}/${c.teamId ?? ""}`, c]));
  const totals = people.map((p): TeamTotal => {
    const c = countsOf.get(`${p.organization_id}/${p.team_id ?? ""}`);
    const n = Number(p.n);
    return {
      teamId: p.team_id,
      team: p.team_name ?? "No team",
      orgName: orgNames.get(p.organization_id) ?? "",
      people: n,
      cells: n * modules.length,
      passed: c?.passed ?? 0,
      failed: c?.failed ?? 0,
      overdue: c?.overdue ?? 0,
      expiring: c?.expiring ?? 0,
      expired: c?.expired ?? 0,
    };
  });
  return totals.sort((a, b) => a.orgName.localeCompare(b.orgName) || (a.teamId === null ? 1 : 0) - (b.teamId === null ? 1 : 0) || a.team.localeCompare(b.team));
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
