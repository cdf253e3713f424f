// Scale data for the team board benchmark (bench/team-board.ts): one invented organization with
// 5,000 learners in 20 teams (or --learners=50000 --teams=200), lesson progress, graded attempts, completions and certificates across
// every module, and team assignments with due dates. Fast: multi-row inserts, one password hash.
//
//   node_modules/.bin/tsx scripts/seed/seed-scale.ts --profile=test-b      (or with DATABASE_URL set)
//   … --replace    removes an earlier scale organization first; --remove only removes it
//
// Local profiles only, like the demo seed: its people share the published demo password, so it
// refuses a DATABASE_URL unless RISER_LOCAL=1 on a loopback APP_URL.
//
// Needs the catalog synced (run the normal seed first). Plain mysql2, no app modules, so it runs
// without the react-server condition.
import { randomBytes, randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import mysql from "mysql2/promise";
import { DEMO_PASSWORD } from "@/db/demo";
import { prng } from "@/lib/quiz/browser";

export const SCALE_ORG = "Tamsett Ridge Sprinklers";
export const SCALE_MANAGER = { name: "Corra Vellum", email: "corra@tamsett-ridge.example" };
const LEARNERS = Number(process.argv.find((a) => a.startsWith("--learners="))?.split("=")[1] ?? 5000);
const TEAMS = Number(process.argv.find((a) => a.startsWith("--teams="))?.split("=")[1] ?? 20);
const DAY = 86_400_000;

async function databaseUrl(): Promise<string> {
  if (process.env.DATABASE_URL) {
    // loaded here: the environment check needs the app's variables, which a profile run sets
    const { isLocalInstance } = await import("@/lib/env");
    if (!isLocalInstance({ RISER_LOCAL: process.env.RISER_LOCAL === "1" ? "1" : "0", APP_URL: process.env.APP_URL ?? "" })) {
      throw new Error("Refused: scale data (people with the published demo password) loads only on a local profile (RISER_LOCAL=1 and a loopback APP_URL).");
    }
    return process.env.DATABASE_URL;
  }
  const { config } = await import("../lib/config.mjs");
  return config().env.DATABASE_URL as string;
}

// the quiz draw's seeded generator (mulberry32), so that every run builds the same data
const rand = prng(20261201);
const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;
const between = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));

// Invented syllables: the names are made up, not taken from any list of people.
const FIRST_A = ["Al", "Bre", "Cas", "Dor", "Ely", "Fen", "Gar", "Hal", "Isa", "Jor", "Kel", "Lio", "Mar", "Nev", "Ors", "Pel", "Quin", "Ros", "Sel", "Tam", "Uli", "Ves", "Wyn", "Yar", "Zel"];
const FIRST_B = ["an", "ric", "sia", "vin", "wen", "dra", "lo", "mir", "ton", "ley", "eth", "ina"];
const LAST_A = ["Ash", "Brack", "Cold", "Dun", "Elm", "Fern", "Gale", "Holl", "Ivy", "Kettle", "Lark", "Moss", "North", "Oak", "Pike", "Reed", "Stone", "Thorn", "Vale", "Wick"];
const LAST_B = ["bury", "combe", "field", "ford", "gate", "holm", "lock", "mere", "ridge", "shaw", "stead", "well"];

type Row = (string | number | Date | null | boolean)[];

