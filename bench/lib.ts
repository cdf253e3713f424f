// Shared bench helpers: percentiles, result files, and signed session cookies for people created
// directly in the database (so that a benchmark does not spend its time hashing passwords).
import { mkdirSync, writeFileSync } from "node:fs";

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
