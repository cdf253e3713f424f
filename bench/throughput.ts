// Throughput of the pages people read, 50 connections each, in one run beside the baselines:
// the public home page (rendered per request since scripts carry CSP nonces) and /api/health, measured before and
// after the signed-in paths so that a busy machine moves all of them alike. Signed-in requests
// carry what a browser holds after sign-in: the session cookie and its signed cache copy (renewed
// from the Set-Cookie answers when it expires). Writes bench/results/throughput.json.
import os from "node:os";
import autocannon from "autocannon";
import { eq } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { APP, Jar, record, serverCpuMs, sessionCookie } from "./lib";

const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = 50;

const [learner] = await db.select({ id: user.id }).from(user).where(eq(user.email, demoByRole("learner").email));
const tokenCookie = await sessionCookie(learner!.id);

type Run = { path: string; reqPerSec: number; p50: number; p97_5: number; p99: number; non2xx: number; errors: number; serverCpuMsPerRequest: number | null };

async function load(path: string, signedIn: boolean): Promise<Run> {
  const headers: Record<string, string> = signedIn ? { cookie: (await Jar.signedIn(tokenCookie)).header } : {};
  // a check first: a redirect to the sign-in page would measure the wrong thing
  const probe = await fetch(`${APP}${path}`, { headers, redirect: "manual" });
  await probe.arrayBuffer();
  if (probe.status !== 200) throw new Error(`${path}: ${probe.status}`);
  const cpuBefore = serverCpuMs();
  const r = await autocannon({ url: `${APP}${path}`, connections: CONNECTIONS, duration: SECONDS, headers });
  const cpuAfter = serverCpuMs();
  const served = r.requests.total;
  const serverCpuMsPerRequest = cpuBefore === null || cpuAfter === null || !served ? null : +((cpuAfter - cpuBefore) / served).toFixed(2);
  return { path, reqPerSec: Math.round(r.requests.average), p50: r.latency.p50, p97_5: r.latency.p97_5, p99: r.latency.p99, non2xx: r.non2xx, errors: r.errors, serverCpuMsPerRequest };
}

const lesson = "/modules/freeze-protection/where-homes-freeze";
const runs: Record<string, Run> = {};
runs.homeBefore = await load("/", false);
runs.health = await load("/api/health", false);
runs.lesson = await load(lesson, true);
runs.learn = await load("/learn", true);
runs.modules = await load("/modules", true);
runs.certificates = await load("/certificates", true);
runs.search = await load("/api/search?q=antifreeze", true);
runs.homeAfter = await load("/", false);
await pool.end();

const home = Math.round((runs.homeBefore.reqPerSec + runs.homeAfter.reqPerSec) / 2);
const ratio = (r: Run) => +(r.reqPerSec / home).toFixed(2);
record("throughput", {
  connections: CONNECTIONS,
  seconds: SECONDS,
  machine: { cpus: os.cpus().length, loadavg: os.loadavg().map((l) => +l.toFixed(2)) },
  baseline: { homeReqPerSec: home, healthReqPerSec: runs.health.reqPerSec },
  runs,
  ratios: { lesson: ratio(runs.lesson), learn: ratio(runs.learn), modules: ratio(runs.modules), certificates: ratio(runs.certificates), search: ratio(runs.search), health: ratio(runs.health) },
});
