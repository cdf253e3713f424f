// Upgrades keep records: every migration in db/migrations, in journal order, is applied by drizzle's
// own migrator (as `npm run db:migrate` does at every deploy) to a scratch database that holds the
// previous migration's schema filled with representative rows in every table — and afterwards every
// row is still there with every surviving column unchanged. New migrations are picked up on their
// own: rows are generated from information_schema (types, enums, foreign keys, unique keys).
// A migration that changes data on purpose lists it in INTENDED; one whose tables need rows the
// generator cannot make gets them in FIXTURES. Runs on the test profile's MariaDB (a scratch
// database created through the root socket, as scripts/db.mjs does).
import { execFileSync } from "node:child_process";
import { cpSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";
import { afterAll, describe, expect, it } from "vitest";
import { config } from "../../scripts/lib/config.mjs";
import { journal, type JournalEntry } from "../../scripts/lib/backup-format";
import { fillEveryTable, snapshot, type Snapshot } from "../helpers/schema-rows";

/** Per migration tag: columns whose values it rewrites on purpose ("table.column"), with the reason. */
const INTENDED: Record<string, Record<string, string>> = {};
/** Per migration tag: rows to insert before it runs, where the generated rows do not exercise it. */
const FIXTURES: Record<string, (conn: mysql.Connection) => Promise<void>> = {};

const cfg = config(process.env.RISER_PROFILE ?? "test");
const scratch = `riser_upgrade_${process.pid}`;
const root = path.resolve(import.meta.dirname, "../..");
const work = mkdtempSync(path.join(os.tmpdir(), "riser-migrations-"));

function asRoot(sql: string) {
  execFileSync("mariadb", ["--no-defaults", `--socket=${cfg.db.socket}`, "--user=root", "-e", sql], { stdio: ["ignore", "ignore", "pipe"] });
}

/** A migrations folder holding only the first `count` migrations, for drizzle's migrator. */
function folderUpTo(entries: JournalEntry[], count: number): string {
  const dir = path.join(work, String(count));
  mkdirSync(path.join(dir, "meta"), { recursive: true });
  const raw = JSON.parse(readFileSync(path.join(root, "db/migrations/meta/_journal.json"), "utf8"));
  const kept = entries.slice(0, count).map((e) => e.tag);
  writeFileSync(path.join(dir, "meta/_journal.json"), JSON.stringify({ ...raw, entries: raw.entries.filter((e: JournalEntry) => kept.includes(e.tag)) }));
  for (const tag of kept) cpSync(path.join(root, "db/migrations", `${tag}.sql`), path.join(dir, `${tag}.sql`));
  return dir;
}

/** What changed between two snapshots: lost tables, lost rows and changed values of surviving columns. */
function losses(before: Snapshot, after: Snapshot, intended: Record<string, string>): string[] {
  const out = new Set<string>();
  for (const [table, rows] of Object.entries(before)) {
    const now = after[table];
    if (!now) {
      if (rows.size && !intended[`${table}.*`]) out.add(`${table}: table dropped with ${rows.size} rows`);
      continue;
    }
    for (const [key, row] of rows) {
      const later = now.get(key);
      if (!later) {
        out.add(`${table} ${key}: row lost`);
        continue;
      }
      for (const [column, value] of Object.entries(row)) {
        if (!(column in later)) {
          if (!intended[`${table}.${column}`]) out.add(`${table}.${column}: column dropped`);
        } else if (later[column] !== value && !intended[`${table}.${column}`]) {
          out.add(`${table}.${column} ${key}: ${value} became ${later[column]}`);
        }
      }
    }
  }
  return [...out];
}

afterAll(() => {
  asRoot(`DROP DATABASE IF EXISTS \`${scratch}\``);
  rmSync(work, { recursive: true, force: true });
});

describe("every migration on a database with the previous release's data", () => {
  it("applies each migration in turn and loses no row or value", async () => {
    const entries = journal(root);
    expect(entries.length).toBeGreaterThan(0);
    asRoot(`DROP DATABASE IF EXISTS \`${scratch}\`; CREATE DATABASE \`${scratch}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci; GRANT ALL PRIVILEGES ON \`${scratch}\`.* TO '${cfg.db.user}'@'127.0.0.1';`);
    const url = new URL(cfg.env.DATABASE_URL);
    url.pathname = `/${scratch}`;
    const conn = await mysql.createConnection({ uri: url.toString(), multipleStatements: true, timezone: "Z", dateStrings: true });
    const report: string[] = [];
    try {
      for (let i = 0; i < entries.length; i++) {
        const tag = entries[i]!.tag;
        await FIXTURES[tag]?.(conn);
        const before = await snapshot(conn);
        await migrate(drizzle(conn), { migrationsFolder: folderUpTo(entries, i + 1) });
        const after = await snapshot(conn);
        report.push(...losses(before, after, INTENDED[tag] ?? {}).map((l) => `${tag}: ${l}`));
        // the next migration meets this one's schema with data in every table
        const filled = await fillEveryTable(conn, `m${String(i).padStart(3, "0")}`);
        expect(filled.problems, `${tag}: rows the generator could not insert (add FIXTURES for them)`).toEqual([]);
      }
      const final = await snapshot(conn);
      const empty = Object.entries(final).filter(([t, rows]) => rows.size === 0 && t !== "__drizzle_migrations");
      expect(empty.map(([t]) => t)).toEqual([]);
    } finally {
      await conn.end();
    }
    expect(report).toEqual([]);
  });
});
