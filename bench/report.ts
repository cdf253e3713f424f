// The one table of `npm run bench`: every figure in bench/results/*.json with its target, the
// same-run baselines (the public home page, rendered per request since scripts carry CSP nonces, and /api/health) and
// the ratio to the home page. Prints it, writes bench/results/summary.md and replaces the table in
// README.md between the bench markers. Run on its own: npx tsx bench/report.ts
import { existsSync, readFileSync, writeFileSync } from "node:fs";

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const read = (name: string): Json | null => (existsSync(`bench/results/${name}.json`) ? JSON.parse(readFileSync(`bench/results/${name}.json`, "utf8")) : null);

const tp = read("throughput");
const home: number | undefined = tp?.baseline.homeReqPerSec;
const health: number | undefined = tp?.baseline.healthReqPerSec;
const ratio = (reqPerSec?: number) => (home && reqPerSec ? `${(reqPerSec / home).toFixed(2)}×` : "—");
const yes = (ok: boolean | undefined) => (ok === undefined ? "—" : ok ? "yes" : "**no**");

type Row = { what: string; figure: string; target: string; met?: boolean; ratio: string };
const rows: Row[] = [];
/** Marks figures that come from an earlier run than the baselines (a bench run for some names only). */
const runAt = (r: Json | null) => (r ? Date.parse(r.at ?? r.date) : NaN);
const older = (r: Json | null) => (tp && r && runAt(tp) - runAt(r) > 3_600_000 ? ` (earlier run, ${String(r.at ?? r.date).slice(0, 10)})` : "");
/** Server CPU per request: what one core can serve at most, whatever else the machine is doing. */
const cpu = (r: Json) => (typeof r.serverCpuMsPerRequest === "number" ? `, server CPU ${r.serverCpuMsPerRequest} ms/request` : "");
const rps = (r: Json) => `${r.reqPerSec} req/s, p50 ${r.p50} ms, p99 ${r.p99} ms${cpu(r)}${r.non2xx ? `, ${r.non2xx} non-2xx` : ""}${r.errors ? `, ${r.errors} unanswered within 10 s` : ""}`;

