// Team board at scale, through the API of a running `next start`: 5,000 learners in 20 teams
// (scripts/seed/seed-scale.ts, seeded here when missing) with lessons, attempts, completions and
// certificates across every module. Measures, sequentially after a warm-up:
//   - the board's first page (GET /api/team/board, 25 people, name order)        target p95 ≤ 150 ms
//   - a filtered page (one crew, status "overdue")                               target p95 ≤ 150 ms
//   - an organization-wide status filter ("overdue") and a deep page (150)       target p95 ≤ 150 ms
//   - the team summary (GET /api/team/summary)                                   target p95 ≤ 150 ms
//   - the CSV export of all 5,001 rows (GET /api/team/board.csv)                target < 3 s
// At 50,000 learners the page targets are p95 ≤ 300 ms. The queries are served by board_cell
// (DEVELOPERS.md "Team board: stored cells").
// BENCH_LEARNERS=50000 BENCH_TEAMS=200 seeds that size instead (replacing the 5,000) and writes
// bench/results/team-board-50k.json.
// Run: npm run bench -- team-board (profile test-h), or by hand against a server on any profile:
//   APP_URL=… DATABASE_URL=… node_modules/.bin/tsx --conditions=react-server bench/team-board.ts
// Writes bench/results/team-board.json.
import { spawnSync } from "node:child_process";
import os from "node:os";
import { performance } from "node:perf_hooks";
import { eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { organization, user } from "@/db/schema";
import { SCALE_MANAGER, SCALE_ORG } from "../scripts/seed/seed-scale";
import { APP, record, sessionCookie, summary } from "./lib";

const RUNS = Number(process.env.BENCH_RUNS ?? 100);
const WARMUP = 10;

async function scaleOrg() {
  const [org] = await db.select({ id: organization.id }).from(organization).where(eq(organization.name, SCALE_ORG));
  return org;
}

const WANT = Number(process.env.BENCH_LEARNERS ?? 5000);
const TEAMS = Number(process.env.BENCH_TEAMS ?? 20);
const learnersOf = async (orgId: string) =>
  Number(((await pool.query("SELECT COUNT(*) AS n FROM user WHERE organization_id = ? AND role = 'learner'", [orgId])) as unknown as [{ n: number }[]])[0][0]!.n);
const existing = await scaleOrg();
if (!existing || (await learnersOf(existing.id)) !== WANT) {
  console.log(`[bench] seeding the scale organization, ${WANT} learners in ${TEAMS} teams (scripts/seed/seed-scale.ts) …`);
  const args = ["scripts/seed/seed-scale.ts", `--learners=${WANT}`, `--teams=${TEAMS}`, ...(existing ? ["--replace"] : [])];
  const r = spawnSync("node_modules/.bin/tsx", args, { stdio: "inherit", env: process.env });
  if (r.status !== 0) throw new Error("scale seed failed");
}
const org = (await scaleOrg())!;
const [manager] = await db.select({ id: user.id }).from(user).where(eq(user.email, SCALE_MANAGER.email));
const cookie = await sessionCookie(manager!.id);
const [learners] = (await pool.query("SELECT COUNT(*) AS n FROM user WHERE organization_id = ? AND role = 'learner'", [org.id])) as unknown as [{ n: number }[]];

async function get(path: string): Promise<{ ms: number; status: number; body: string }> {
  const s = performance.now();
  const r = await fetch(`${APP}${path}`, { headers: { cookie, origin: APP } });
  const body = await r.text();
  return { ms: performance.now() - s, status: r.status, body };
}

async function measure(path: string, runs = RUNS) {
  for (let i = 0; i < WARMUP; i++) await get(path);
  const ms: number[] = [];
  let body = "";
  for (let i = 0; i < runs; i++) {
    const r = await get(path);
    if (r.status !== 200) throw new Error(`${path}: ${r.status} ${r.body.slice(0, 200)}`);
    ms.push(r.ms);
    body = r.body;
  }
  const page = JSON.parse(body) as { total: number; rows: unknown[] };
  return { path, total: page.total, rows: page.rows.length, ...summary(ms) };
}

const teams = JSON.parse((await get("/api/team/summary")).body) as { teams: { teamId: string; team: string }[] };
const crew = teams.teams.find((t) => /^Crew 0*7$/.test(t.team))!;

const firstPage = await measure("/api/team/board?page=1&pageSize=25");
const filteredPage = await measure(`/api/team/board?page=1&pageSize=25&team=${crew.teamId}&status=overdue`);
const deepPage = await measure("/api/team/board?page=150&pageSize=25", 30);
const orgWideStatus = await measure("/api/team/board?page=1&pageSize=25&status=overdue", 30);
const summaryRuns: number[] = [];
for (let i = 0; i < 3; i++) await get("/api/team/summary");
for (let i = 0; i < 30; i++) summaryRuns.push((await get("/api/team/summary")).ms);
const teamSummary = summary(summaryRuns);

// Same-run baseline for the summary's counts, in this process against the same database: the
// from-scratch recount (every cell of the organization, the summary's query before stored totals)
// beside the stored totals with their corrections, alternated; both answers must agree.
const { recountTeamCounts } = await import("@/lib/team/board-cells");
const { storedTeamCounts } = await import("@/lib/team/board-counts");
const [moduleRows] = (await pool.query("SELECT slug FROM catalog_module WHERE retired_at IS NULL")) as unknown as [{ slug: string }[]];
const recountMs: number[] = [];
const storedMs: number[] = [];
let countsAgree = true;
const sortCounts = (xs: { teamId: string | null }[]) => JSON.stringify([...xs].sort((a, b) => String(a.teamId).localeCompare(String(b.teamId))));
for (let i = 0; i < 33; i++) {
  const at = new Date();
  let s = performance.now();
  const recounted = await recountTeamCounts(org.id, moduleRows, at);
  const r = performance.now() - s;
  s = performance.now();
  const stored = await storedTeamCounts([org.id], moduleRows, at);
  const t = performance.now() - s;
  if (sortCounts(recounted) !== sortCounts(stored)) countsAgree = false;
  if (i >= 3) {
    recountMs.push(r);
    storedMs.push(t);
  }
}
const countsRecount = summary(recountMs);
const countsStored = summary(storedMs);

const exports: { ms: number; bytes: number; lines: number }[] = [];
for (let i = 0; i < 3; i++) {
  const r = await get("/api/team/board.csv");
  if (r.status !== 200) throw new Error(`export: ${r.status}`);
  exports.push({ ms: +r.ms.toFixed(1), bytes: Buffer.byteLength(r.body), lines: r.body.trim().split("\r\n").length });
}
const exportMs = exports.map((e) => e.ms).sort((a, b) => a - b);

const pageLimit = WANT >= 50_000 ? 300 : 150;
const figures: [string, { p50: number; p95: number }][] = [
  ["first page", firstPage],
  ["one crew, status filter", filteredPage],
  ["organization-wide status filter", orgWideStatus],
  ["deep page", deepPage],
  ["team summary", teamSummary],
];
console.log(`\nteam board, ${Number(learners[0]!.n).toLocaleString("en-US")} learners in ${teams.teams.length} teams (load ${os.loadavg()[0]!.toFixed(1)} on ${os.cpus().length} cores)`);
for (const [what, m] of figures) console.log(`  ${what.padEnd(34)} p50 ${m.p50.toFixed(0).padStart(5)} ms  p95 ${m.p95.toFixed(0).padStart(5)} ms   target p95 ≤ ${pageLimit} ms  ${m.p95 <= pageLimit ? "met" : "NOT met"}`);
console.log(`  summary counts in-process, same run: recount of every cell p50 ${countsRecount.p50.toFixed(0)} / p95 ${countsRecount.p95.toFixed(0)} ms, stored totals p50 ${countsStored.p50.toFixed(0)} / p95 ${countsStored.p95.toFixed(0)} ms, answers equal: ${countsAgree ? "yes" : "NO"}`);
console.log(`  ${"CSV export, all rows".padEnd(34)} median ${(exportMs[1]! / 1000).toFixed(2)} s          target < 3 s           ${exportMs[1]! < 3000 ? "met" : "NOT met"}\n`);

record(WANT >= 50_000 ? "team-board-50k" : "team-board", {
  app: APP,
  machine: { cpus: os.cpus().length, loadavg: os.loadavg().map((l) => +l.toFixed(2)) },
  data: { organization: SCALE_ORG, learners: Number(learners[0]!.n), teams: teams.teams.length, modules: 9 },
  runs: RUNS,
  targets: { boardPageP95Ms: pageLimit, exportMs: 3000 },
  firstPage,
  filteredPage: { ...filteredPage, filter: "team Crew 07 + status overdue" },
  orgWideStatusFilter: { ...orgWideStatus, note: "every person aggregated, then the page is cut" },
  deepPage,
  teamSummary,
  summaryCountsInProcess: { recountOfEveryCell: countsRecount, storedTotals: countsStored, answersEqual: countsAgree },
  export: { runs: exports, medianMs: exportMs[1] },
  met: { ...Object.fromEntries(figures.map(([what, m]) => [what, m.p95 <= pageLimit])), export: exportMs[1]! < 3000 },
});
await pool.end();
