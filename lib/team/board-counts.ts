import "server-only";
// The stored team totals (db/schema/board.ts: board_count_state, board_team_count,
// board_count_delta; DEVELOPERS.md "Team board: stored cells").
//
// Invariant: for every organization with a board_count_state row, board_team_count holds the
// status counts of a set of cells B evaluated at counted_at T, and B plus the signed rows of
// board_count_delta is exactly the organization's current cells (each cell change writes its
// rows in the writer's own transaction, by trigger). A status is a function of (expiry, due date,
// failed) and the time, so at any time `now`
//
//   counts(now) = counts(T) + Σ deltas · status(delta, T) + Σ cells whose expiry, expiry − 30 days
//                 or due date lies between T and now · (status(cell, now) − status(cell, T))
//
// (a cell outside those ranges has the same status at T and now; a delta row's term at T is what
// the base lacks, and the base's own cells that crossed are exactly the current cells that
// crossed minus the delta rows that crossed: the terms cancel to the formula above). All four
// reads are taken in one consistent snapshot, so a concurrent writer is either wholly in them or
// wholly out. An organization without a state row has no stored counts: T is `now`, the deltas
// alone are its cells.
//
// The fold writes counts(now) as the new base, deletes the delta rows it read and sets T = now,
// in one transaction that holds the state row's lock (a rebuild's recount takes the same lock),
// so a reader sees either the old base with its deltas or the new base with the rest.
import type { PoolConnection, RowDataPacket } from "mysql2/promise";
import { pool } from "@/db/client";
import { DAY_MS } from "@/lib/dates";
import { countedStatus, EXPIRING_DAYS, type CountedStatus } from "./status";

export type TeamCounts = { organizationId: string; teamId: string | null; passed: number; failed: number; overdue: number; expiring: number; expired: number };

type Counts = Record<CountedStatus, number>;
const STATUSES: CountedStatus[] = ["passed", "expiring", "overdue", "expired", "failed"];
const zero = (): Counts => ({ passed: 0, expiring: 0, overdue: 0, expired: 0, failed: 0 });
/** a group: organization, team ("" for none), module */
const keyOf = (org: string, team: string | null, module: string) => `${org}\u0000${team ?? ""}\u0000${module}`;

/** A fold is due when the totals are older than this (the job folds every run; readers fold when the job has not). */
export const FOLD_AFTER_MS = 5 * 60_000;

type Snapshot = {
  /** per organization: the stored counts' time (null: no state row) */
  countedAt: Map<string, Date | null>;
  /** per group: the counts at `at` */
  counts: Map<string, Counts>;
  /** the delta rows read (the fold deletes exactly these) */
  deltaIds: number[];
};

const toDate = (v: unknown): Date | null => (v === null || v === undefined ? null : v instanceof Date ? v : new Date(`${String(v).replace(" ", "T")}Z`));

async function select<T>(conn: PoolConnection, query: string, params: unknown[]): Promise<T[]> {
  const [rows] = await conn.query<RowDataPacket[]>(query, params);
  return rows as T[];
}

/**
 * The counts of the organizations' current cells at `at`, read on `conn` inside a transaction the
 * caller opened with a consistent snapshot (the formula at the top of this file).
 * `withIds`: list every delta row (the fold deletes them by id); otherwise they are summed in SQL.
 */
