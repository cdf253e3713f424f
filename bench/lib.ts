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
