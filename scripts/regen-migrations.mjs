#!/usr/bin/env node
// Regenerates db/migrations from db/schema (one lock at a time, for parallel work before the first
// release). After a release, add migrations with `npm run db:generate` instead; never rewrite them.
import { mkdirSync, rmSync } from "node:fs";
import path from "node:path";
import { root } from "./lib/config.mjs";
import { run, sleep } from "./lib/proc.mjs";

const lock = path.join(root, ".data", "migrations.lock");
mkdirSync(path.dirname(lock), { recursive: true });
for (let i = 0; ; i++) {
  try {
    mkdirSync(lock);
    break;
  } catch {
    if (i > 300) throw new Error(`could not take ${lock}`);
    await sleep(200);
  }
}
try {
  rmSync(path.join(root, "db", "migrations"), { recursive: true, force: true });
  run(path.join(root, "node_modules", ".bin", "drizzle-kit"), ["generate", "--name", "init"], { cwd: root });
} finally {
  rmSync(lock, { recursive: true, force: true });
}
