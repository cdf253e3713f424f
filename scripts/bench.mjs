#!/usr/bin/env node
// npm run bench [-- name …]: runs the benchmarks in bench/ against a production build on its own
// profile (test-h: own MariaDB, ports and build folder), writes bench/results/<name>.json.
// Figures go in the README's performance section by hand; timings never go in tests.
import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import path from "node:path";
import { config, root } from "./lib/config.mjs";
import { run, sleep } from "./lib/proc.mjs";
import { SERVICES } from "./lib/services.mjs";
import { buildApp, ensureDependencies, node, tsx } from "./lib/steps.mjs";

const ALL = ["search", "lesson-js", "quiz-submit", "certificate-pdf", "team-board"];
const wanted = process.argv.slice(2).filter((a) => !a.startsWith("--"));
const names = (wanted.length ? wanted : ALL).filter((n) => existsSync(path.join(root, "bench", `${n}.ts`)));
const cfg = config("test-h");
const env = { ...process.env, ...cfg.env, NODE_ENV: "production", RISER_PROFILE: cfg.name };

ensureDependencies();
node("scripts/db.mjs", ["reset", `--profile=${cfg.name}`]);
for (const s of SERVICES) node(s.script, ["start", `--profile=${cfg.name}`]);
let server;
try {
  tsx("db/migrate.ts", [], env);
  tsx("db/seed.ts", [], env);
  buildApp({ distDir: cfg.env.NEXT_DIST_DIR });
  server = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(cfg.appPort)], { cwd: root, env, stdio: "ignore" });
  for (let i = 0; i < 300; i++) {
    const up = await fetch(`${cfg.env.APP_URL}/api/health`).then((r) => r.ok).catch(() => false);
    if (up) break;
    await sleep(200);
  }
  for (const n of names) {
    console.log(`\n=== bench: ${n} ===`);
    run(path.join(root, "node_modules/.bin/tsx"), ["--conditions=react-server", `bench/${n}.ts`], { cwd: root, env });
  }
} finally {
  server?.kill("SIGTERM");
  for (const s of [...SERVICES].reverse()) node(s.script, ["stop", `--profile=${cfg.name}`]);
  node("scripts/db.mjs", ["stop", `--profile=${cfg.name}`]);
}
