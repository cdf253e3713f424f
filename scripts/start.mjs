#!/usr/bin/env node
// npm start: dependencies, MariaDB, mail catcher, migrations, demo data, build, serve on
// http://127.0.0.1:3000. Ctrl-C stops everything it started.
import { spawn } from "node:child_process";
import path from "node:path";
import { config, root } from "./lib/config.mjs";
import { SERVICES } from "./lib/services.mjs";
import { ensureDependencies, buildApp, node, tsx } from "./lib/steps.mjs";

ensureDependencies();
const { DEMO_PEOPLE, DEMO_PASSWORD } = await import("./lib/demo-list.mjs");
const cfg = config("dev");
const env = { ...cfg.env, NODE_ENV: "production" };

node("scripts/db.mjs", ["start", "--profile=dev"]);
for (const s of SERVICES) node(s.script, ["start", "--profile=dev"]);
tsx("db/migrate.ts", [], env);
tsx("db/seed.ts", [], env);
buildApp();

const server = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(cfg.appPort)], {
  cwd: root,
  env: { ...process.env, ...env },
  stdio: "inherit",
});

console.log(`
  Riser is running at ${cfg.env.APP_URL}
  Local mail (every message Riser sends): ${cfg.env.APP_URL}/dev/mail

  Demo sign-ins (local use only), password "${DEMO_PASSWORD}":
${DEMO_PEOPLE.map((p) => `    ${p.role.padEnd(8)} ${p.email.padEnd(28)} ${p.name}`).join("\n")}

  Reminder and expiry jobs: npm run jobs:run   (or POST ${cfg.env.APP_URL}/api/jobs/run with header x-jobs-secret)
  Stop with Ctrl-C.
`);

let stopping = false;
async function stopAll(code = 0) {
  if (stopping) return;
  stopping = true;
  server.kill("SIGTERM");
  for (const s of [...SERVICES].reverse()) node(s.script, ["stop", "--profile=dev"]);
  node("scripts/db.mjs", ["stop", "--profile=dev"]);
  process.exit(code);
}
process.on("SIGINT", () => stopAll(0));
process.on("SIGTERM", () => stopAll(0));
server.on("exit", (code) => stopAll(code ?? 0));
