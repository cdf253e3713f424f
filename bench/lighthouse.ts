// Lighthouse 12.2.3 (pinned; runs on Node 20) with Debian's chromium, mobile emulation (its
// default), performance only, signed in as a demo learner: a lesson page, /learn and the
// system-demand calculator, and as a floor the signed-in app shell (/tools). Writes bench/results/lighthouse.json. A page that Lighthouse cannot
// measure is recorded with its error rather than stopping the other benches.
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { APP, Jar, record, sessionCookie } from "./lib";

const PAGES = [
  { path: "/modules/freeze-protection/where-homes-freeze", kind: "lesson" },
  { path: "/learn", kind: "learner" },
  { path: "/tools/system-demand", kind: "calculator" },
  // the floor: the calculators' index, a signed-in page with little more than the app shell
  { path: "/tools", kind: "shell" },
];

// LH_PAGES=calculator,lesson measures only those kinds (for a quick before/after of one change)
const only = process.env.LH_PAGES?.split(",").filter(Boolean);
const measured = only?.length ? PAGES.filter((p) => only.includes(p.kind)) : PAGES;

const [learner] = await db.select({ id: user.id }).from(user).where(eq(user.email, demoByRole("learner").email));
const tokenCookie = await sessionCookie(learner!.id);
await pool.end();
const dir = mkdtempSync(path.join(tmpdir(), "riser-lh-"));
console.log(`Lighthouse reports: ${dir}`);
const chrome = process.env.CHROME_PATH ?? "/usr/bin/chromium";

// LH_RUNS=n (default 3) runs Lighthouse n times per page and records the median of each figure
// (TBT in particular varies a lot from run to run on a shared machine), with every run listed.
const RUNS = Math.max(1, Number(process.env.LH_RUNS ?? 3) || 1);
const median = (xs: number[]) => {
  const s = [...xs].sort((x, y) => x - y);
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2;
};

type Run = { finalUrl: string; performance: number; lcpS: number; tbtMs: number; fcpS: number; cls: number };
async function once(p: (typeof PAGES)[number], i: number): Promise<Run | { error: string }> {
  // a fresh cache copy for each run (it is trusted for 60 s; one Lighthouse run can take longer)
  const headersFile = path.join(dir, "headers.json");
  writeFileSync(headersFile, JSON.stringify({ cookie: (await Jar.signedIn(tokenCookie)).header }));
  const out = path.join(dir, `${p.kind}-${i + 1}.json`);
  const r = spawnSync(
    "npx",
    ["-y", "lighthouse@12.2.3", `${APP}${p.path}`, "--quiet", "--only-categories=performance", "--output=json", `--output-path=${out}`, `--extra-headers=${headersFile}`, "--chrome-flags=--headless=new --no-sandbox --disable-gpu"],
    { env: { ...process.env, CHROME_PATH: chrome }, encoding: "utf8", timeout: 300_000 },
  );
  if (r.status !== 0) return { error: (r.stderr || r.error?.message || `exit ${r.status}`).slice(-400) };
  const lh = JSON.parse(readFileSync(out, "utf8"));
  const a = lh.audits;
  return {
    finalUrl: lh.finalDisplayedUrl,
    performance: Math.round(lh.categories.performance.score * 100),
    lcpS: +(a["largest-contentful-paint"].numericValue / 1000).toFixed(2),
    tbtMs: Math.round(a["total-blocking-time"].numericValue),
    fcpS: +(a["first-contentful-paint"].numericValue / 1000).toFixed(2),
    cls: +a["cumulative-layout-shift"].numericValue.toFixed(3),
  };
}

const pages = [];
for (const p of measured) {
  const runs: Run[] = [];
  let error = "";
  for (let i = 0; i < RUNS; i++) {
    const r = await once(p, i);
    if ("error" in r) error = r.error;
    else runs.push(r);
  }
  if (!runs.length) {
    pages.push({ ...p, error });
    continue;
  }
  pages.push({
    ...p,
    finalUrl: runs[0]!.finalUrl,
    performance: median(runs.map((r) => r.performance)),
    lcpS: median(runs.map((r) => r.lcpS)),
    tbtMs: median(runs.map((r) => r.tbtMs)),
    fcpS: median(runs.map((r) => r.fcpS)),
    cls: median(runs.map((r) => r.cls)),
    runs: runs.map((r) => ({ performance: r.performance, lcpS: r.lcpS, tbtMs: r.tbtMs, fcpS: r.fcpS, cls: r.cls })),
  });
}
record("lighthouse", { lighthouse: "12.2.3", chrome, runsPerPage: RUNS, figures: "median of the runs", formFactor: "mobile (Lighthouse default emulation and throttling)", pages });