async function countsAt(conn: PoolConnection, orgIds: string[], at: Date, withIds: boolean): Promise<Snapshot> {
  const states = await select<{ organization_id: string; counted_at: unknown }>(conn, "SELECT organization_id, counted_at FROM board_count_state WHERE organization_id IN (?)", [orgIds]);
  const countedAt = new Map<string, Date | null>(orgIds.map((id) => [id, null]));
  for (const s of states) countedAt.set(s.organization_id, toDate(s.counted_at));
  const timeOf = (org: string) => countedAt.get(org) ?? at;
  const counts = new Map<string, Counts>();
  const group = (org: string, team: string | null, module: string) => {
    const k = keyOf(org, team, module);
    let c = counts.get(k);
    if (!c) counts.set(k, (c = zero()));
    return c;
  };
  const add = (c: Counts, s: CountedStatus | null, n: number) => {
    if (s) c[s] += n;
  };

  const stored = await select<{ organization_id: string; team_key: string; module_slug: string } & Counts>(
    conn,
    "SELECT organization_id, team_key, module_slug, passed, expiring, overdue, expired, failed FROM board_team_count WHERE organization_id IN (?)",
    [orgIds],
  );
  for (const r of stored) {
    if (!countedAt.get(r.organization_id)) continue; // no base without a state row (never written so)
    const c = group(r.organization_id, r.team_key || null, r.module_slug);
    for (const s of STATUSES) c[s] += Number(r[s]);
  }

  type DeltaRow = { id?: number; organization_id: string; team_id: string | null; module_slug: string; expires_at: unknown; due_at: unknown; failed: number; n: number | string };
  const deltas = withIds
    ? await select<DeltaRow>(conn, "SELECT id, organization_id, team_id, module_slug, expires_at, due_at, failed, n FROM board_count_delta WHERE organization_id IN (?)", [orgIds])
    : await select<DeltaRow>(
        conn,
        `SELECT organization_id, team_id, module_slug, expires_at, due_at, failed, SUM(n) AS n FROM board_count_delta WHERE organization_id IN (?)
         GROUP BY organization_id, team_id, module_slug, expires_at, due_at, failed`,
        [orgIds],
      );
  const deltaIds: number[] = [];
  for (const d of deltas) {
    if (withIds) deltaIds.push(Number(d.id));
    add(group(d.organization_id, d.team_id, d.module_slug), countedStatus(toDate(d.expires_at), toDate(d.due_at), Number(d.failed) === 1, timeOf(d.organization_id)), Number(d.n));
  }

  // the cells whose status can differ between T and `at`: a boundary (expiry, expiry − the
  // expiring window, due date) in [min, max] of the two times; the ranges may overlap, so the
  // union is by primary key (UNION removes duplicates of whole rows, which include it)
  const window = EXPIRING_DAYS * DAY_MS;
  const parts: string[] = [];
  const params: unknown[] = [];
  for (const [org, t] of countedAt) {
    if (!t || t.getTime() === at.getTime()) continue;
    const lo = new Date(Math.min(t.getTime(), at.getTime()));
    const hi = new Date(Math.max(t.getTime(), at.getTime()));
    const cols = "c.user_id, c.module_slug, c.organization_id, c.team_id, c.expires_at, c.due_at, c.last_graded_at, c.last_pass_at";
    parts.push(
      `(SELECT ${cols} FROM board_cell c FORCE INDEX (board_cell_org_expiry_idx) WHERE c.organization_id = ? AND c.expires_at BETWEEN ? AND ?)`,
      `(SELECT ${cols} FROM board_cell c FORCE INDEX (board_cell_org_expiry_idx) WHERE c.organization_id = ? AND c.expires_at BETWEEN ? AND ?)`,
      `(SELECT ${cols} FROM board_cell c FORCE INDEX (board_cell_org_due_idx) WHERE c.organization_id = ? AND c.due_at BETWEEN ? AND ?)`,
    );
    params.push(org, lo, hi, org, new Date(lo.getTime() + window), new Date(hi.getTime() + window), org, lo, hi);
  }
  if (parts.length) {
    const crossed = await select<{ organization_id: string; team_id: string | null; module_slug: string; expires_at: unknown; due_at: unknown; last_graded_at: unknown; last_pass_at: unknown }>(
      conn,
      parts.join(" UNION "),
      params,
    );
    for (const c of crossed) {
      const t = countedAt.get(c.organization_id)!;
      const graded = toDate(c.last_graded_at);
      const pass = toDate(c.last_pass_at);
      const failed = graded !== null && (pass === null || pass.getTime() < graded.getTime());
      const expires = toDate(c.expires_at);
      const due = toDate(c.due_at);
      const g = group(c.organization_id, c.team_id, c.module_slug);
      add(g, countedStatus(expires, due, failed, at), 1);
      add(g, countedStatus(expires, due, failed, t), -1);
    }
  }
  return { countedAt, counts, deltaIds };
}

