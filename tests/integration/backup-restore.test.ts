// Backup and restore round trip on the test profile, through the real commands (npm run db:backup,
// npm run db:restore) against the running app's MariaDB and object store: issue certificates,
// revoke one through the API, back up, check the refusals, wipe the database and the store,
// restore — then every certificate verifies through the app with the same state, and attempts,
// completions, sign-offs, evidence files (SHA-256) and the audit log are exactly as before.
import { execFile } from "node:child_process";
import { createHash } from "node:crypto";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import * as tar from "tar";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { deleteObject, getObjectBytes, listObjects } from "@/lib/storage";
import { anonymous, postJson } from "../helpers/http";
import { clientOf, completion, fixtureOrg, fixturePerson, gradedAttempt } from "../helpers/fixtures";

const run = promisify(execFile);
// The records a backup must keep exactly (background work in the running app touches none of them).
const KEPT = ["user", "organization", "certificate", "quiz_attempt", "quiz_attempt_item", "module_completion", "lesson_progress", "sign_off", "sign_off_evidence", "audit_log", "__drizzle_migrations"];

async function npm(script: string, ...args: string[]) {
  try {
    const r = await run("npm", ["run", "--silent", script, "--", ...args], { cwd: process.cwd(), env: process.env, timeout: 120_000 });
    return { code: 0, out: r.stdout + r.stderr };
  } catch (err) {
    const e = err as { code?: number; stdout?: string; stderr?: string };
    return { code: e.code ?? 1, out: `${e.stdout ?? ""}${e.stderr ?? ""}` };
  }
}

async function tableRows(): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const t of KEPT) {
    const [rows] = await pool.query(`SELECT * FROM \`${t}\` ORDER BY 1`);
    out[t] = JSON.stringify(rows);
  }
  return out;
}

async function storeChecksums(): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for await (const page of listObjects("")) {
    for (const o of page) out[o.key] = createHash("sha256").update((await getObjectBytes(o.key))!).digest("hex");
  }
  return out;
}

async function verifyAll(): Promise<Record<string, unknown>> {
  const certs = await db.select({ code: certificate.verificationCode }).from(certificate).orderBy(certificate.id);
  const out: Record<string, unknown> = {};
  for (const c of certs) {
    const res = await anonymous().fetch(`/api/verify/${c.code}`); // a fresh client address each: the look-up limit is per address
    out[c.code] = { http: res.status, ...((await res.json()) as object) };
  }
  return out;
}

async function wipe() {
  const conn = await pool.getConnection();
  try {
    const [tables] = (await conn.query("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE()")) as unknown as [{ t: string }[]];
    await conn.query("SET FOREIGN_KEY_CHECKS = 0");
    for (const { t } of tables) await conn.query(`DROP TABLE \`${t}\``);
    await conn.query("SET FOREIGN_KEY_CHECKS = 1");
  } finally {
    conn.release();
  }
  for await (const page of listObjects("")) for (const o of page) await deleteObject(o.key);
}

let dir: string;
let archive: string;
let revokedCode: string;
let before: { rows: Record<string, string>; files: Record<string, string>; verified: Record<string, unknown> };

beforeAll(async () => {
  dir = await mkdtemp(path.join(os.tmpdir(), "riser-backup-test-"));
  archive = path.join(dir, "backup.tar.gz");
  const org = await fixtureOrg("Backup Sprinkler Co", { teams: ["Crew"] });
  const manager = await fixturePerson(org, { name: "Backup Manager", role: "manager" });
  const ids: number[] = [];
  for (const [i, slug] of ["pipe-and-joining", "inspection-testing-maintenance"].entries()) {
    const learner = await fixturePerson(org, { name: `Backup Learner ${i + 1}`, teamId: org.teams.Crew });
    const attemptId = await gradedAttempt(learner, slug, true);
    const issued = await issueCertificateForCompletion(await completion(learner.id, slug, attemptId, new Date()), { notify: false });
    ids.push(...issued.map((c) => c.id));
  }
  const revoked = await postJson(await clientOf(manager.id), `/api/certificates/${ids[0]}/revoke`, { reason: "Issued to the wrong crew member" });
  expect(revoked.status).toBe(200);
  revokedCode = (await db.select().from(certificate)).find((c) => c.id === ids[0])!.verificationCode;
  before = { rows: await tableRows(), files: await storeChecksums(), verified: await verifyAll() };
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
  await pool.end();
});

describe("npm run db:backup and db:restore", () => {
  it("backs up, refuses a non-empty target and a newer schema, then restores a wiped instance exactly", { timeout: 240_000 }, async () => {
    expect(Object.keys(before.files).length).toBeGreaterThan(0); // demo sign-offs carry evidence photos
    expect((before.verified[revokedCode] as { status: string }).status).toBe("revoked");

    const backup = await npm("db:backup", `--out=${archive}`);
    expect(backup.code, backup.out).toBe(0);

    // the target still holds everything: refused, nothing touched
    const busy = await npm("db:restore", archive);
    expect(busy.code, busy.out).toBe(3);
    expect(busy.out).toMatch(/not empty/);

    // a backup from a later release (its last migration is newer than ours): refused
    const x = path.join(dir, "x");
    await run("mkdir", ["-p", x]);
    await tar.x({ file: archive, cwd: x });
    const manifest = JSON.parse(await readFile(path.join(x, "manifest.json"), "utf8"));
    manifest.schema = { tag: "9999_from_the_future", when: manifest.schema.when + 86_400_000, applied: manifest.schema.applied + 1 };
    await writeFile(path.join(x, "manifest.json"), JSON.stringify(manifest));
    const newer = path.join(dir, "newer.tar.gz");
    await tar.c({ gzip: true, file: newer, cwd: x }, ["manifest.json", "database.sql", "objects"]);
    const refused = await npm("db:restore", newer);
    expect(refused.code, refused.out).toBe(3);
    expect(refused.out).toMatch(/newer than this release/);

    // a damaged dump: refused before anything is deleted, even with --force
    await writeFile(path.join(x, "database.sql"), (await readFile(path.join(x, "database.sql"), "utf8")).replace("Issued to the wrong crew member", "Issued to the right crew member"));
    const damaged = path.join(dir, "damaged.tar.gz");
    await tar.c({ gzip: true, file: damaged, cwd: x }, ["manifest.json", "database.sql", "objects"]);
    const bad = await npm("db:restore", damaged, "--force");
    expect(bad.code, bad.out).toBe(3);
    expect(bad.out).toMatch(/damaged/);
    expect(await tableRows()).toEqual(before.rows);

    await wipe();
    expect(await storeChecksums()).toEqual({});

    const restored = await npm("db:restore", archive);
    expect(restored.code, restored.out).toBe(0);

    expect(await tableRows()).toEqual(before.rows);
    expect(await storeChecksums()).toEqual(before.files);
    const after = await verifyAll();
    expect(after).toEqual(before.verified);
    expect((after[revokedCode] as { status: string }).status).toBe("revoked");
  });
});
