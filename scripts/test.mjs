#!/usr/bin/env node
// npm test: type-check, lint, unit tests, then against the test profile's own MariaDB, mail
// catcher and a production build of the app: integration tests, browser tests, fault tests.
// Stops everything it started, pass or fail.
import { spawn } from "node:child_process";
import path from "node:path";
import { config, root } from "./lib/config.mjs";
import { ensureDebian, run, sleep } from "./lib/proc.mjs";
import { SERVICES } from "./lib/services.mjs";
import { buildApp, contentBuild, ensureDependencies, node, tsx } from "./lib/steps.mjs";

const only = process.argv.find((a) => a.startsWith("--only="))?.split("=")[1]?.split(",");
const want = (step) => !only || only.includes(step);
// --files=a,b limits vitest and playwright to those files (for quick local loops)
const files = process.argv.find((a) => a.startsWith("--files="))?.split("=")[1]?.split(",") ?? [];
const bin = (name) => path.join(root, "node_modules", ".bin", name);
const cfg = config(process.argv.find((a) => a.startsWith("--profile="))?.split("=")[1] ?? "test");
const env = { ...process.env, ...cfg.env, NODE_ENV: "production", RISER_PROFILE: cfg.name };
const t0 = Date.now();
const step = (name) => console.log(`\n=== ${name} (${Math.round((Date.now() - t0) / 1000)} s) ===`);

let server = null;
async function stopAll() {
  if (server && server.exitCode === null) {
    // Next closes gracefully on SIGTERM but may wait on open connections: give it 5 s.
    const exited = new Promise((r) => server.once("exit", r));
    server.kill("SIGTERM");
    const timer = setTimeout(() => server.kill("SIGKILL"), 5000);
    await exited;
    clearTimeout(timer);
  }
  try {
    for (const s of [...SERVICES].reverse()) node(s.script, ["stop", `--profile=${cfg.name}`]);
    node("scripts/db.mjs", ["stop", `--profile=${cfg.name}`]);
  } catch (err) {
    console.error(err.message);
  }
}

async function waitForApp() {
  for (let i = 0; i < 300; i++) {
    try {
      const r = await fetch(`${cfg.env.APP_URL}/api/health`);
      if (r.status === 200) return;
    } catch {
      /* not up yet */
    }
    await sleep(200);
  }
  throw new Error("the app did not answer /api/health within 60 s");
}

let failed = false;
try {
  step("dependencies");
  ensureDependencies();
  ensureDebian(["chromium"], ["chromium"], "Browser tests need Chromium");
  ensureDebian(["pdftotext", "pdftoppm"], ["poppler-utils"], "Certificate tests read PDFs");

  step("content");
  contentBuild();
  if (want("static")) {
    step("type-check");
    run(bin("tsc"), ["--noEmit"], { cwd: root });
    step("lint");
    run(bin("eslint"), [".", "--max-warnings=0"], { cwd: root });
  }
  if (want("unit")) {
    step("unit tests");
    run(bin("vitest"), ["run", "--project", "unit"], { cwd: root, env });
  }
  if (want("integration") || want("e2e") || want("faults")) {
    step("services (test profile)");
    node("scripts/db.mjs", ["reset", `--profile=${cfg.name}`]);
    for (const s of SERVICES) node(s.script, ["start", `--profile=${cfg.name}`]);
    tsx("db/migrate.ts", [], env);
    tsx("db/seed.ts", [], env);
    step("build");
    buildApp({ distDir: cfg.env.NEXT_DIST_DIR });
    server = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(cfg.appPort)], {
      cwd: root,
      env,
      stdio: ["ignore", "inherit", "inherit"],
    });
    await waitForApp();
    if (want("integration")) {
      step("integration tests");
      run(bin("vitest"), ["run", "--project", "integration", ...files.filter((f) => f.includes("integration/"))], { cwd: root, env });
    }
    if (want("e2e")) {
      step("browser tests");
      run(bin("playwright"), ["test", ...files.filter((f) => f.includes("e2e/"))], { cwd: root, env });
    }
    if (want("faults")) {
      step("fault tests (stops and restarts the test database)");
      run(bin("vitest"), ["run", "--project", "faults"], { cwd: root, env });
    }
  }
} catch (err) {
  failed = true;
  console.error(`\nnpm test failed: ${err.message}`);
} finally {
  await stopAll();
}
console.log(`\n${failed ? "FAILED" : "ALL TESTS PASSED"} in ${Math.round((Date.now() - t0) / 1000)} s`);
process.exit(failed ? 1 : 0);
