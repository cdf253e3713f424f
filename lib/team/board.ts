import "server-only";
// Over 300 lines on purpose: the per-person SQL aggregation, the cell rule, the standings used for
// filters and sorts, and the page cut share private helpers; split apart they would have to export
// their internals to each other. The summary over a whole scope is in ./summary.ts.
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { loadCatalog, localizedCatalog, subjectTitle, type ContentLocale } from "@/lib/content";
import type { BoardQuery, BoardStatus } from "./schemas";
import type { OrgScope } from "@/lib/access";
import { cellStatus, expiryOf, isDone, NO_FACTS, type CellFacts } from "./status";
import { cellFacts, countWithStatus, hasStatusSql } from "./board-cells";

/**
 * The team board: people × modules with one status per cell (rule: lib/team/status.ts).
 *
 * Board pages, status filters, the summary and the export read the stored cells (board_cell,
 * kept by triggers; ./board-cells.ts): pages are cut from the people in SQL (a status filter is a
 * condition there), then the page's cells are read in one query. Due-date filters and aggregate
 * sorts read the scope's cells and sort here. factsFor below reads the sources directly (the
 * person page and reminders); assignments count through the person's *current* team, so someone
 * who joins a team later inherits its assignments without any copy.
 */


export type BoardCell = {
  status: BoardStatus;
  dueAt: string | null;
  lessonsDone: number;
  lessonsTotal: number;
  attempts: number;
  bestScore: number | null;
  completedAt: string | null;
  expiresAt: string | null;
};

export type BoardRow = {
  id: string;
  name: string;
  email: string;
  role: string;
  teamId: string | null;
  team: string | null;
  organizationId: string;
  /** the person's language, "en" or "es" */
  language?: string;
  passed: number;
  overdue: number;
  nextDue: string | null;
  cells: Record<string, BoardCell>;
};

export type BoardPage = {
  page: number;
  pageSize: number;
  total: number;
  pages: number;
  modules: { slug: string; title: string }[];
  rows: BoardRow[];
};

export type Person = {
  id: string;
  name: string;
  email: string;
  role: string;
  teamId: string | null;
  team: string | null;
  organizationId: string;
  /** the person's language (pages and mail), "en" or "es" */
  language?: string;
};

export async function rows<T>(query: SQL): Promise<T[]> {
  const [result] = (await db.execute(query)) as unknown as [T[]];
  return result;
}

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);
const date = (v: unknown): Date | null => (v === null || v === undefined ? null : v instanceof Date ? v : new Date(String(v)));

export type AssignmentFact = { kind: string; target_slug: string; user_id: string | null; team_id: string | null; due_at: unknown };
type ModuleInfo = { slug: string; title: string; lessons: number; validityMonths: number };

/** Modules on the board, in teaching order (optionally one). */
export function boardModules(only?: string, locale: ContentLocale = "en"): ModuleInfo[] {
  return localizedCatalog(locale)
    .modules.filter((m) => !only || m.slug === only)
    .map((m) => ({ slug: m.slug, title: m.meta.title, lessons: m.lessons.length, validityMonths: m.meta.validityMonths }));
}

/** item (module or path) → the module slugs it covers, from content. */
export function itemModules(kind: string, slug: string): string[] {
  if (kind === "module") return [slug];
  return loadCatalog().paths.find((p) => p.slug === slug)?.modules ?? [];
}

/** A module's or path's title in the reader's language. */
export function itemTitle(kind: string, slug: string, locale: ContentLocale = "en"): string {
  return subjectTitle(kind, slug, locale);
}

/**
 * Who is on the board: every member of the scope's organization(s) (admins belong to none), or
 * explicit ids. Paged in name order through user_org_name_idx.
 */
type PeopleFilter = { scope: OrgScope; team?: string; q?: string; where?: SQL; count?: () => Promise<number> } | { ids: string[] };

