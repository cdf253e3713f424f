// The team board's stored cells (board_cell, kept by triggers) under concurrent writes: lesson
// marks through POST /api/progress, quiz passes and failures, certificates and their revocation,
// assignments through the manager API and past-due ones, team moves through the manager API and
// removed lesson marks, all fired at once for the same few people. Afterwards every board answer
// (each cell of GET /api/team/board, every status filter, GET /api/team/summary) must equal the
// reference: a plain recomputation written here from the source tables (lesson_progress,
// quiz_attempt, module_completion, certificate, assignment, user), with the status rule of
// lib/team/status.ts. No timings here (they are in bench/team-board.ts).
import { randomBytes, randomInt, randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { sql } from "drizzle-orm";
import { cellStatus, isDone, NO_FACTS, type CellFacts } from "@/lib/team/status";
import { postJson, getJson, uniqueEmail, type Client } from "../helpers/http";
import { clientOf, daysFromNow, fixtureOrg, fixturePerson, readAndComplete, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";
import { deadlockRetrier } from "../helpers/deadlock";

type Cell = { status: string; dueAt: string | null; lessonsDone: number; attempts: number; bestScore: number | null; completedAt: string | null; expiresAt: string | null };
type Row = { id: string; name: string; cells: Record<string, Cell> };
type Page = { total: number; rows: Row[]; modules: { slug: string }[] };
type Totals = { teams: { teamId: string | null; people: number; cells: number; passed: number; failed: number; overdue: number; expiring: number; expired: number }[] };

const MODULES = ["freeze-protection", "how-systems-work", "pipe-and-joining"]; // three modules the writes touch
let org: FixtureOrg;
let mgr: Client;
let managerId: string;
const people: FixturePerson[] = [];

async function q<T>(query: ReturnType<typeof sql>): Promise<T[]> {
  const [r] = (await db.execute(query)) as unknown as [T[]];
  return r;
}

/** Retries a transaction that lost a deadlock, counting the retries. */
const { retrying, state: retried } = deadlockRetrier(5);

/** A quiz attempt started, then graded in a second statement of one transaction (as grading leaves it). */
async function gradeOnce(p: FixturePerson, slug: string, passed: boolean, at: Date, withCertificate?: { expiresAt: Date }) {
  await retrying(() =>
    db.transaction(async (tx) => {
      const id = randomUUID();
      await tx.execute(sql`INSERT INTO quiz_attempt (id, user_id, organization_id, module_slug, seed, status, started_at, pass_mark)
        VALUES (${id}, ${p.id}, ${p.organizationId}, ${slug}, ${randomInt(1, 2 ** 31)}, 'open', ${new Date(at.getTime() - 600_000)}, 80)`);
      await tx.execute(sql`UPDATE quiz_attempt SET status = 'graded', submitted_at = ${at}, score = ${passed ? 85 + randomInt(0, 15) : 30 + randomInt(0, 40)}, passed = ${passed} WHERE id = ${id}`);
      if (!passed) return;
      const [c] = (await tx.execute(sql`INSERT INTO module_completion (user_id, module_slug, attempt_id, completed_at) VALUES (${p.id}, ${slug}, ${id}, ${at})`)) as unknown as [{ insertId: number }];
      if (!withCertificate) return;
      const n = randomInt(100_000, 999_999);
      await tx.execute(sql`INSERT INTO certificate (serial, serial_year, serial_number, verification_code, user_id, holder_name, organization_id, organization_name, kind, subject_slug, subject_title, ce_hours, completion_id, issued_at, expires_at)
        VALUES (${`TST-9${n}-${randomBytes(3).toString("hex")}`}, ${9000 + randomInt(0, 999)}, ${n}, ${randomBytes(18).toString("base64url")}, ${p.id}, ${p.name}, ${p.organizationId}, 'fixture', 'module', ${slug}, ${slug}, 1, ${c.insertId}, ${at}, ${withCertificate.expiresAt})`);
    }),
  );
}

async function revokeLatest(p: FixturePerson, slug: string) {
  await retrying(() =>
    db.execute(sql`UPDATE certificate SET revoked_at = NOW(3), revoked_by = ${managerId}, revoke_reason = 'test' WHERE user_id = ${p.id} AND subject_slug = ${slug} AND revoked_at IS NULL ORDER BY expires_at DESC LIMIT 1`),
  );
}

async function pastDue(target: { userId?: string; teamId?: string }, kind: "module" | "path", slug: string, days: number) {
  await retrying(() =>
    db.execute(sql`INSERT INTO assignment (organization_id, kind, target_slug, user_id, team_id, target_key, due_at, created_by, created_at)
      VALUES (${org.id}, ${kind}, ${slug}, ${target.userId ?? null}, ${target.teamId ?? null}, ${target.userId ? `u:${target.userId}` : `t:${target.teamId}`}, ${daysFromNow(days)}, ${managerId}, NOW(3))`),
  );
}

const lessonSlugs = async (module: string) =>
  (await q<{ slug: string }>(sql`SELECT cl.slug FROM catalog_lesson cl JOIN catalog_module cm ON cm.id = cl.module_id WHERE cm.slug = ${module} AND cl.retired_at IS NULL ORDER BY cl.position`)).map((r) => r.slug);

beforeAll(async () => {
  org = await fixtureOrg("Cell Race Sprinklers", { teams: ["Loft crew", "Cellar crew"] });
  const manager = await fixturePerson(org, { name: "Zz Cell Race Manager", role: "manager" });
  managerId = manager.id;
  mgr = await clientOf(manager.id);
  const names = ["Ada Racewell", "Bo Racewell", "Cy Racewell", "Di Racewell", "Ed Racewell", "Flo Racewell"];
  for (const [i, name] of names.entries()) people.push(await fixturePerson(org, { name, email: uniqueEmail(`race${i}`), teamId: i < 3 ? org.teams["Loft crew"]! : i < 5 ? org.teams["Cellar crew"]! : null }));
}, 120_000);
afterAll(() => pool.end());

/** The reference: facts per person × module straight from the sources, the status by lib/team/status.ts. */
/** A DATETIME as the driver hands it (a Date, or a string in UTC) → Date. */
const toDate = (v: unknown): Date | null => (v === null || v === undefined ? null : v instanceof Date ? v : new Date(`${String(v).replace(" ", "T")}${/Z$/.test(String(v)) ? "" : "Z"}`));

async function reference(now: Date) {
  const ids = (await q<{ id: string; organization_id: string; team_id: string | null }>(sql`SELECT id, organization_id, team_id FROM user WHERE organization_id = ${org.id}`));
  const modules = await q<{ slug: string; validity_months: number }>(sql`SELECT slug, validity_months FROM catalog_module WHERE retired_at IS NULL`);
  const paths = await q<{ slug: string; module_slugs: unknown }>(sql`SELECT slug, module_slugs FROM catalog_path WHERE retired_at IS NULL`);
  const pathModules = new Map(paths.map((p) => [p.slug, (typeof p.module_slugs === "string" ? JSON.parse(p.module_slugs) : p.module_slugs) as string[]]));
  const out = new Map<string, Map<string, CellFacts>>();
  for (const u of ids) {
    const cells = new Map<string, CellFacts>();
    for (const m of modules) {
      const [l] = await q<{ n: number }>(sql`SELECT COUNT(*) AS n FROM lesson_progress lp JOIN catalog_lesson cl ON cl.id = lp.lesson_id AND cl.retired_at IS NULL JOIN catalog_module cm ON cm.id = cl.module_id WHERE lp.user_id = ${u.id} AND cm.slug = ${m.slug}`);
      const att = await q<{ status: string; score: number | null; passed: number | null; submitted_at: Date | null }>(sql`SELECT status, score, passed, submitted_at FROM quiz_attempt WHERE user_id = ${u.id} AND module_slug = ${m.slug} AND organization_id = ${u.organization_id}`);
      const [co] = await q<{ at: Date | null }>(sql`SELECT MAX(completed_at) AS at FROM module_completion WHERE user_id = ${u.id} AND module_slug = ${m.slug}`);
      const certs = await q<{ expires_at: Date; revoked_at: Date | null }>(sql`SELECT expires_at, revoked_at FROM certificate WHERE user_id = ${u.id} AND kind = 'module' AND subject_slug = ${m.slug} AND organization_id = ${u.organization_id}`);
      const asg = await q<{ kind: string; target_slug: string; due_at: Date }>(sql`SELECT kind, target_slug, due_at FROM assignment WHERE organization_id = ${u.organization_id} AND (user_id = ${u.id} OR (team_id IS NOT NULL AND team_id <=> ${u.team_id}))`);
      const graded = att.filter((a) => a.status === "graded" && a.submitted_at);
      const max = (xs: unknown[]) => xs.map(toDate).filter((x): x is Date => x !== null).reduce<Date | null>((a, b) => (!a || b > a ? b : a), null);
      const dues = asg.filter((a) => (a.kind === "module" ? a.target_slug === m.slug : (pathModules.get(a.target_slug) ?? []).includes(m.slug))).map((a) => toDate(a.due_at)!);
      const scores = att.map((a) => a.score).filter((s): s is number => s !== null);
      cells.set(m.slug, {
        ...NO_FACTS,
        lessonsDone: Number(l!.n),
        attempts: att.length,
        bestScore: scores.length ? Math.max(...scores) : null,
        lastGradedAt: max(graded.map((a) => a.submitted_at)),
        lastPassAt: max(graded.filter((a) => Number(a.passed) === 1).map((a) => a.submitted_at)),
        completedAt: toDate(co?.at),
        certificates: certs.length,
        validUntil: max(certs.filter((c) => !c.revoked_at).map((c) => c.expires_at)),
        dueAt: dues.length ? dues.reduce((a, b) => (b < a ? b : a)) : null,
      });
    }
    out.set(u.id, cells);
  }
  const statusOf = (id: string, slug: string) => cellStatus(out.get(id)!.get(slug)!, modules.find((m) => m.slug === slug)!.validity_months, now);
  return { users: ids, modules, facts: out, statusOf };
}

describe("board cells under concurrent writes", () => {
  it("fire the writes at once", async () => {
    const [a, b, c, d, e, f] = people as [FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson];
    const lessons = await lessonSlugs(MODULES[0]!);
    const lessons2 = await lessonSlugs(MODULES[2]!);
    const clients = await Promise.all(people.map((p) => clientOf(p.id)));
    // seed a few facts first, so that revocations and deletions have something to act on
    await Promise.all([
      gradeOnce(a, MODULES[1]!, true, daysFromNow(-300), { expiresAt: daysFromNow(400) }),
      gradeOnce(b, MODULES[1]!, true, daysFromNow(-700), { expiresAt: daysFromNow(12) }),
      gradeOnce(c, MODULES[2]!, true, daysFromNow(-60), { expiresAt: daysFromNow(600) }),
    ]);
    const ops: (() => Promise<unknown>)[] = [
      () => readAndComplete(clients[0]!, a.id, MODULES[0]!, lessons),
      () => readAndComplete(clients[0]!, a.id, MODULES[2]!, lessons2.slice(0, 2)),
      () => readAndComplete(clients[3]!, d.id, MODULES[0]!, lessons.slice(0, 1)),
      () => gradeOnce(a, MODULES[0]!, false, daysFromNow(-1)),
      () => gradeOnce(a, MODULES[0]!, true, daysFromNow(-1), { expiresAt: daysFromNow(700) }),
      () => gradeOnce(a, MODULES[1]!, false, daysFromNow(-3)),
      () => revokeLatest(a, MODULES[1]!),
      () => revokeLatest(b, MODULES[1]!),
      () => gradeOnce(b, MODULES[1]!, true, daysFromNow(-2), { expiresAt: daysFromNow(20) }),
      () => gradeOnce(c, MODULES[0]!, false, daysFromNow(-4)),
      () => gradeOnce(c, MODULES[0]!, false, daysFromNow(-2)),
      () => revokeLatest(c, MODULES[2]!),
      () => gradeOnce(e, MODULES[2]!, true, daysFromNow(-900), { expiresAt: daysFromNow(-30) }),
      () => gradeOnce(f, MODULES[0]!, true, daysFromNow(-10)),
      () => pastDue({ teamId: org.teams["Loft crew"]! }, "module", MODULES[2]!, -3),
      () => pastDue({ userId: e.id }, "module", MODULES[0]!, -1),
      () => pastDue({ teamId: org.teams["Cellar crew"]! }, "path", "builder-sales", -5),
      () => postJson(mgr, "/api/team/assignments", { kind: "module", slug: MODULES[1]!, userIds: [d.id, f.id], teamIds: [], dueAt: daysFromNow(30).toISOString().slice(0, 10) }),
      () => postJson(mgr, "/api/team/people/" + c.id, { teamId: org.teams["Cellar crew"]! }),
      () => postJson(mgr, "/api/team/people/" + d.id, { teamId: null }),
      () => retrying(() => db.execute(sql`DELETE FROM lesson_progress WHERE user_id = ${d.id} LIMIT 1`)),
    ];
    const results = await Promise.allSettled(ops.map((op) => op()));
    const failed = results.flatMap((r, i) => (r.status === "rejected" ? [`op ${i}: ${String(r.reason)}`] : []));
    expect(failed).toEqual([]);
    // one more round on the settled data: delete an assignment through the API while marks land
    const [asg] = await q<{ id: number }>(sql`SELECT id FROM assignment WHERE organization_id = ${org.id} AND user_id = ${d.id} LIMIT 1`);
    const second = await Promise.allSettled([
      asg ? mgr.fetch(`/api/team/assignments/${asg.id}`, { method: "DELETE" }).then((r) => r.arrayBuffer()) : Promise.resolve(),
      gradeOnce(d, MODULES[1]!, false, daysFromNow(-1)),
      pastDue({ userId: f.id }, "path", "builder-sales", -2),
      gradeOnce(e, MODULES[0]!, true, daysFromNow(-1), { expiresAt: daysFromNow(500) }),
    ]);
    expect(second.filter((r) => r.status === "rejected")).toEqual([]);
    console.log(`[board-cells] deadlocks retried: ${retried.deadlocks}`);
  }, 240_000);

  it("every board cell equals the recomputation from the source tables", async () => {
    const now = new Date();
    const ref = await reference(now);
    const { status, body } = await getJson<Page>(mgr, "/api/team/board?pageSize=200");
    expect(status).toBe(200);
    expect(body.total).toBe(ref.users.length);
    const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
    for (const row of body.rows) {
      for (const m of ref.modules) {
        const f = ref.facts.get(row.id)!.get(m.slug)!;
        const cell = row.cells[m.slug]!;
        expect({ who: row.name, m: m.slug, status: cell.status, lessons: cell.lessonsDone, attempts: cell.attempts, best: cell.bestScore, completed: cell.completedAt, due: cell.dueAt }).toEqual({
          who: row.name,
          m: m.slug,
          status: ref.statusOf(row.id, m.slug),
          lessons: f.lessonsDone,
          attempts: f.attempts,
          best: f.bestScore,
          completed: iso(f.completedAt),
          due: iso(f.dueAt),
        });
      }
    }
  });

  it("every status filter returns exactly the people the recomputation puts in that status", async () => {
    const now = new Date();
    const ref = await reference(now);
    for (const s of ["not_started", "in_progress", "failed", "overdue", "expired", "expiring", "passed"]) {
      const want = ref.users.filter((u) => ref.modules.some((m) => ref.statusOf(u.id, m.slug) === s)).map((u) => u.id).sort();
      const { body } = await getJson<Page>(mgr, `/api/team/board?pageSize=200&status=${s}`);
      expect({ s, total: body.total, ids: body.rows.map((r) => r.id).sort() }).toEqual({ s, total: want.length, ids: want });
      const team = org.teams["Cellar crew"]!;
      const inTeam = ref.users.filter((u) => u.team_id === team && want.includes(u.id)).map((u) => u.id).sort();
      const t = await getJson<Page>(mgr, `/api/team/board?pageSize=200&status=${s}&team=${team}`);
      expect({ s, total: t.body.total, ids: t.body.rows.map((r) => r.id).sort() }).toEqual({ s, total: inTeam.length, ids: inTeam });
    }
  });

  it("the team summary equals the recomputed totals per team", async () => {
    const now = new Date();
    const ref = await reference(now);
    const { body } = await getJson<Totals>(mgr, "/api/team/summary");
    const byTeam = new Map<string, { people: number; passed: number; failed: number; overdue: number; expiring: number; expired: number }>();
    for (const u of ref.users) {
      const k = u.team_id ?? "none";
      const t = byTeam.get(k) ?? { people: 0, passed: 0, failed: 0, overdue: 0, expiring: 0, expired: 0 };
      t.people++;
      for (const m of ref.modules) {
        const s = ref.statusOf(u.id, m.slug);
        if (isDone(s)) t.passed++;
        if (s === "failed") t.failed++;
        if (s === "overdue") t.overdue++;
        if (s === "expiring") t.expiring++;
        if (s === "expired") t.expired++;
      }
      byTeam.set(k, t);
    }
    const got = new Map(body.teams.map((t) => [t.teamId ?? "none", { people: t.people, passed: t.passed, failed: t.failed, overdue: t.overdue, expiring: t.expiring, expired: t.expired }]));
    expect(Object.fromEntries(got)).toEqual(Object.fromEntries(byTeam));
    expect([...byTeam.values()].some((t) => t.overdue > 0 && t.passed > 0)).toBe(true); // the data exercises the rule
  });
});
