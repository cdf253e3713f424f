// Scheduled jobs: `npm run jobs:run` runs every job once; `npm run jobs:run -- certificate-reminders`
// runs the named ones. Run it from cron (e.g. every 15 minutes) on any number of hosts, or let an
// external scheduler POST /api/jobs/run instead: a job already running elsewhere is skipped.
// Add a job: one entry in JOBS in lib/jobs.ts (import lazily, so that the environment is set
// first); POST /api/jobs/run runs the same list.
import { spawnSync } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { JOBS } from "@/lib/jobs";

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, "..");

// Server modules start with `import "server-only"`, which loads only under the react-server
// condition: re-run this script with it when it is missing (plain `tsx scripts/jobs.ts`).
try {
  await import("server-only");
} catch {
  const r = spawnSync(path.join(root, "node_modules/.bin/tsx"), ["--conditions=react-server", fileURLToPath(import.meta.url), ...process.argv.slice(2)], {
    stdio: "inherit",
  });
  process.exit(r.status ?? 1);
}

// Outside the scripts' own profiles (npm start / npm test set everything), fill what is missing from
// the local profile (dev unless --profile= or RISER_PROFILE says otherwise).
if (!process.env.DATABASE_URL) {
  const { config } = (await import(path.join(root, "scripts/lib/config.mjs"))) as { config: (name?: string) => { env: Record<string, string> } };
  const profile = process.argv.find((a) => a.startsWith("--profile="))?.split("=")[1] ?? process.env.RISER_PROFILE ?? "dev";
  for (const [k, v] of Object.entries(config(profile).env)) process.env[k] ??= v;
}

const names = process.argv.slice(2).filter((a) => !a.startsWith("--"));
const unknown = names.filter((n) => !JOBS.some((j) => j.name === n));
if (unknown.length) {
  console.error(`[jobs] unknown job(s): ${unknown.join(", ")}. Known: ${JOBS.map((j) => j.name).join(", ")}`);
  process.exit(2);
}

// the same runner as POST /api/jobs/run: one run per job across all servers, recorded for /admin/jobs
const { runJobs } = await import("@/lib/jobs");
const outcomes = await runJobs(names, "cli");
for (const o of outcomes) {
  const what = o.skipped ? "skipped (another server is running it)" : o.ok ? JSON.stringify(o.result) : `FAILED: ${o.error}`;
  (o.ok ? console.log : console.error)(`[jobs] ${o.name}: ${what} (${o.ms} ms)`);
}
await (await import("@/db/client")).pool.end();
process.exit(outcomes.some((o) => !o.ok) ? 1 : 0);
