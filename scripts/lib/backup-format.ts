// What a Riser backup archive holds and how it is checked; no database or network here (unit-tested
// in tests/unit/backup-format.test.ts). Used by scripts/backup.ts and scripts/restore.ts.
//
// Archive (tar, gzip): manifest.json · database.sql (mariadb-dump) · objects/<object key> (evidence).
import { createHash } from "node:crypto";
import { createReadStream, readFileSync } from "node:fs";
import { createInterface } from "node:readline";
import path from "node:path";

export const FORMAT = "riser-backup/1";

export type ManifestObject = { key: string; size: number; sha256: string; contentType: string | null };
export type Manifest = {
  format: typeof FORMAT;
  createdAt: string;
  /** the last migration applied to the database that was dumped */
  schema: { tag: string | null; when: number | null; applied: number };
  database: { file: "database.sql"; size: number; sha256: string; rows: Record<string, number> };
  objects: ManifestObject[];
  /** evidence rows whose object was not in the store at backup time (should be empty) */
  missingObjects: string[];
};

export type JournalEntry = { idx: number; when: number; tag: string };

/** The migrations this code knows (db/migrations/meta/_journal.json), oldest first. */
export function journal(root: string): JournalEntry[] {
  const raw = JSON.parse(readFileSync(path.join(root, "db/migrations/meta/_journal.json"), "utf8")) as { entries: JournalEntry[] };
  return [...raw.entries].sort((a, b) => a.when - b.when);
}

/**
 * Drizzle's migrator records each applied migration with its journal `when` as created_at; the
 * newest one names the schema version.
 */
export function schemaVersionOf(lastCreatedAt: number | null, applied: number, entries: JournalEntry[]): Manifest["schema"] {
  if (lastCreatedAt === null) return { tag: null, when: null, applied };
  return { tag: entries.find((e) => e.when === lastCreatedAt)?.tag ?? null, when: lastCreatedAt, applied };
}

/** Why a backup's schema cannot be restored by this code, or null when it can (same or older). */
export function newerSchemaProblem(schema: Manifest["schema"], entries: JournalEntry[]): string | null {
  const latest = entries[entries.length - 1];
  if (schema.when === null) return null;
  if (!latest || schema.when > latest.when) {
    return `the backup's schema (${schema.tag ?? "unknown migration"}) is newer than this release's (${latest?.tag ?? "none"}): restore it with the release that made it`;
  }
  if (!entries.some((e) => e.when === schema.when)) {
    return `the backup's last migration (${schema.tag ?? schema.when}) is not one of this release's migrations`;
  }
  return null;
}

/**
 * Counts rows per table in mariadb-dump output, line by line: an INSERT's rows may share its line
 * (older clients) or come one per line after "INSERT INTO `t` VALUES" (MariaDB 10.11+). Counts the
 * top-level "(…)" tuples up to the closing ";", skipping quoted strings (backslash escapes, or
 * doubled quotes under NO_BACKSLASH_ESCAPES). mariadb-dump writes newlines inside strings as \n.
 */
export class DumpRowCounter {
  readonly rows: Record<string, number> = {};
  private table: string | null = null;
  private depth = 0;
  private quoted = false;

  feed(line: string): void {
    let from = 0;
    if (this.table === null) {
      const m = /^INSERT INTO `((?:[^`]|``)+)` VALUES/.exec(line);
      if (!m) return;
      this.table = m[1]!.replace(/``/g, "`");
      this.rows[this.table] ??= 0;
      from = m[0].length;
    }
    for (let i = from; i < line.length; i++) {
      const c = line[i];
      if (this.quoted) {
        if (c === "\\") i++;
        else if (c === "'") this.quoted = false;
      } else if (c === "'") this.quoted = true;
      else if (c === "(") {
        if (this.depth === 0) this.rows[this.table]!++;
        this.depth++;
      } else if (c === ")") this.depth--;
      else if (c === ";" && this.depth === 0) {
        this.table = null;
        return;
      }
    }
  }
}

/** Size, SHA-256 and rows per table of a dump file, in one pass. */
export async function scanDump(file: string): Promise<{ size: number; sha256: string; rows: Record<string, number> }> {
  const hash = createHash("sha256");
  let size = 0;
  const stream = createReadStream(file);
  stream.on("data", (chunk) => {
    hash.update(chunk);
    size += (chunk as Buffer).length;
  });
  const counter = new DumpRowCounter();
  for await (const line of createInterface({ input: stream, crlfDelay: Infinity })) counter.feed(line);
  return { size, sha256: hash.digest("hex"), rows: counter.rows };
}

export async function sha256File(file: string): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of createReadStream(file)) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

export const sha256 = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");

/** An object key as a path inside the archive, refusing anything that could leave objects/. */
export function objectPath(key: string): string {
  const parts = key.split("/");
  if (!key || key.startsWith("/") || parts.some((p) => p === "" || p === "." || p === "..") || /[\\\0]/.test(key)) {
    throw new Error(`refusing an unsafe object key: ${JSON.stringify(key)}`);
  }
  return path.posix.join("objects", key);
}

/** A manifest read from an archive, checked for shape. */
export function parseManifest(text: string): Manifest {
  const m = JSON.parse(text) as Manifest;
  if (m?.format !== FORMAT) throw new Error(`not a Riser backup (format ${JSON.stringify(m?.format)}, expected ${FORMAT})`);
  if (!m.database?.sha256 || !Array.isArray(m.objects) || typeof m.database.rows !== "object") throw new Error("the backup's manifest is incomplete");
  for (const o of m.objects) objectPath(o.key);
  return m;
}

/** mariadb client options from a mysql:// URL; the password goes in an option file, never on the command line. */
export function mariadbConnection(url: string): { optionFile: string; args: string[]; database: string } {
  const u = new URL(url);
  const database = decodeURIComponent(u.pathname.replace(/^\//, ""));
  if (!database) throw new Error("DATABASE_URL names no database");
  const esc = (s: string) => s.replace(/\\/g, "\\\\").replace(/"/g, '\\"');
  const optionFile = `[client]\nuser="${esc(decodeURIComponent(u.username))}"\npassword="${esc(decodeURIComponent(u.password))}"\nhost="${esc(u.hostname)}"\nport=${u.port || 3306}\n`;
  return { optionFile, args: ["--protocol=TCP", "--default-character-set=utf8mb4"], database };
}
