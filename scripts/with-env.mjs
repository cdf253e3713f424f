#!/usr/bin/env node
// Runs a command with a local profile's environment (dev unless RISER_PROFILE says otherwise):
//   node scripts/with-env.mjs tsx scripts/seed/seed.ts
// Variables already set in the environment win, so a hosted DATABASE_URL is never overridden; and
// when DATABASE_URL is set without RISER_PROFILE (a real instance), no local setting is added at all
// (RISER_LOCAL, the mail catcher and the fakes exist only on local profiles).
import { spawnSync } from "node:child_process";
import path from "node:path";
import { config, root } from "./lib/config.mjs";

const hosted = Boolean(process.env.DATABASE_URL) && !process.env.RISER_PROFILE;
const cfg = hosted ? { env: {} } : config(process.env.RISER_PROFILE || "dev");
const [cmd, ...args] = process.argv.slice(2);
const bin = path.join(root, "node_modules", ".bin", cmd);
const r = spawnSync(bin, args, { stdio: "inherit", cwd: root, env: { ...cfg.env, ...process.env } });
process.exit(r.status ?? 1);