async function inSnapshot<T>(f: (conn: PoolConnection) => Promise<T>, locking = false): Promise<T> {
  const conn = await pool.getConnection();
  try {
    // one snapshot for every read of the transaction (whatever the server's default isolation)
    await conn.query("SET TRANSACTION ISOLATION LEVEL REPEATABLE READ");
    // the fold opens a plain transaction: its snapshot starts at its first plain read, after the
    // state row's lock, so a recount committed before the lock is in it
    await conn.query(locking ? "START TRANSACTION" : "START TRANSACTION WITH CONSISTENT SNAPSHOT, READ ONLY");
    try {
      const out = await f(conn);
      await conn.query("COMMIT");
      return out;
    } catch (err) {
      await conn.query("ROLLBACK").catch(() => undefined);
      throw err;
    }
  } finally {
    conn.release();
  }
}

/**
 * Cells per status, per organization and team, at `now`, over the given modules: the stored
 * totals plus the two corrections (above). `passed` counts every valid cell (passed or expiring).
 * The caller has checked that the viewer may read these organizations.
 */
export async function storedTeamCounts(orgIds: string[], modules: { slug: string }[], now: Date): Promise<TeamCounts[]> {
  if (orgIds.length === 0) return [];
  const snap = await inSnapshot((conn) => countsAt(conn, orgIds, now, false));
  const stale = [...snap.countedAt].filter(([, t]) => !t || Math.abs(Date.now() - t.getTime()) > FOLD_AFTER_MS).map(([id]) => id);
  // keep the corrections small when no job has folded lately (a fold in progress elsewhere is not waited for)
  if (stale.length > 0 && stale.length <= 5) await Promise.all(stale.map((id) => foldBoardCounts(id, { skipLocked: true }).catch(() => undefined)));
  const shown = new Set(modules.map((m) => m.slug));
  const out = new Map<string, TeamCounts>();
  for (const [k, c] of snap.counts) {
    const [org, team, module] = k.split("\u0000") as [string, string, string];
    if (!shown.has(module)) continue;
    const tk = `${org}/${team}`;
    let t = out.get(tk);
    if (!t) out.set(tk, (t = { organizationId: org, teamId: team || null, passed: 0, failed: 0, overdue: 0, expiring: 0, expired: 0 }));
    t.passed += c.passed + c.expiring;
    t.expiring += c.expiring;
    t.overdue += c.overdue;
    t.expired += c.expired;
    t.failed += c.failed;
  }
  return [...out.values()];
}

/**
 * Folds one organization: its totals become the counts at "now", the delta rows read are deleted
 * and counted_at moves to now, in one transaction under the state row's lock. `skipLocked`: give
 * up at once when another fold (or a rebuild's recount) holds it. An organization without a state
 * row gets one first, in its own statement (empty totals are exact at any time, and no totals
 * exist without the row).
 */
