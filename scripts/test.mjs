#!/usr/bin/env node
// npm test: type-check, lint, unit tests, then against the test profile's own MariaDB, mail
// catcher and a production build of the app: integration tests, browser tests, fault tests.
// Stops everything it started, pass or fail.
import path from "node:path";
import { root } from "./lib/config.mjs";
import { ensureDebian, run } from "./lib/proc.mjs";
import { stack } from "./lib/stack.mjs";
import { contentBuild, ensureDependencies } from "./lib/steps.mjs";

const only = process.argv.find((a) => a.startsWith("--only="))?.split("=")[1]?.split(",");
const want = (step) => !only || only.includes(step);
// --files=a,b limits vitest and playwright to those files (for quick local loops); PW_REPEAT=n runs each browser test n times
const files = process.argv.find((a) => a.startsWith("--files="))?.split("=")[1]?.split(",") ?? [];
const bin = (name) => path.join(root, "node_modules", ".bin", name);
const app = stack({
  profile: process.argv.find((a) => a.startsWith("--profile="))?.split("=")[1] ?? "test",
  reset: true,
  stdio: "inherit",
  // the session cookie copy is trusted for 3 s instead of 60 (local instances only, lib/env), so
  // that tests/integration/session-cache.test.ts can prove the bound in seconds
  extraEnv: { SESSION_CACHE_MAX_AGE_S: "3" },
});
const { env } = app;
const t0 = Date.now();
const step = (name) => console.log(`\n=== ${name} (${Math.round((Date.now() - t0) / 1000)} s) ===`);

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
    run(bin("tsc"), ["--noEmit", "-p", "sw/tsconfig.json"], { cwd: root }); // the service worker (webworker types)
    step("lint");
    run("npm", ["run", "--silent", "lint"], { cwd: root });
  }
  if (want("unit")) {
    step("unit tests");
    run(bin("vitest"), ["run", "--project", "unit"], { cwd: root, env });
  }
  if (want("integration") || want("e2e") || want("faults")) {
    step(`services (${app.cfg.name} profile)`);
    app.prepare();
    step("build");
    app.build({ typesChecked: want("static") });
    await app.serve();
    if (want("integration")) {
      step("integration tests");
      run(bin("vitest"), ["run", "--project", "integration", ...files.filter((f) => f.includes("integration/"))], { cwd: root, env });
    }
    if (want("e2e")) {
      step("browser tests");
      run(bin("playwright"), ["test", ...files.filter((f) => f.includes("e2e/")), ...(process.env.PW_REPEAT ? [`--repeat-each=${process.env.PW_REPEAT}`] : [])], { cwd: root, env });
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
  await app.stop();
}
console.log(`\n${failed ? "FAILED" : "ALL TESTS PASSED"} in ${Math.round((Date.now() - t0) / 1000)} s`);
process.exit(failed ? 1 : 0);
