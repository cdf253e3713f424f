#!/usr/bin/env node
// npm start: dependencies, MariaDB, local services, migrations, demo data, a production build,
// served on http://127.0.0.1:3000.
// npm run dev: the same profile and services, served by `next dev` with hot reload (no build).
// Ctrl-C stops everything it started.
import { ensureDependencies } from "./lib/steps.mjs";
import { stack } from "./lib/stack.mjs";

const dev = process.argv.includes("--dev");
ensureDependencies();
const { DEMO_PEOPLE, DEMO_PASSWORD } = await import("./lib/demo-list.mjs");
const app = stack({ profile: "dev", mode: dev ? "development" : "production" });

let stopping = false;
async function stopAll(code = 0) {
  if (stopping) return;
  stopping = true;
  await app.stop();
  process.exit(code);
}
process.on("SIGINT", () => stopAll(0));
process.on("SIGTERM", () => stopAll(0));

try {
  app.prepare();
  if (!dev) app.build();
  const server = await app.serve();
  server.on("exit", (code) => stopAll(code ?? 0));
} catch (err) {
  console.error(`\n${dev ? "npm run dev" : "npm start"} failed: ${err.message}`);
  await stopAll(1);
}

console.log(`
  Riser is running at ${app.cfg.env.APP_URL}${dev ? " (next dev: edits reload in the browser)" : ""}
  Local mail (every message Riser sends): ${app.cfg.env.APP_URL}/dev/mail

  Demo sign-ins (local use only), password "${DEMO_PASSWORD}":
${DEMO_PEOPLE.map((p) => `    ${p.role.padEnd(8)} ${p.email.padEnd(28)} ${p.name}`).join("\n")}

  Reminder and expiry jobs: npm run jobs:run   (or POST ${app.cfg.env.APP_URL}/api/jobs/run with header x-jobs-secret)
  Stop with Ctrl-C.
`);