if (tp) {
  const r = tp.runs;
  rows.push({ what: "public home page (baseline; rendered per request: CSP nonces)", figure: `${home} req/s (before ${r.homeBefore.reqPerSec}, after ${r.homeAfter.reqPerSec})`, target: "—", ratio: "1×" });
  rows.push({ what: "`/api/health` (baseline)", figure: rps(r.health), target: "—", ratio: ratio(r.health.reqPerSec) });
  const paged = (what: string, run: Json, min: number) => rows.push({ what, figure: rps(run), target: `≥ ${min}× home`, met: run.reqPerSec / home! >= min, ratio: ratio(run.reqPerSec) });
  paged("lesson page, signed in", r.lesson, 0.9);
  paged("`/learn`, signed in", r.learn, 0.4);
  paged("`/modules`, signed in", r.modules, 0.4);
  paged("`/certificates`, signed in", r.certificates, 0.4);
  paged("`/api/search?q=antifreeze`, signed in", r.search, 0.8);
}
// SQL statements per request (MariaDB general log; machine load does not move these)
const st = read("statements");
if (st) {
  for (const [what, m] of Object.entries(st.perRequest as Record<string, Json>)) {
    rows.push({ what: `SQL statements per request: ${what}`, figure: `${m.after} (before ${m.before})`, target: "no session read; one statement per data need", met: m.after < m.before, ratio: "—" });
  }
}
const quiz = read("quiz-submit");
if (quiz) {
  const q = (what: string, m: Json) =>
    rows.push({
      what: `${what}, ${quiz.concurrentLearners} concurrent learners, ${quiz.attempts} attempts`,
      figure: `p50 ${m.latencyMs.p50.toFixed(0)} ms, p95 ${m.latencyMs.p95.toFixed(0)} ms, ${m.throughputPerSec}/s${cpu(m)}${m.non2xx ? `, ${m.non2xx} non-2xx` : ""}`,
      target: "p95 ≤ 150 ms",
      met: m.latencyMs.p95 <= 150 && !m.non2xx,
      ratio: ratio(m.throughputPerSec),
    });
  if (quiz.floor) {
    const f = quiz.floor;
    rows.push({
      what: `floor: \`/api/health\` (one \`SELECT 1\`, no session), the same ${quiz.concurrentLearners} workers, ${quiz.attempts} requests`,
      figure: `p50 ${f.latencyMs.p50.toFixed(0)} ms, p95 ${f.latencyMs.p95.toFixed(0)} ms, ${f.throughputPerSec}/s${cpu(f)}`,
      target: "— (baseline)",
      ratio: ratio(f.throughputPerSec),
    });
  }
  if (quiz.saveAnswers) q("save answers", quiz.saveAnswers);
  q("quiz submit (first submit)", quiz);
  if (quiz.integrity) {
    const i = quiz.integrity;
    rows.push({ what: "quiz submit: graded exactly once", figure: `${i.graded} graded, ${i.open} left open, ${i.unmarkedItems} unmarked items`, target: `all ${quiz.attempts} graded`, met: i.graded === quiz.attempts && !i.open && !i.unmarkedItems, ratio: "—" });
  }
}
const tb = read("team-board");
if (tb) {
  const n = `${tb.data.learners.toLocaleString("en-US")} learners in ${tb.data.teams} teams`;
  const lim = tb.targets?.boardPageP95Ms ?? 150;
  const b = (what: string, m: Json) => rows.push({ what: `team board, ${n}: ${what}`, figure: `p50 ${m.p50.toFixed(0)} ms, p95 ${m.p95.toFixed(0)} ms${older(tb)}`, target: `p95 ≤ ${lim} ms`, met: m.p95 <= lim, ratio: "—" });
  b("first page", tb.firstPage);
  b("one crew, status filter", tb.filteredPage);
  b("organization-wide status filter", tb.orgWideStatusFilter);
  b("deep page", tb.deepPage);
  b("team summary", tb.teamSummary);
  rows.push({ what: `team board CSV export, all rows`, figure: `median ${(tb.export.medianMs / 1000).toFixed(2)} s`, target: "< 3 s", met: tb.export.medianMs < 3000, ratio: "—" });
}
for (const big of [read("team-board-50k")].filter(Boolean) as Json[]) {
  const n = `${big.data.learners.toLocaleString("en-US")} learners in ${big.data.teams} teams`;
  for (const [what, m] of [["first page", big.firstPage], ["one crew, status filter", big.filteredPage], ["organization-wide status filter", big.orgWideStatusFilter], ["deep page", big.deepPage], ["team summary", big.teamSummary]] as [string, Json][]) {
    if (m) rows.push({ what: `team board, ${n}: ${what}`, figure: `p50 ${m.p50.toFixed(0)} ms, p95 ${m.p95.toFixed(0)} ms${older(big)}`, target: "p95 ≤ 300 ms", met: m.p95 <= 300, ratio: "—" });
  }
  if (big.export) rows.push({ what: `team board CSV export, ${n}, all rows`, figure: `median ${(big.export.medianMs / 1000).toFixed(2)} s${older(big)}`, target: "< 3 s", met: big.export.medianMs < 3000, ratio: "—" });
}
const js = read("lesson-js");
if (js) {
  for (const [page, m] of Object.entries(js.pages as Record<string, Json>)) {
    rows.push({ what: `first-load JavaScript, \`${page}\``, figure: `${m.gzipKB} kB gzip (${m.kB} kB, ${m.scripts} files)${m.nomoduleGzipKB ? `; legacy nomodule polyfills ${m.nomoduleGzipKB} kB gzip, not loaded by current browsers` : ""}${older(js)}`, target: "≤ 130 kB gzip", met: m.gzipKB <= 130, ratio: "—" });
  }
}
if (js?.floors) {
  const f = js.floors;
  const kb = (m: Json) => `${m.gzipKB} kB gzip (${m.kB} kB, ${m.scripts} files)`;
  rows.push({ what: "floor: first-load JavaScript every page loads (React, React DOM, Next's router, root layout)", figure: kb(f.everyPage) + older(js), target: "— (baseline)", ratio: "—" });
  rows.push({ what: "floor: first-load JavaScript every signed-in page loads (the above and the app shell)", figure: kb(f.signedInShell) + older(js), target: "— (baseline)", ratio: "—" });
  rows.push({ what: `floor: smallest page measured, \`${f.smallestPage.page}\``, figure: kb(f.smallestPage) + older(js), target: "— (baseline)", ratio: "—" });
}
const search = read("search");
if (search) rows.push({ what: "search in-process, typical queries", figure: `p50 ${search.inProcessMs.p50} ms, p95 ${search.inProcessMs.p95} ms`, target: "p95 < 5 ms", met: search.inProcessMs.p95 < 5, ratio: "—" });
const pdf = read("certificate-pdf");
if (pdf?.timeMs) rows.push({ what: "certificate PDF, in-process", figure: `median ${pdf.timeMs.median} ms, p95 ${pdf.timeMs.p95} ms, ${Math.round(pdf.sizeBytes.median / 1024)} kB`, target: "median < 50 ms, < 150 kB", met: pdf.timeMs.median < 50, ratio: "—" });
const lh = read("lighthouse");
if (lh) {
  for (const p of lh.pages as Json[]) {
    const calc = p.kind === "calculator";
    if (p.kind === "shell" && !p.error) {
      rows.push({ what: `Lighthouse mobile, ${p.path} (floor: the signed-in app shell)`, figure: `perf ${p.performance}, LCP ${p.lcpS} s, TBT ${p.tbtMs} ms`, target: "— (baseline)", ratio: "—" });
      continue;
    }
    if (p.error || (p.finalUrl && !String(p.finalUrl).includes(p.path))) {
      rows.push({ what: `Lighthouse mobile, ${p.path}`, figure: p.error ? "not measured (Lighthouse failed; see lighthouse.json)" : `not measured (ended at ${p.finalUrl})`, target: "—", ratio: "—" });
      continue;
    }
    rows.push({
      what: `Lighthouse mobile, ${p.path}`,
      figure: `perf ${p.performance}, LCP ${p.lcpS} s, TBT ${p.tbtMs} ms`,
      target: calc ? "perf ≥ 90, TBT ≤ 200 ms" : "perf ≥ 95, LCP ≤ 2.5 s, TBT ≤ 150 ms",
      met: calc ? p.performance >= 90 && p.tbtMs <= 200 : p.performance >= 95 && p.lcpS <= 2.5 && p.tbtMs <= 150,
      ratio: "—",
    });
  }
}