async function insertMany(conn: mysql.Connection, table: string, cols: string[], data: Row[], chunk = 2000) {
  for (let i = 0; i < data.length; i += chunk) {
    await conn.query(`INSERT INTO \`${table}\` (${cols.map((c) => `\`${c}\``).join(", ")}) VALUES ?`, [data.slice(i, i + chunk)]);
  }
}

async function main() {
  const t0 = Date.now();
  const conn = await mysql.createConnection({ uri: await databaseUrl(), timezone: "Z" });
  // Bulk load: the board_cell triggers stand aside on this connection only, and the organization's
  // cells are rebuilt from the sources in one statement at the end (db/migrations/0011_board_cell.sql).
  await conn.query("SET @riser_board_bulk = 1");
  try {
    const [existing] = await conn.query<mysql.RowDataPacket[]>("SELECT id FROM organization WHERE name = ?", [SCALE_ORG]);
    if (existing.length || process.argv.includes("--remove")) {
      if (!existing.length) return console.log("[seed:scale] no scale organization to remove");
      if (!process.argv.includes("--replace") && !process.argv.includes("--remove")) {
        console.log(`[seed:scale] "${SCALE_ORG}" exists: left as it is (pass --replace to rebuild it)`);
        return;
      }
      const orgId = existing[0]!.id as string;
      await conn.query("DELETE FROM board_cell WHERE organization_id = ?", [orgId]);
      await conn.query("DELETE FROM certificate WHERE organization_id = ?", [orgId]);
      await conn.query("DELETE c FROM module_completion c JOIN user u ON u.id = c.user_id WHERE u.organization_id = ?", [orgId]);
      await conn.query("DELETE r FROM reminder_log r JOIN user u ON u.id = r.user_id WHERE u.organization_id = ?", [orgId]);
      await conn.query("DELETE FROM user WHERE organization_id = ?", [orgId]); // cascades progress, attempts, sessions
      await conn.query("DELETE FROM organization WHERE id = ?", [orgId]); // cascades teams, assignments
      console.log("[seed:scale] removed the earlier scale organization");
      if (process.argv.includes("--remove")) return;
    }

    const [modules] = await conn.query<mysql.RowDataPacket[]>(
      "SELECT id, slug, title, pass_mark, validity_months, ce_hours FROM catalog_module WHERE retired_at IS NULL ORDER BY position",
    );
    if (!modules.length) throw new Error("the catalog is empty: run the normal seed first (it syncs content/)");
    const [lessons] = await conn.query<mysql.RowDataPacket[]>("SELECT id, module_id FROM catalog_lesson WHERE retired_at IS NULL ORDER BY module_id, position");
    const [paths] = await conn.query<mysql.RowDataPacket[]>("SELECT slug FROM catalog_path WHERE retired_at IS NULL ORDER BY slug");
    const lessonsOf = new Map<number, number[]>();
    for (const l of lessons) lessonsOf.set(l.module_id, [...(lessonsOf.get(l.module_id) ?? []), l.id]);

    const now = Date.now();
    const orgId = randomUUID();
    await conn.query("INSERT INTO organization (id, name, kind, seats) VALUES (?, ?, 'contractor', ?)", [orgId, SCALE_ORG, LEARNERS + 100]);
    const teamIds: string[] = [];
    const teamRows: Row[] = [];
    for (let t = 1; t <= TEAMS; t++) {
      const id = randomUUID();
      teamIds.push(id);
      teamRows.push([id, orgId, `Crew ${String(t).padStart(TEAMS > 99 ? 3 : 2, "0")}`]);
    }
    await insertMany(conn, "team", ["id", "organization_id", "name"], teamRows);

    const hash = await hashPassword(DEMO_PASSWORD);
    const users: Row[] = [];
    const accounts: Row[] = [];
    const managerId = randomUUID();
    users.push([managerId, SCALE_MANAGER.name, SCALE_MANAGER.email, true, "manager", orgId, null]);
    accounts.push([randomUUID(), managerId, "credential", managerId, hash, new Date(now)]);
    const learners: { id: string; name: string }[] = [];
    for (let i = 0; i < LEARNERS; i++) {
      const id = randomUUID();
      const name = `${pick(FIRST_A)}${pick(FIRST_B)} ${pick(LAST_A)}${pick(LAST_B)}`;
      learners.push({ id, name });
      users.push([id, name, `learner${String(i + 1).padStart(5, "0")}@tamsett-ridge.example`, true, "learner", orgId, teamIds[i % TEAMS]!]);
      accounts.push([randomUUID(), id, "credential", id, hash, new Date(now)]);
    }
    await insertMany(conn, "user", ["id", "name", "email", "email_verified", "role", "organization_id", "team_id"], users);
    await insertMany(conn, "account", ["id", "account_id", "provider_id", "user_id", "password", "updated_at"], accounts);

    const progress: Row[] = [];
    const attempts: Row[] = [];
    const passes: { attemptId: string; userId: string; name: string; module: mysql.RowDataPacket; at: Date }[] = [];
    const attempt = (userId: string, slug: string, passMark: number, at: Date, passed: boolean) => {
      const id = randomUUID();
      const score = passed ? between(passMark, 100) : between(30, passMark - 1);
      attempts.push([id, userId, orgId, slug, between(1, 2 ** 31), "graded", new Date(at.getTime() - 20 * 60_000), at, score, passed, passMark]);
      return id;
    };
    for (const l of learners) {
      for (const m of modules) {
        const ids = lessonsOf.get(m.id) ?? [];
        const r = rand();
        if (r < 0.3) continue; // not started
        const started = new Date(now - between(1, 800) * DAY);
        if (r < 0.5) {
          const k = between(1, Math.max(1, ids.length - 1));
          for (const lid of ids.slice(0, k)) progress.push([l.id, lid, started]);
          continue;
        }
        for (const lid of ids) progress.push([l.id, lid, started]);
        if (r < 0.6) {
          attempt(l.id, m.slug, m.pass_mark, new Date(started.getTime() + DAY), false);
          if (rand() < 0.4) attempt(l.id, m.slug, m.pass_mark, new Date(started.getTime() + 2 * DAY), false);
          continue;
        }
        // completed: weighted towards recent weeks so the weekly chart has a shape
        const at = new Date(now - Math.floor(rand() ** 1.6 * 790 * DAY) - between(0, DAY / 1000) * 1000);
        if (rand() < 0.3) attempt(l.id, m.slug, m.pass_mark, new Date(at.getTime() - DAY), false);
        const pass = attempt(l.id, m.slug, m.pass_mark, at, true);
        passes.push({ attemptId: pass, userId: l.id, name: l.name, module: m, at });
      }
    }
    await insertMany(conn, "lesson_progress", ["user_id", "lesson_id", "completed_at"], progress, 5000);
    await insertMany(
      conn,
      "quiz_attempt",
      ["id", "user_id", "organization_id", "module_slug", "seed", "status", "started_at", "submitted_at", "score", "passed", "pass_mark"],
      attempts,
    );
    await insertMany(
      conn,
      "module_completion",
      ["user_id", "module_slug", "attempt_id", "completed_at"],
      passes.map((p) => [p.userId, p.module.slug, p.attemptId, p.at]),
      5000,
    );
    const [completionIds] = await conn.query<mysql.RowDataPacket[]>(
      "SELECT c.id, c.attempt_id FROM module_completion c JOIN user u ON u.id = c.user_id WHERE u.organization_id = ?",
      [orgId],
    );
    const completionOf = new Map(completionIds.map((r) => [r.attempt_id as string, r.id as number]));

    // Certificates: serial numbers reserved per year from the shared counter, as issuing does.
    const byYear = new Map<number, typeof passes>();
    for (const p of passes) byYear.set(p.at.getUTCFullYear(), [...(byYear.get(p.at.getUTCFullYear()) ?? []), p]);
    const certs: Row[] = [];
    for (const [year, list] of byYear) {
      await conn.beginTransaction();
      await conn.query("INSERT IGNORE INTO certificate_serial_counter (year, last_number) VALUES (?, 0)", [year]);
      const [[counter]] = await conn.query<mysql.RowDataPacket[]>("SELECT last_number FROM certificate_serial_counter WHERE year = ? FOR UPDATE", [year]);
      const first = Number(counter!.last_number) + 1;
      await conn.query("UPDATE certificate_serial_counter SET last_number = ? WHERE year = ?", [first + list.length - 1, year]);
      await conn.commit();
      list.forEach((p, i) => {
        const n = first + i;
        const expires = new Date(p.at);
        expires.setUTCMonth(expires.getUTCMonth() + Number(p.module.validity_months));
        certs.push([
          `RSR-${year}-${String(n).padStart(6, "0")}`,
          year,
          n,
          randomBytes(18).toString("base64url"),
          p.userId,
          p.name,
          orgId,
          SCALE_ORG,
          "module",
          p.module.slug,
          p.module.title,
          p.module.ce_hours,
          completionOf.get(p.attemptId)!,
          p.at,
          expires,
        ]);
      });
    }
    await insertMany(
      conn,
      "certificate",
      ["serial", "serial_year", "serial_number", "verification_code", "user_id", "holder_name", "organization_id", "organization_name", "kind", "subject_slug", "subject_title", "ce_hours", "completion_id", "issued_at", "expires_at"],
      certs,
    );

    // Every team gets one learning path and one module, due between 20 days ago and 40 days ahead.
    const assignments: Row[] = [];
    teamIds.forEach((tid, i) => {
      const path = paths[i % paths.length]!.slug as string;
      const mod = modules[(i * 3) % modules.length]!.slug as string;
      for (const [kind, slug] of [
        ["path", path],
        ["module", mod],
      ] as const) {
        const due = new Date(now + between(-20, 40) * DAY);
        due.setUTCHours(23, 59, 59, 0);
        assignments.push([orgId, kind, slug, null, tid, `t:${tid}`, due, managerId, new Date(now)]);
      }
    });
    await insertMany(conn, "assignment", ["organization_id", "kind", "target_slug", "user_id", "team_id", "target_key", "due_at", "created_by", "created_at"], assignments);
    await conn.query("CALL board_rebuild(?, NULL)", [orgId]);
    await conn.query("ANALYZE TABLE user, lesson_progress, quiz_attempt, module_completion, certificate, assignment, board_cell");
    console.log(
      `[seed:scale] ${SCALE_ORG}: ${LEARNERS} learners in ${TEAMS} teams, ${progress.length} lessons done, ${attempts.length} attempts, ${passes.length} completions and certificates, ${assignments.length} team assignments (${Math.round((Date.now() - t0) / 100) / 10} s). Manager: ${SCALE_MANAGER.email}`,
    );
  } finally {
    await conn.end();
  }
}

// Runs only as a script (bench/team-board.ts imports the names above).
if (/seed-scale\.ts$/.test(process.argv[1] ?? "")) {
  try {
    await main();
  } catch (err) {
    const e = err as { sqlMessage?: string; message?: string };
    console.error(`[seed:scale] failed: ${e.sqlMessage ?? e.message}`);
    process.exit(1);
  }
}
