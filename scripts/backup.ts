// A consistent backup of one Riser instance in one file: `npm run db:backup [-- --out=FILE]`.
// The database through MariaDB's own mariadb-dump (--single-transaction: one consistent snapshot,
// no table locks, the app keeps running), the object store's evidence files through the S3 SDK, and
// a manifest (time, schema version, rows per table, SHA-256 of every file) — packed with tar + gzip.
// Restore with `npm run db:restore -- FILE` (scripts/restore.ts). README "Backups" says how to
// schedule it. Default file: backups/riser-<time>.tar.gz under the current folder.
import { spawn } from "node:child_process";
import { createWriteStream } from "node:fs";
import { mkdir, mkdtemp, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import * as tar from "tar";
import { FORMAT, journal, mariadbConnection, objectPath, scanDump, schemaVersionOf, sha256, type Manifest, type ManifestObject } from "./lib/backup-format";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const arg = (name: string) => process.argv.find((a) => a.startsWith(`--${name}=`))?.slice(name.length + 3);

function fail(message: string): never {
  console.error(`[backup] ${message}`);
  process.exit(1);
}

const url = process.env.DATABASE_URL;
if (!url) fail("DATABASE_URL is not set (npm run db:backup sets a local profile's; see README).");

const { pool } = await import("@/db/client");
const storage = await import("@/lib/storage");

/** Runs mariadb-dump into `file`; rejects with its error output. */
function dump(optionFile: string, database: string, args: string[], file: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(
      "mariadb-dump",
      [
        `--defaults-extra-file=${optionFile}`,
        ...args,
        "--single-transaction",
        "--quick",
        "--skip-lock-tables",
        "--no-tablespaces",
        "--hex-blob",
        "--triggers",
        database,
      ],
      { stdio: ["ignore", "pipe", "pipe"] },
    );
    let stderr = "";
    child.stderr.on("data", (d) => (stderr += d));
    child.stdout.pipe(createWriteStream(file));
    child.on("error", (err) => reject(new Error(`mariadb-dump could not start (${err.message}); install Debian's mariadb-client`)));
    child.on("close", (code) => (code === 0 ? resolve() : reject(new Error(`mariadb-dump failed (${code}): ${stderr.trim()}`))));
  });
}

const started = new Date();
const out = path.resolve(arg("out") ?? path.join("backups", `riser-${started.toISOString().replace(/[:.]/g, "-")}.tar.gz`));
const work = await mkdtemp(path.join(os.tmpdir(), "riser-backup-"));
try {
  // 1. the schema version: the newest migration drizzle recorded
  const [migrations] = (await pool.query("SELECT COUNT(*) AS n, MAX(created_at) AS last FROM `__drizzle_migrations`").catch(() => [[{ n: 0, last: null }]])) as unknown as [
    { n: number; last: string | number | null }[],
  ];
  const last = migrations[0]?.last;
  const schema = schemaVersionOf(last === null || last === undefined ? null : Number(last), Number(migrations[0]?.n ?? 0), journal(root));

  // 2. the database, one consistent snapshot
  const conn = mariadbConnection(url);
  const optionFile = path.join(work, "client.cnf");
  await writeFile(optionFile, conn.optionFile, { mode: 0o600 });
  const dumpFile = path.join(work, "database.sql");
  await dump(optionFile, conn.database, conn.args, dumpFile);
  await rm(optionFile);
  const scanned = await scanDump(dumpFile);

  // 3. the evidence files (every object in the bucket), four at a time
  await mkdir(path.join(work, "objects"));
  const keys: string[] = [];
  for await (const page of storage.listObjects("")) keys.push(...page.map((o) => o.key));
  const objects: ManifestObject[] = [];
  for (let i = 0; i < keys.length; i += 4) {
    const batch = await Promise.all(
      keys.slice(i, i + 4).map(async (key) => {
        const [bytes, head] = await Promise.all([storage.getObjectBytes(key), storage.headObject(key)]);
        if (!bytes) return null; // deleted meanwhile (the orphan clean-up)
        const file = path.join(work, objectPath(key));
        await mkdir(path.dirname(file), { recursive: true });
        await writeFile(file, bytes);
        return { key, size: bytes.byteLength, sha256: sha256(bytes), contentType: head?.contentType ?? null };
      }),
    );
    objects.push(...batch.filter((o): o is ManifestObject => o !== null));
  }

  // 4. evidence rows whose file is not in the store (a file is written before its row, so none expected)
  const held = new Set(objects.map((o) => o.key));
  const [evidence] = (await pool.query("SELECT object_key AS o, thumbnail_key AS t FROM sign_off_evidence").catch(() => [[]])) as unknown as [{ o: string; t: string | null }[]];
  const missingObjects = evidence.flatMap((r) => [r.o, r.t]).filter((k): k is string => Boolean(k) && !held.has(k!));

  const manifest: Manifest = {
    format: FORMAT,
    createdAt: started.toISOString(),
    schema,
    database: { file: "database.sql", size: scanned.size, sha256: scanned.sha256, rows: scanned.rows },
    objects,
    missingObjects,
  };
  await writeFile(path.join(work, "manifest.json"), JSON.stringify(manifest, null, 2));
  await mkdir(path.dirname(out), { recursive: true });
  await tar.c({ gzip: true, file: out, cwd: work, portable: true }, ["manifest.json", "database.sql", "objects"]);

  const rowTotal = Object.values(scanned.rows).reduce((a, b) => a + b, 0);
  console.log(
    `[backup] ${out}: schema ${schema.tag ?? "empty"}, ${Object.keys(scanned.rows).length} tables with rows, ${rowTotal} rows, ${objects.length} files (${Math.round((Date.now() - started.getTime()) / 100) / 10} s)`,
  );
  if (missingObjects.length) console.warn(`[backup] warning: ${missingObjects.length} evidence file(s) named in the database were not in the store: ${missingObjects.slice(0, 5).join(", ")}`);
} catch (err) {
  await rm(out, { force: true });
  console.error(`[backup] failed, no backup written: ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
} finally {
  await rm(work, { recursive: true, force: true });
  await pool.end();
}