function peopleWhere(f: PeopleFilter): SQL {
  if ("ids" in f) {
    if (f.ids.length === 0) return sql`FALSE`;
    return sql`u.id IN (${sql.join(
      f.ids.map((id) => sql`${id}`),
      sql`, `,
    )})`;
  }
  const parts: SQL[] = [f.scope.orgId ? sql`u.organization_id = ${f.scope.orgId}` : sql`u.organization_id IS NOT NULL`];
  if (f.team === "none") parts.push(sql`u.team_id IS NULL`);
  else if (f.team) parts.push(sql`u.team_id = ${f.team}`);
  if (f.q) {
    const like = `%${f.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    parts.push(sql`(u.name LIKE ${like} OR u.email LIKE ${like})`);
  }
  if (f.where) parts.push(f.where);
  return sql.join(parts, sql` AND `);
}

type PersonRow = { id: string; name: string; email: string; role: string; team_id: string | null; team_name: string | null; organization_id: string; language: string };
const toPerson = (r: PersonRow): Person => ({
  id: r.id,
  name: r.name,
  email: r.email,
  role: r.role,
  teamId: r.team_id,
  team: r.team_name,
  organizationId: r.organization_id,
  language: r.language,
});

function nameOrder(sort: BoardQuery["sort"], dir: "asc" | "desc" | undefined): SQL {
  const d = dir === "desc" ? sql`DESC` : sql`ASC`;
  if (sort === "team") return sql`ORDER BY t.name IS NULL, t.name ${d}, u.name ASC, u.id ASC`;
  return sql`ORDER BY u.name ${d}, u.id ASC`;
}

/** People matching the filter in the given order; with `limit`, one page plus the total count. */
async function listPeople(f: PeopleFilter, order: SQL, limit?: { limit: number; offset: number }): Promise<{ people: Person[]; total: number }> {
  const select = sql`SELECT u.id, u.name, u.email, u.role, u.team_id, t.name AS team_name, u.organization_id, u.language
FROM user u LEFT JOIN team t ON t.id = u.team_id WHERE ${peopleWhere(f)} ${order}`;
  if (!limit) {
    const list = await rows<PersonRow>(select);
    return { people: list.map(toPerson), total: list.length };
  }
  const [list, count] = await Promise.all([
    rows<PersonRow>(sql`${select} LIMIT ${limit.limit} OFFSET ${limit.offset}`),
    "count" in f && f.count ? f.count().then((n) => [{ n }]) : rows<{ n: number | string }>(sql`SELECT COUNT(*) AS n FROM user u WHERE ${peopleWhere(f)}`),
  ]);
  return { people: list.map(toPerson), total: Number(count[0]?.n ?? 0) };
}

/**
 * Facts per person × module for the given people: one query per source, run side by side, each
 * an index range scan whose rows are folded into person × module cells in one pass here.
 * (Measured on MariaDB 10.11 with 5,000 people: streaming the rows and folding them is about
 * three times faster than GROUP BY, which goes through a temporary table keyed by two strings.)
 * Attempts and certificates count in the organization they were earned in (both rows record
 * it); a whole-organization scope reads them by that column. Lesson counts only tell "in
 * progress" from "not started", so a scope-wide aggregate that needs neither skips them.
 */
async function factsFor(people: Person[], f: PeopleFilter, only?: string, lessons = true, known?: AssignmentFact[]): Promise<Map<string, Map<string, CellFacts>>> {
  const out = new Map<string, Map<string, CellFacts>>();
  if (people.length === 0) return out;
  const orgOf = new Map(people.map((p) => [p.id, p.organizationId]));
  const wholeOrg = !("ids" in f) && f.scope.orgId && !f.team && !f.q ? f.scope.orgId : null;
  const byUser = (col: SQL) =>
    "ids" in f
      ? sql`${col} IN (${sql.join(
          f.ids.map((id) => sql`${id}`),
          sql`, `,
        )})`
      : sql`${col} IN (SELECT u.id FROM user u WHERE ${peopleWhere(f)})`;
  const earned = (orgCol: SQL, userCol: SQL) => (wholeOrg ? sql`${orgCol} = ${wholeOrg}` : byUser(userCol));
  const mod = (col: SQL) => (only ? sql`AND ${col} = ${only}` : sql``);
  const orgIds = [...new Set(people.map((p) => p.organizationId))];
  const [lp, qa, co, ce, asg, lessonModules] = await Promise.all([
    lessons ? rows<{ user_id: string; lesson_id: number }>(sql`SELECT lp.user_id, lp.lesson_id FROM lesson_progress lp WHERE ${byUser(sql`lp.user_id`)}`) : Promise.resolve([]),
    rows<{ user_id: string; organization_id: string | null; module_slug: string; status: string; score: number | null; passed: number | null; submitted_at: unknown }>(sql`
SELECT a.user_id, a.organization_id, a.module_slug, a.status, a.score, a.passed, a.submitted_at FROM quiz_attempt a
WHERE ${earned(sql`a.organization_id`, sql`a.user_id`)} ${mod(sql`a.module_slug`)}`),
    rows<{ user_id: string; module_slug: string; completed_at: unknown }>(sql`
SELECT c.user_id, c.module_slug, c.completed_at FROM module_completion c WHERE ${byUser(sql`c.user_id`)} ${mod(sql`c.module_slug`)}`),
    rows<{ user_id: string; organization_id: string | null; subject_slug: string; expires_at: unknown; revoked_at: unknown }>(sql`
SELECT c.user_id, c.organization_id, c.subject_slug, c.expires_at, c.revoked_at FROM certificate c
WHERE ${earned(sql`c.organization_id`, sql`c.user_id`)} AND c.kind = 'module' ${mod(sql`c.subject_slug`)}`),
    known
      ? Promise.resolve(known)
      : rows<AssignmentFact>(sql`
SELECT a.kind, a.target_slug, a.user_id, a.team_id, a.due_at FROM assignment a
WHERE a.organization_id IN (${sql.join(
          orgIds.map((id) => sql`${id}`),
          sql`, `,
        )})`),
    lessons
      ? rows<{ id: number; slug: string }>(sql`SELECT cl.id, cm.slug FROM catalog_lesson cl JOIN catalog_module cm ON cm.id = cl.module_id WHERE cl.retired_at IS NULL`)
      : Promise.resolve([]),
  ]);
  const cell = (userId: string, slug: string): CellFacts | null => {
    if (!orgOf.has(userId)) return null; // a row of someone outside the list (admin, banned, other team)
    let m = out.get(userId);
    if (!m) out.set(userId, (m = new Map()));
    let c = m.get(slug);
    if (!c) m.set(slug, (c = { ...NO_FACTS }));
    return c;
  };
  const moduleOfLesson = new Map(lessonModules.map((l) => [Number(l.id), l.slug]));
  for (const r of lp) {
    const slug = moduleOfLesson.get(Number(r.lesson_id));
    if (!slug || (only && slug !== only)) continue;
    const c = cell(r.user_id, slug);
    if (c) c.lessonsDone++;
  }
  for (const r of qa) {
    if (r.organization_id !== orgOf.get(r.user_id)) continue;
    const c = cell(r.user_id, r.module_slug);
    if (!c) continue;
    c.attempts++;
    if (r.score !== null && (c.bestScore === null || Number(r.score) > c.bestScore)) c.bestScore = Number(r.score);
    const at = r.status === "graded" ? date(r.submitted_at) : null;
    if (at && (!c.lastGradedAt || at > c.lastGradedAt)) c.lastGradedAt = at;
    if (at && Number(r.passed) === 1 && (!c.lastPassAt || at > c.lastPassAt)) c.lastPassAt = at;
  }
  for (const r of co) {
    const c = cell(r.user_id, r.module_slug);
    const at = date(r.completed_at);
    if (c && at && (!c.completedAt || at > c.completedAt)) c.completedAt = at;
  }
  for (const r of ce) {
    if (r.organization_id !== orgOf.get(r.user_id)) continue;
    const c = cell(r.user_id, r.subject_slug);
    if (!c) continue;
    c.certificates++;
    const exp = r.revoked_at ? null : date(r.expires_at);
    if (exp && (!c.validUntil || exp > c.validUntil)) c.validUntil = exp;
  }
  // Effective assignments: direct ones, and those of the person's current team.
  const direct = new Map<string, typeof asg>();
  const ofTeam = new Map<string, typeof asg>();
  for (const a of asg) {
    if (a.user_id) direct.set(a.user_id, [...(direct.get(a.user_id) ?? []), a]);
    if (a.team_id) ofTeam.set(a.team_id, [...(ofTeam.get(a.team_id) ?? []), a]);
  }
  for (const p of people) {
    for (const a of [...(direct.get(p.id) ?? []), ...(p.teamId ? (ofTeam.get(p.teamId) ?? []) : [])]) {
      const due = date(a.due_at)!;
      for (const slug of itemModules(a.kind, a.target_slug)) {
        if (only && slug !== only) continue;
        const c = cell(p.id, slug);
        if (c && (!c.dueAt || due < c.dueAt)) c.dueAt = due;
      }
    }
  }
  return out;
}

function toCells(facts: Map<string, CellFacts> | undefined, modules: ModuleInfo[], now: Date): Record<string, BoardCell> {
  const cells: Record<string, BoardCell> = {};
  for (const m of modules) {
    const f = facts?.get(m.slug) ?? NO_FACTS;
    cells[m.slug] = {
      status: cellStatus(f, m.validityMonths, now),
      dueAt: iso(f.dueAt),
      lessonsDone: f.lessonsDone,
      lessonsTotal: m.lessons,
      attempts: f.attempts,
      bestScore: f.bestScore,
      completedAt: iso(f.completedAt),
      expiresAt: iso(expiryOf(f, m.validityMonths)),
    };
  }
  return cells;
}

function toRow(p: Person, cells: Record<string, BoardCell>): BoardRow {
  let passed = 0;
  let overdue = 0;
  let nextDue: string | null = null;
  for (const c of Object.values(cells)) {
    if (isDone(c.status)) passed++;
    else if (c.dueAt && (!nextDue || c.dueAt < nextDue)) nextDue = c.dueAt;
    if (c.status === "overdue") overdue++;
  }
  return { ...p, passed, overdue, nextDue, cells };
}

/** The modules each person has passed (valid certificate or completion), without lesson rows. */
export async function passedModules(people: Person[], now = new Date()): Promise<Map<string, Set<string>>> {
  const modules = boardModules();
  const out = new Map<string, Set<string>>();
  for (let i = 0; i < people.length; i += 1000) {
    const chunk = people.slice(i, i + 1000);
    const facts = await factsFor(chunk, { ids: chunk.map((p) => p.id) }, undefined, false);
    for (const p of chunk) {
      const f = facts.get(p.id);
      out.set(p.id, new Set(modules.filter((m) => f?.get(m.slug) && isDone(cellStatus(f.get(m.slug)!, m.validityMonths, now))).map((m) => m.slug)));
    }
  }
  return out;
}

/** Board rows (cells and summary) for an explicit list of people. */
/** `known`: the people's assignments when the caller has already read them (one query saved). */
export async function rowsFor(people: Person[], now = new Date(), only?: string, known?: AssignmentFact[]): Promise<BoardRow[]> {
  const modules = boardModules(only);
  const facts = await factsFor(people, { ids: people.map((p) => p.id) }, only, true, known);
  return people.map((p) => toRow(p, toCells(facts.get(p.id), modules, now)));
}

/** Board rows for a list of people from the stored cells (board_cell: one query). */
async function rowsFromCells(people: Person[], now: Date, only?: string): Promise<BoardRow[]> {
  const modules = boardModules(only);
  const facts = await cellFacts(people, only);
  return people.map((p) => toRow(p, toCells(facts.get(p.id), modules, now)));
}

export type BoardFilter = Pick<BoardQuery, "team" | "status" | "module" | "dueBefore" | "sort" | "dir" | "q">;

const needsAggregate = (f: BoardFilter) => Boolean(f.dueBefore || f.sort === "progress" || f.sort === "overdue" || f.sort === "due");

/** The people filter of a page or export: a status filter is a condition on the stored cells. */
function filterOf(scope: OrgScope, f: BoardFilter, now: Date): PeopleFilter {
  if (!f.status) return { scope, team: f.team, q: f.q };
  const { status } = f;
  const modules = boardModules(f.module);
  const orgId = scope.orgId;
  // the total through the cells' organization indexes when the filter is the organization or a team
  const count = orgId && !f.q ? () => countWithStatus(orgId, f.team, status, modules, now) : undefined;
  return { scope, team: f.team, q: f.q, where: hasStatusSql(status, modules, now), count };
}

/** A person's standing over the shown modules, without building cells (scope-wide work). */
type Standing = { person: Person; facts: Map<string, CellFacts> | undefined; statuses: BoardStatus[]; passed: number; overdue: number; nextDue: number | null };

function standingOf(person: Person, facts: Map<string, CellFacts> | undefined, modules: ModuleInfo[], now: Date): Standing {
  let passed = 0;
  let overdue = 0;
  let nextDue: number | null = null;
  const statuses: BoardStatus[] = [];
  for (const m of modules) {
    const f = facts?.get(m.slug) ?? NO_FACTS;
    const s = cellStatus(f, m.validityMonths, now);
    statuses.push(s);
    if (isDone(s)) passed++;
    else if (f.dueAt && (nextDue === null || f.dueAt.getTime() < nextDue)) nextDue = f.dueAt.getTime();
    if (s === "overdue") overdue++;
  }
  return { person, facts, statuses, passed, overdue, nextDue };
}

const collator = new Intl.Collator("en", { sensitivity: "base" });

function compareStandings(sort: BoardQuery["sort"], dir: "asc" | "desc" | undefined): (a: Standing, b: Standing) => number {
  const byName = (a: Standing, b: Standing) => collator.compare(a.person.name, b.person.name) || (a.person.id < b.person.id ? -1 : a.person.id > b.person.id ? 1 : 0);
  const count = dir === "asc" ? 1 : -1; // counts: most first unless asked otherwise
  const d = dir === "desc" ? -1 : 1;
  const nulls = (x: unknown, y: unknown) => (x === null ? 1 : 0) - (y === null ? 1 : 0);
  switch (sort) {
    case "progress":
      return (a, b) => count * (a.passed - b.passed) || byName(a, b);
    case "overdue":
      return (a, b) => count * (a.overdue - b.overdue) || nulls(a.nextDue, b.nextDue) || (a.nextDue ?? 0) - (b.nextDue ?? 0) || byName(a, b);
    case "due":
      return (a, b) => nulls(a.nextDue, b.nextDue) || d * ((a.nextDue ?? 0) - (b.nextDue ?? 0)) || byName(a, b);
    case "team":
      return (a, b) => nulls(a.person.team, b.person.team) || d * collator.compare(a.person.team ?? "", b.person.team ?? "") || byName(a, b);
    default:
      return (a, b) => d * byName(a, b);
  }
}

/**
 * Every matching person in board order (due filters, aggregate sorts): the status filter is a
 * condition in SQL, the stored cells (board_cell) of the matching people are read once and
 * sorted here. Team totals and status-filtered pages in name order never come here.
 */
export async function aggregatedPeople(scope: OrgScope, f: BoardFilter, now: Date): Promise<{ list: Standing[]; complete: boolean; modules: ModuleInfo[] }> {
  const filter = filterOf(scope, f, now);
  const { people } = await listPeople(filter, sql``);
  const modules = boardModules(f.module);
  const lessons = true; // the stored cells carry the lesson counts
  const facts = await cellFacts(people, f.module);
  const dueBefore = f.dueBefore ? new Date(`${f.dueBefore}T23:59:59.999Z`).getTime() : null;
  const list: Standing[] = [];
  for (const p of people) {
    const st = standingOf(p, facts.get(p.id), modules, now);
    if (f.status && !st.statuses.includes(f.status)) continue;
    if (dueBefore !== null && !(st.nextDue !== null && st.nextDue <= dueBefore)) continue;
    list.push(st);
  }
  return { list: list.sort(compareStandings(f.sort, f.dir)), complete: lessons, modules };
}

/** Full rows for a slice of standings: from the facts in hand, or read again with lessons. */
async function rowsOfSlice(slice: Standing[], complete: boolean, modules: ModuleInfo[], now: Date, only?: string): Promise<BoardRow[]> {
  if (complete) return slice.map((s) => toRow(s.person, toCells(s.facts, modules, now)));
  return rowsFromCells(
    slice.map((s) => s.person),
    now,
    only,
  );
}

/** GET /api/team/board: one page. */
export async function boardPage(scope: OrgScope, q: BoardQuery, now = new Date(), locale: ContentLocale = "en"): Promise<BoardPage> {
  const offset = (q.page - 1) * q.pageSize;
  let total: number;
  let pageRows: BoardRow[];
  if (needsAggregate(q)) {
    const all = await aggregatedPeople(scope, q, now);
    total = all.list.length;
    pageRows = await rowsOfSlice(all.list.slice(offset, offset + q.pageSize), all.complete, all.modules, now, q.module);
  } else {
    const listed = await listPeople(filterOf(scope, q, now), nameOrder(q.sort, q.dir), { limit: q.pageSize, offset });
    total = listed.total;
    pageRows = await rowsFromCells(listed.people, now, q.module);
  }
  return {
    page: q.page,
    pageSize: q.pageSize,
    total,
    pages: Math.max(1, Math.ceil(total / q.pageSize)),
    modules: boardModules(q.module, locale).map(({ slug, title }) => ({ slug, title })),
    rows: pageRows,
  };
}

/** Every matching row in board order, in chunks (CSV export). */
export async function* boardRowsInChunks(scope: OrgScope, f: BoardFilter, chunk = 500, now = new Date()): AsyncGenerator<BoardRow[]> {
  if (needsAggregate(f)) {
    const all = await aggregatedPeople(scope, f, now);
    for (let i = 0; i < all.list.length; i += chunk) yield await rowsOfSlice(all.list.slice(i, i + chunk), all.complete, all.modules, now, f.module);
    return;
  }
  const { people } = await listPeople(filterOf(scope, f, now), nameOrder(f.sort, f.dir));
  for (let i = 0; i < people.length; i += chunk) yield await rowsFromCells(people.slice(i, i + chunk), now, f.module);
}