export async function foldBoardCounts(orgId: string, opts: { skipLocked?: boolean } = {}): Promise<{ folded: number; changed: number } | null> {
  await pool.query("INSERT IGNORE INTO board_count_state (organization_id, counted_at) SELECT id, UTC_TIMESTAMP(3) FROM organization WHERE id = ?", [orgId]);
  return inSnapshot(async (conn) => {
    const locked = await select<{ counted_at: unknown }>(conn, `SELECT counted_at FROM board_count_state WHERE organization_id = ? FOR UPDATE${opts.skipLocked ? " SKIP LOCKED" : ""}`, [orgId]);
    if (locked.length === 0) return null;
    const at = new Date();
    const snap = await countsAt(conn, [orgId], at, true);
    const old = await select<{ team_key: string; module_slug: string } & Counts>(conn, "SELECT team_key, module_slug, passed, expiring, overdue, expired, failed FROM board_team_count WHERE organization_id = ?", [orgId]);
    const before = new Map(old.map((r) => [keyOf(orgId, r.team_key || null, r.module_slug), r]));
    let changed = 0;
    for (const [k, c] of snap.counts) {
      const [, team, module] = k.split("\u0000") as [string, string, string];
      const b = before.get(k);
      if (b && STATUSES.every((s) => Number(b[s]) === c[s])) continue;
      if (STATUSES.some((s) => c[s] < 0)) throw new Error(`board counts: negative total for ${k}`); // never: the invariant is broken
      changed++;
      if (STATUSES.every((s) => c[s] === 0)) {
        await conn.query("DELETE FROM board_team_count WHERE organization_id = ? AND team_key = ? AND module_slug = ?", [orgId, team, module]);
      } else {
        await conn.query(
          `INSERT INTO board_team_count (organization_id, team_key, module_slug, passed, expiring, overdue, expired, failed) VALUES (?, ?, ?, ?, ?, ?, ?, ?)
           ON DUPLICATE KEY UPDATE passed = VALUES(passed), expiring = VALUES(expiring), overdue = VALUES(overdue), expired = VALUES(expired), failed = VALUES(failed)`,
          [orgId, team, module, c.passed, c.expiring, c.overdue, c.expired, c.failed],
        );
      }
    }
    for (let i = 0; i < snap.deltaIds.length; i += 1000) await conn.query("DELETE FROM board_count_delta WHERE id IN (?)", [snap.deltaIds.slice(i, i + 1000)]);
    await conn.query("UPDATE board_count_state SET counted_at = ? WHERE organization_id = ?", [at, orgId]);
    return { folded: snap.deltaIds.length, changed };
  }, true);
}

/** The job: every organization folded (and delta rows of deleted organizations dropped). */
export async function foldAllBoardCounts(): Promise<{ organizations: number; folded: number; changed: number }> {
  await pool.query("DELETE d FROM board_count_delta d LEFT JOIN organization o ON o.id = d.organization_id WHERE o.id IS NULL");
  const [orgs] = await pool.query<RowDataPacket[]>("SELECT id FROM organization");
  let folded = 0;
  let changed = 0;
  for (const o of orgs) {
    const r = await foldBoardCounts(String(o.id));
    folded += r?.folded ?? 0;
    changed += r?.changed ?? 0;
  }
  return { organizations: orgs.length, folded, changed };
}

/**
 * A check of the invariant: in one snapshot, the stored totals brought to `at` beside a count of
 * every cell of the organization at `at` (the slow way), per team and module. For tests and
 * operators; the summary never calls it.
 */
export async function countsBesideRecount(orgId: string, at: Date): Promise<{ stored: Record<string, Counts>; recounted: Record<string, Counts> }> {
  return inSnapshot(async (conn) => {
    const snap = await countsAt(conn, [orgId], at, false);
    const cells = await select<{ team_id: string | null; module_slug: string; expires_at: unknown; due_at: unknown; last_graded_at: unknown; last_pass_at: unknown }>(
      conn,
      "SELECT team_id, module_slug, expires_at, due_at, last_graded_at, last_pass_at FROM board_cell WHERE organization_id = ?",
      [orgId],
    );
    const recounted: Record<string, Counts> = {};
    for (const c of cells) {
      const graded = toDate(c.last_graded_at);
      const pass = toDate(c.last_pass_at);
      const s = countedStatus(toDate(c.expires_at), toDate(c.due_at), graded !== null && (pass === null || pass.getTime() < graded.getTime()), at);
      if (!s) continue;
      const k = `${c.team_id ?? ""}/${c.module_slug}`;
      (recounted[k] ??= zero())[s]++;
    }
    const stored: Record<string, Counts> = {};
    for (const [k, c] of snap.counts) {
      if (STATUSES.every((s) => c[s] === 0)) continue;
      const [, team, module] = k.split("\u0000") as [string, string, string];
      stored[`${team}/${module}`] = c;
    }
    return { stored, recounted };
  });
}
