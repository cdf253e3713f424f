#!/usr/bin/env node
// npm run bench [-- name …]: runs the benchmarks in bench/ against a production build on its own
// profile (test-h: own MariaDB, ports and build folder), writes bench/results/<name>.json.
// Then bench/report.ts prints one table (each figure, its target, the same-run baselines and the
// ratio), writes bench/results/summary.md and regenerates the README's performance table.
// Timings never go in tests.
import { existsSync } from "node:fs";
import path from "node:path";
import { root } from "./lib/config.mjs";
import { run } from "./lib/proc.mjs";
import { stack } from "./lib/stack.mjs";
import { ensureDependencies } from "./lib/steps.mjs";

const ALL = ["throughput", "search", "lesson-js", "quiz-submit", "certificate-pdf", "team-board", "lighthouse"];
const wanted = process.argv.slice(2).filter((a) => !a.startsWith("--"));
const names = (wanted.length ? wanted : ALL).filter((n) => existsSync(path.join(root, "bench", `${n}.ts`)));
// --profile=test-x runs on another test profile (default test-h)
const profile = process.argv.find((a) => a.startsWith("--profile="))?.split("=")[1] ?? "test-h";
const app = stack({ profile, reset: true, stdio: "ignore" });

ensureDependencies();
try {
  app.prepare();
  app.build();
  await app.serve();
  for (const n of names) {
    console.log(`\n=== bench: ${n} ===`);
    // the server's pid lets a bench read its CPU time per request (bench/lib.ts serverCpuMs)
    run(path.join(root, "node_modules/.bin/tsx"), ["--conditions=react-server", `bench/${n}.ts`], { cwd: root, env: { ...app.env, BENCH_SERVER_PID: String(app.server?.pid ?? "") } });
  }
  run(path.join(root, "node_modules/.bin/tsx"), ["bench/report.ts"], { cwd: root, env: app.env });
} finally {
  await app.stop();
}
