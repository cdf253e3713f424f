// Shared bench helpers: percentiles, result files, and signed session cookies for people created
// directly in the database (so that a benchmark does not spend its time hashing passwords).
import { execFileSync } from "node:child_process";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";

export const APP = process.env.APP_URL ?? "http://127.0.0.1:3000";

export function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

export function summary(ms: number[]) {
  const s = [...ms].sort((a, b) => a - b);
  return { n: s.length, p50: +percentile(s, 50).toFixed(3), p95: +percentile(s, 95).toFixed(3), max: +s.at(-1)!.toFixed(3) };
}

export function record(name: string, data: unknown) {
  mkdirSync("bench/results", { recursive: true });
  const out = { name, at: new Date().toISOString(), node: process.version, ...(data as object) };
  writeFileSync(`bench/results/${name}.json`, JSON.stringify(out, null, 2) + "\n");
  console.log(JSON.stringify(out, null, 2));
}

/**
 * CPU time (user + system, ms) the app server process has used so far, read from /proc (Linux); null
 * when scripts/bench.mjs did not pass the server's pid. Divided by the requests served, it gives CPU
 * per request: a figure that a busy machine moves far less than latency, and that bounds what one core
 * can serve (1,000 / ms per request, per second).
 */
const CLK_TCK = (() => {
  try {
    return Number(execFileSync("getconf", ["CLK_TCK"], { encoding: "utf8" }).trim()) || 100;
  } catch {
    return 100;
  }
})();
export function serverCpuMs(): number | null {
  const pid = process.env.BENCH_SERVER_PID;
  if (!pid) return null;
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, "utf8");
    // fields after the command name in parentheses start at field 3; utime and stime are fields 14 and 15
    const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
    return ((Number(f[11]) + Number(f[12])) * 1000) / CLK_TCK;
  } catch {
    return null;
  }
}

/** Runs `work` and returns its result with the server's CPU ms per request (null if unknown). */
export async function withServerCpu<T>(requests: number, work: () => Promise<T>): Promise<T & { serverCpuMsPerRequest: number | null }> {
  const before = serverCpuMs();
  const result = await work();
  const after = serverCpuMs();
  return { ...result, serverCpuMsPerRequest: before === null || after === null || !requests ? null : +((after - before) / requests).toFixed(2) };
}

export { sessionCookieFor as sessionCookie } from "../tests/helpers/fixtures";

/**
 * The cookies one browser holds: the session cookie plus whatever the app sets on its answers (the
 * signed session cache copy, renewed when it expires), so that a bench client sends what a browser
 * would send.
 */
export class Jar {
  private cookies = new Map<string, string>();
  constructor(cookie: string) {
    this.add(cookie.split(/;\s*/));
  }
  private add(pairs: string[]) {
    for (const pair of pairs) {
      const i = pair.indexOf("=");
      if (i <= 0) continue;
      const value = pair.slice(i + 1);
      if (value) this.cookies.set(pair.slice(0, i), value);
      else this.cookies.delete(pair.slice(0, i));
    }
  }
  get header(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }
  update(res: Response): Response {
    this.add(res.headers.getSetCookie().map((c) => (/max-age=0(;|$)/i.test(c) ? `${c.split("=")[0]}=` : c.split(";")[0]!)));
    return res;
  }
  /** What a browser holds after its first signed-in page: asks the app once. */
  static async signedIn(cookie: string): Promise<Jar> {
    const jar = new Jar(cookie);
    // once more on a dropped connection: a kept-alive one may have been closed during a long pause
    const ask = () => fetch(`${APP}/api/auth/get-session`, { headers: { cookie } });
    const r = await ask().catch(ask);
    jar.update(r);
    await r.arrayBuffer();
    return jar;
  }
}
