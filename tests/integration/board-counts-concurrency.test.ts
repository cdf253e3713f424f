// The stored team totals (lib/team/board-counts.ts; DEVELOPERS.md "Team board: stored cells")
// under concurrent writes: quiz passes and failures with certificates that end around "now" and
// around the 30-day expiring window, revocations, past-due and future assignments, team moves
// through the manager API, a person deleted, the organization's cells rebuilt, all fired at once
// while folds run and the totals are read. The reference is a count of every cell of the
// organization in the same database snapshot as the read (so a read in flight is checked too),
// and afterwards GET /api/team/summary and teamTotals at other clock times (due dates passed,
// certificates entering the window and expiring) against a from-scratch recount of the cells by
// the SQL status rule (recountTeamCounts). board-cells-concurrency.test.ts checks the cells
// themselves against the source tables. No timings here (bench/team-board.ts).
import { randomBytes, randomInt, randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { boardModules, teamTotals } from "@/lib/team";
import { recountTeamCounts } from "@/lib/team/board-cells";
import { countsBesideRecount, foldBoardCounts } from "@/lib/team/board-counts";
import { getJson, postJson, uniqueEmail, type Client } from "../helpers/http";
import { clientOf, daysFromNow, fixtureOrg, fixturePerson, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";
import { deadlockRetrier } from "../helpers/deadlock";

const MODULES = ["freeze-protection", "how-systems-work", "pipe-and-joining", "hydraulics-and-permits"];
const HOUR = 3_600_000;
let org: FixtureOrg;
let mgr: Client;
let managerId: string;
const people: FixturePerson[] = [];
let leaver: FixturePerson;

/** Retries a transaction that lost a deadlock, counting the retries. */
const { retrying, state: retried } = deadlockRetrier(8);

/** An attempt opened then graded in one transaction, with its completion and certificate when passed. */
async function grade(p: FixturePerson, slug: string, passed: boolean, at: Date, expiresAt?: Date) {
  await retrying(() =>
    db.transaction(async (tx) => {
      const id = randomUUID();
      await tx.execute(sql`INSERT INTO quiz_attempt (id, user_id, organization_id, module_slug, seed, status, started_at, pass_mark)
        VALUES (${id}, ${p.id}, ${p.organizationId}, ${slug}, ${randomInt(1, 2 ** 31)}, 'open', ${new Date(at.getTime() - 600_000)}, 80)`);
      await tx.execute(sql`UPDATE quiz_attempt SET status = 'graded', submitted_at = ${at}, score = ${passed ? 90 : 40}, passed = ${passed} WHERE id = ${id}`);
      if (!passed) return;
      const [c] = (await tx.execute(sql`INSERT INTO module_completion (user_id, module_slug, attempt_id, completed_at) VALUES (${p.id}, ${slug}, ${id}, ${at})`)) as unknown as [{ insertId: number }];
      if (!expiresAt) return;
      const n = randomInt(100_000, 999_999);
      await tx.execute(sql`INSERT INTO certificate (serial, serial_year, serial_number, verification_code, user_id, holder_name, organization_id, organization_name, kind, subject_slug, subject_title, ce_hours, completion_id, issued_at, expires_at)
        VALUES (${`TST-8${n}-${randomBytes(3).toString("hex")}`}, ${8000 + randomInt(0, 999)}, ${n}, ${randomBytes(18).toString("base64url")}, ${p.id}, ${p.name}, ${p.organizationId}, 'fixture', 'module', ${slug}, ${slug}, 1, ${c.insertId}, ${at}, ${expiresAt})`);
    }),
  );
}

const revoke = (p: FixturePerson, slug: string) =>
  retrying(() => db.execute(sql`UPDATE certificate SET revoked_at = NOW(3), revoked_by = ${managerId}, revoke_reason = 'test' WHERE user_id = ${p.id} AND subject_slug = ${slug} AND revoked_at IS NULL ORDER BY expires_at DESC LIMIT 1`));

const assign = (target: { userId?: string; teamId?: string }, kind: "module" | "path", slug: string, due: Date) =>
  retrying(() =>
    db.execute(sql`INSERT INTO assignment (organization_id, kind, target_slug, user_id, team_id, target_key, due_at, created_by, created_at)
      VALUES (${org.id}, ${kind}, ${slug}, ${target.userId ?? null}, ${target.teamId ?? null}, ${target.userId ? `u:${target.userId}` : `t:${target.teamId}`}, ${due}, ${managerId}, NOW(3))`),
  );

beforeAll(async () => {
  org = await fixtureOrg("Tally Race Sprinklers", { teams: ["North crew", "South crew", "Yard crew"] });
  const manager = await fixturePerson(org, { name: "Zz Tally Manager", role: "manager" });
  managerId = manager.id;
  mgr = await clientOf(manager.id);
  const teams = [org.teams["North crew"]!, org.teams["South crew"]!, org.teams["Yard crew"]!, null];
  for (let i = 0; i < 10; i++) people.push(await fixturePerson(org, { name: `Tally Person ${i}`, email: uniqueEmail(`tally${i}`), teamId: teams[i % teams.length]! }));
  leaver = await fixturePerson(org, { name: "Tally Leaver", email: uniqueEmail("tally-leaver"), teamId: org.teams["North crew"]! });
  // facts to act on: certificates on both sides of "now" and of the expiring window, failures, due dates
  await Promise.all([
    grade(people[0]!, MODULES[0]!, true, daysFromNow(-300), daysFromNow(29)),
    grade(people[1]!, MODULES[0]!, true, daysFromNow(-300), daysFromNow(31)),
    grade(people[2]!, MODULES[1]!, true, daysFromNow(-700), new Date(Date.now() + 2 * HOUR)),
    grade(people[3]!, MODULES[1]!, false, daysFromNow(-3)),
    grade(leaver, MODULES[2]!, false, daysFromNow(-1)),
    assign({ teamId: org.teams["North crew"]! }, "module", MODULES[2]!, daysFromNow(-2)),
    assign({ userId: people[4]!.id }, "module", MODULES[3]!, daysFromNow(3)),
  ]);
}, 120_000);
afterAll(() => pool.end());

/** The stored totals at `at` must equal the count of every cell at `at`, in the same snapshot. */
async function sameSnapshot(at: Date) {
  const { stored, recounted } = await countsBesideRecount(org.id, at);
  expect({ at: at.toISOString(), stored }).toEqual({ at: at.toISOString(), stored: recounted });
  return recounted;
}

describe("stored team totals under concurrent writes, folds and a moving clock", () => {
  it("every read in flight equals a recount of its own snapshot", async () => {
    const [a, b, c, d, e, f, g, h, i, j] = people as [FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson, FixturePerson];
    const north = org.teams["North crew"]!;
    const south = org.teams["South crew"]!;
    const yard = org.teams["Yard crew"]!;
    const writes: (() => Promise<unknown>)[] = [
      () => grade(a, MODULES[1]!, true, daysFromNow(-1), daysFromNow(700)),
      () => grade(a, MODULES[0]!, false, daysFromNow(-1)),
      () => revoke(a, MODULES[0]!),
      () => revoke(c, MODULES[1]!),
      () => grade(b, MODULES[2]!, true, daysFromNow(-800), daysFromNow(-10)),
      () => grade(c, MODULES[3]!, true, daysFromNow(-2), daysFromNow(30)),
      () => grade(d, MODULES[1]!, true, daysFromNow(-1), daysFromNow(15)),
      () => grade(e, MODULES[0]!, false, daysFromNow(-2)),
      () => grade(e, MODULES[0]!, true, daysFromNow(-1)), // completion without certificate: validity months
      () => grade(f, MODULES[2]!, false, daysFromNow(-1)),
      () => grade(g, MODULES[3]!, true, daysFromNow(-5), new Date(Date.now() + HOUR)),
      () => assign({ teamId: south }, "path", "builder-sales", daysFromNow(-4)),
      () => assign({ teamId: yard }, "module", MODULES[1]!, daysFromNow(20)),
      () => assign({ userId: h.id }, "module", MODULES[0]!, new Date(Date.now() + 3 * HOUR)),
      () => assign({ userId: i.id }, "path", "builder-sales", daysFromNow(40)),
      () => postJson(mgr, "/api/team/assignments", { kind: "module", slug: MODULES[2]!, userIds: [j.id, d.id], teamIds: [], dueAt: daysFromNow(10).toISOString().slice(0, 10) }),
      () => postJson(mgr, `/api/team/people/${a.id}`, { teamId: south }),
      () => postJson(mgr, `/api/team/people/${e.id}`, { teamId: null }),
      () => postJson(mgr, `/api/team/people/${j.id}`, { teamId: north }),
      () => postJson(mgr, `/api/team/people/${g.id}`, { teamId: yard }),
      () => retrying(() => db.execute(sql`DELETE FROM user WHERE id = ${leaver.id}`)),
      () => retrying(() => db.transaction((tx) => tx.execute(sql`CALL board_rebuild(${org.id}, NULL)`))),
      () => retrying(() => db.execute(sql`CALL board_rebuild(${org.id}, NULL)`)),
      // a second wave: more passes and failures with expiries on both sides of now and of the window, moves back
      ...people.map((p, k) => () => grade(p, MODULES[k % MODULES.length]!, k % 3 !== 0, daysFromNow(-1 - k), k % 3 === 0 ? undefined : daysFromNow(-40 + 9 * k))),
      () => postJson(mgr, `/api/team/people/${a.id}`, { teamId: north }),
      () => postJson(mgr, `/api/team/people/${e.id}`, { teamId: yard }),
      () => revoke(d, MODULES[1]!),
    ];
    // four lanes, each running its writes one after another, all lanes at once (the reads and
    // folds below overlap many states, not just the end)
    let writing = true;
    const lanes = [0, 1, 2, 3].map((l) => writes.filter((_, k) => k % 4 === l));
    const done = Promise.all(
      lanes.map(async (lane) => {
        const out: PromiseSettledResult<unknown>[] = [];
        for (const w of lane) out.push(...(await Promise.allSettled([w()])));
        return out;
      }),
    )
      .then((r) => r.flat())
      .finally(() => (writing = false));
    const folds: { folded: number }[] = [];
    const folder = (async () => {
      while (writing) {
        const r = await retrying(() => foldBoardCounts(org.id, { skipLocked: randomInt(0, 2) === 1 }));
        if (r) folds.push(r);
      }
    })();
    let reads = 0;
    const readers = [0, 35, -20].map((days) =>
      (async () => {
        while (writing) {
          await sameSnapshot(daysFromNow(days));
          reads++;
        }
      })(),
    );
    const summaries = (async () => {
      while (writing) expect((await getJson(mgr, "/api/team/summary")).status).toBe(200);
    })();
    const results = await done;
    await Promise.all([folder, summaries, ...readers]);
    expect(results.flatMap((r, k) => (r.status === "rejected" ? [`write ${k}: ${String(r.reason)}`] : []))).toEqual([]);
    expect(reads).toBeGreaterThan(0);
    expect(folds.length).toBeGreaterThan(0);
    console.log(`[board-counts] ${reads} reads and ${folds.length} folds in flight (${folds.reduce((n, f) => n + f.folded, 0)} change rows folded), deadlocks retried: ${retried.deadlocks}`);
    // settled, before and after a fold
    await sameSnapshot(new Date());
    const [pending] = (await pool.query("SELECT COUNT(*) AS n FROM board_count_delta WHERE organization_id = ?", [org.id])) as unknown as [{ n: number }[]];
    await foldBoardCounts(org.id);
    const [after] = (await pool.query("SELECT COUNT(*) AS n FROM board_count_delta WHERE organization_id = ?", [org.id])) as unknown as [{ n: number }[]];
    expect({ pending: Number(pending[0]!.n) >= 0, after: Number(after[0]!.n) }).toEqual({ pending: true, after: 0 });
    await sameSnapshot(new Date());
  }, 240_000);

  it("the summary equals a from-scratch recount of the cells at every clock time, with change rows pending", async () => {
    // change rows not yet folded, so that the read adds them and the clock correction together
    await grade(people[5]!, MODULES[3]!, true, daysFromNow(-1), daysFromNow(25));
    await assign({ userId: people[6]!.id }, "module", MODULES[1]!, new Date(Date.now() + 5 * HOUR));
    const modules = boardModules();
    const times = [daysFromNow(-90), daysFromNow(-1), new Date(), new Date(Date.now() + 2.5 * HOUR), daysFromNow(2), daysFromNow(16), daysFromNow(29.5), daysFromNow(31), daysFromNow(45), daysFromNow(400), daysFromNow(900)];
    const seen = { expiring: 0, overdue: 0, expired: 0, failed: 0, passed: 0 };
    for (const at of times) {
      const totals = await teamTotals({ orgId: org.id, orgName: null }, at);
      const recount = await recountTeamCounts(org.id, modules, at);
      const pick = (t: { passed: number; failed: number; overdue: number; expiring: number; expired: number }) => ({ passed: t.passed, failed: t.failed, overdue: t.overdue, expiring: t.expiring, expired: t.expired });
      const got = Object.fromEntries(totals.filter((t) => Object.values(pick(t)).some((n) => n > 0)).map((t) => [t.teamId ?? "none", pick(t)]));
      const want = Object.fromEntries(recount.filter((t) => Object.values(pick(t)).some((n) => n > 0)).map((t) => [t.teamId ?? "none", pick(t)]));
      expect({ at: at.toISOString(), got }).toEqual({ at: at.toISOString(), got: want });
      for (const t of totals) for (const k of Object.keys(seen) as (keyof typeof seen)[]) seen[k] += t[k];
    }
    // the data exercises every counted status across the times
    expect(Object.values(seen).every((n) => n > 0)).toBe(true);
    const { body } = await getJson<{ teams: { teamId: string | null; passed: number; overdue: number }[] }>(mgr, "/api/team/summary");
    const now = await recountTeamCounts(org.id, modules, new Date());
    for (const t of now) {
      const shown = body.teams.find((x) => x.teamId === t.teamId);
      expect({ team: t.teamId, passed: shown?.passed, overdue: shown?.overdue }).toEqual({ team: t.teamId, passed: t.passed, overdue: t.overdue });
    }
  });
});