const when = [tp, quiz, tb, js].filter(Boolean).map((r) => ((r as Json).at ?? (r as Json).date) as string).sort()[0]?.slice(0, 16).replace("T", " ");
const load = tp?.machine?.loadavg ? `, load average ${tp.machine.loadavg.join(" / ")} on ${tp.machine.cpus} cores` : "";
const head = `Same-run baselines: public home page ${home ?? "—"} req/s, \`/api/health\` ${health ?? "—"} req/s (50 connections; measured ${when ?? "—"} UTC on the development machine shared with other work${load}).`;
const table = [
  "| what | measured | target | met | ratio to home page |",
  "| --- | --- | --- | --- | --- |",
  ...rows.map((r) => `| ${r.what} | ${r.figure} | ${r.target} | ${yes(r.met)} | ${r.ratio} |`),
].join("\n");
const md = `${head}\n\n${table}\n`;
console.log(`\n${md}`);
writeFileSync("bench/results/summary.md", md);

const readme = readFileSync("README.md", "utf8");
const START = "<!-- bench:start (npm run bench writes this table) -->";
const END = "<!-- bench:end -->";
const a = readme.indexOf(START);
const b = readme.indexOf(END);
if (a >= 0 && b > a) writeFileSync("README.md", `${readme.slice(0, a + START.length)}\n${md}${readme.slice(b)}`);
else console.log("README.md has no bench markers; the table was not copied there.");
