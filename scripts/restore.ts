// Restores a backup made by `npm run db:backup` into an empty database and object store:
//   npm run db:restore -- FILE [--force]
// Checks every file of the archive against the manifest's SHA-256 first; refuses a backup whose
// schema is newer than this release's migrations, and a database or store that already holds
// anything — unless --force, which then empties both before restoring. Afterwards it compares the
// rows per table and every file with the manifest. An older schema is brought up to date by the
// next `npm run db:migrate`.
import { spawn } from "node:child_process";
import { createReadStream } from "node:fs";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import * as tar from "tar";
import { journal, mariadbConnection, newerSchemaProblem, objectPath, parseManifest, sha256, sha256File } from "./lib/backup-format";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const argv = process.argv.slice(2);
const force = argv.includes("--force");
const file = argv.find((a) => !a.startsWith("--"));

class RestoreRefused extends Error {}

const url = process.env.DATABASE_URL;
if (!file || !url) {
  console.error(!file ? "[restore] usage: npm run db:restore -- FILE [--force]" : "[restore] DATABASE_URL is not set (see README).");
  process.exit(2);
}

const { pool } = await import("@/db/client");
const storage = await import("@/lib/storage");

type Row = Record<string, unknown>;
const query = async <T extends Row>(sql: string, params: unknown[] = []) => ((await pool.query(sql, params)) as unknown as [T[]])[0];
const tables = async () => (await query<{ t: string }>("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE'")).map((r) => r.t);
const quote = (name: string) => `\`${name.replace(/`/g, "``")}\``;

async function storeKeys(): Promise<string[]> {
  const keys: string[] = [];
  for await (const page of storage.listObjects("")) keys.push(...page.map((o) => o.key));
  return keys;
}

/** Feeds database.sql to the mariadb client. */
function load(optionFile: string, database: string, args: string[], sqlFile: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn("mariadb", [`--defaults-extra-file=${optionFile}`, ...args, "--batch", database], { stdio: ["pipe", "ignore", "pipe"] });
    let stderr = "";
    child.stderr.on("data", (d) => (stderr += d));
    createReadStream(sqlFile).pipe(child.stdin);
    child.on("error", (err) => reject(new Error(`the mariadb client could not start (${err.message}); install Debian's mariadb-client`)));
    child.on("close", (code) => (code === 0 ? resolve() : reject(new Error(`loading the dump failed (${code}): ${stderr.trim()}`))));
  });
}

const work = await mkdtemp(path.join(os.tmpdir(), "riser-restore-"));
try {
  // 1. the archive is whole: every file matches the manifest
  await tar.x({ file: path.resolve(file), cwd: work, strict: true });
  const manifest = parseManifest(await readFile(path.join(work, "manifest.json"), "utf8"));
  const sqlFile = path.join(work, "database.sql");
  if ((await sha256File(sqlFile)) !== manifest.database.sha256) throw new RestoreRefused("database.sql does not match the manifest's checksum: the backup is damaged");
  for (const o of manifest.objects) {
    if (sha256(await readFile(path.join(work, objectPath(o.key)))) !== o.sha256) throw new RestoreRefused(`${o.key} does not match the manifest's checksum: the backup is damaged`);
  }

  // 2. the schema is one this release knows
  const entries = journal(root);
  const schemaProblem = newerSchemaProblem(manifest.schema, entries);
  if (schemaProblem && !force) throw new RestoreRefused(`${schemaProblem}. Add --force to restore anyway.`);

  // 3. the target is empty (or --force empties it)
  const existing = await tables();
  const existingKeys = await storeKeys();
  if ((existing.length || existingKeys.length) && !force) {
    throw new RestoreRefused(`the target is not empty (${existing.length} tables in the database, ${existingKeys.length} files in the store). Restore into an empty database and bucket, or add --force to delete what is there first.`);
  }
  if (existing.length) {
    const conn = await pool.getConnection();
    try {
      await conn.query("SET FOREIGN_KEY_CHECKS = 0");
      for (const t of existing) await conn.query(`DROP TABLE ${quote(t)}`);
      await conn.query("SET FOREIGN_KEY_CHECKS = 1");
    } finally {
      conn.release();
    }
    console.log(`[restore] --force: dropped ${existing.length} tables`);
  }
  for (const key of existingKeys) await storage.deleteObject(key);
  if (existingKeys.length) console.log(`[restore] --force: deleted ${existingKeys.length} files from the store`);

  // 4. the database, then the files
  const conn = mariadbConnection(url);
  const optionFile = path.join(work, "client.cnf");
  await writeFile(optionFile, conn.optionFile, { mode: 0o600 });
  await load(optionFile, conn.database, conn.args, sqlFile);
  await rm(optionFile);
  for (const o of manifest.objects) {
    await storage.putObject(o.key, new Uint8Array(await readFile(path.join(work, objectPath(o.key)))), o.contentType ?? "application/octet-stream");
  }

  // 5. what is there now matches the manifest
  const problems: string[] = [];
  const restored = await tables();
  for (const t of Object.keys(manifest.database.rows)) if (!restored.includes(t)) problems.push(`${t}: missing after the restore`);
  for (const t of restored) {
    const [{ n }] = (await query<{ n: number }>(`SELECT COUNT(*) AS n FROM ${quote(t)}`)) as [{ n: number }];
    const want = manifest.database.rows[t] ?? 0;
    if (Number(n) !== want) problems.push(`${t}: ${n} rows, the backup holds ${want}`);
  }
  for (const o of manifest.objects) {
    const head = await storage.headObject(o.key);
    if (head?.size !== o.size) problems.push(`${o.key}: ${head ? `${head.size} bytes` : "missing"} in the store, the backup holds ${o.size} bytes`);
  }
  if (problems.length) throw new Error(`the restored data does not match the backup:\n  ${problems.join("\n  ")}`);

  const rows = Object.values(manifest.database.rows).reduce((a, b) => a + b, 0);
  console.log(`[restore] restored the backup of ${manifest.createdAt}: ${rows} rows, ${manifest.objects.length} files, schema ${manifest.schema.tag ?? "empty"}`);
  const latest = entries[entries.length - 1];
  if (latest && manifest.schema.when !== null && manifest.schema.when < latest.when) {
    console.log(`[restore] the backup's schema is older than this release (${latest.tag}): run npm run db:migrate before starting the app`);
  }
} catch (err) {
  console.error(`[restore] ${err instanceof RestoreRefused ? "refused" : "failed"}: ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = err instanceof RestoreRefused ? 3 : 1;
} finally {
  await rm(work, { recursive: true, force: true });
  await pool.end();
}
