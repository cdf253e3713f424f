import "server-only";
import { and, asc, eq, inArray, or, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { assignment, team, user } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { loadCatalog, type ContentLocale } from "@/lib/content";
import { after } from "next/server";
import { mailAssigned } from "./assigned-mail";
import { itemModules, itemTitle, rowsFor, type BoardCell, type Person } from "./board";

export { itemTitle };
import { endOfDayUtc, type BoardStatus } from "./schemas";
import type { OrgScope } from "@/lib/access";
import { isDone } from "./status";

/** Assign one module or path to people and/or whole teams; a repeat updates the due date. */
export async function createAssignments(
  viewer: Viewer,
  org: { orgId: string },
  input: { kind: "module" | "path"; slug: string; userIds: string[]; teamIds: string[]; dueAt: string },
  ip: string,
) {
  const catalog = loadCatalog();
  const exists = input.kind === "module" ? catalog.modules.some((m) => m.slug === input.slug) : catalog.paths.some((p) => p.slug === input.slug);
  if (!exists) throw new DomainError("invalid", "Some fields need attention.", { slug: [`No ${input.kind === "module" ? "module" : "learning path"} “${input.slug}”`] });
  const userIds = [...new Set(input.userIds)];
  const teamIds = [...new Set(input.teamIds)];
  const people = userIds.length
    ? await db.select({ id: user.id }).from(user).where(and(inArray(user.id, userIds), eq(user.organizationId, org.orgId)))
    : [];
  if (people.length !== userIds.length) throw new DomainError("invalid", "Some fields need attention.", { userIds: ["Choose people of your own organization"] });
  const teams = teamIds.length ? await db.select({ id: team.id }).from(team).where(and(inArray(team.id, teamIds), eq(team.organizationId, org.orgId))) : [];
  if (teams.length !== teamIds.length) throw new DomainError("invalid", "Some fields need attention.", { teamIds: ["Choose teams of your own organization"] });
  const dueAt = endOfDayUtc(input.dueAt);
  const now = new Date();
  const targets = [...userIds.map((id) => ({ userId: id, teamId: null, targetKey: `u:${id}` })), ...teamIds.map((id) => ({ userId: null, teamId: id, targetKey: `t:${id}` }))];
  await db.transaction(async (tx) => {
    for (const t of targets) {
      await tx
        .insert(assignment)
        .values({ organizationId: org.orgId, kind: input.kind, targetSlug: input.slug, ...t, dueAt, createdBy: viewer.id, createdAt: now })
        .onDuplicateKeyUpdate({ set: { dueAt, createdBy: viewer.id } });
      await audit(
        {
          actor: viewer,
          organizationId: org.orgId,
          action: "assignment.set",
          targetType: t.userId ? "user" : "team",
          targetId: (t.userId ?? t.teamId)!,
          ip,
          details: { kind: input.kind, slug: input.slug, dueAt: dueAt.toISOString() },
        },
        tx,
      );
    }
  });
  // Tell the people (once per item): after the response, so a slow mail server never holds the form.
  after(() => mailAssigned({ orgId: org.orgId, userIds, teamIds, kind: input.kind, slug: input.slug, dueAt, assignedBy: viewer.name }).then(() => undefined));
  return { assigned: targets.length, dueAt: dueAt.toISOString() };
}

export async function deleteAssignment(viewer: Viewer, id: number, canManage: (orgId: string) => boolean, ip: string) {
  const [row] = await db.select().from(assignment).where(eq(assignment.id, id));
  if (!row) throw new DomainError("not-found", "No such assignment.");
  if (!canManage(row.organizationId)) throw new DomainError("forbidden", "That belongs to another organization.");
  await db.transaction(async (tx) => {
    await tx.delete(assignment).where(eq(assignment.id, id));
    await audit(
      {
        actor: viewer,
        organizationId: row.organizationId,
        action: "assignment.remove",
        targetType: row.userId ? "user" : "team",
        targetId: (row.userId ?? row.teamId)!,
        ip,
        details: { kind: row.kind, slug: row.targetSlug, dueAt: row.dueAt.toISOString() },
      },
      tx,
    );
  });
}

export type AssignmentListRow = {
  id: number;
  kind: string;
  slug: string;
  title: string;
  dueAt: string;
  target: string;
  targetType: "person" | "team";
  organizationId: string;
  past: boolean;
};

/** Assignments in scope, soonest due first. */
export async function listAssignments(scope: OrgScope, now = new Date(), locale: ContentLocale = "en"): Promise<AssignmentListRow[]> {
  const rows = await db
    .select({ a: assignment, personName: user.name, teamName: team.name })
    .from(assignment)
    .leftJoin(user, eq(user.id, assignment.userId))
    .leftJoin(team, eq(team.id, assignment.teamId))
    .where(scope.orgId ? eq(assignment.organizationId, scope.orgId) : undefined)
    .orderBy(asc(assignment.dueAt), asc(assignment.id))
    .limit(500);
  return rows.map((r) => ({
    id: r.a.id,
    kind: r.a.kind,
    slug: r.a.targetSlug,
    title: itemTitle(r.a.kind, r.a.targetSlug, locale),
    dueAt: r.a.dueAt.toISOString(),
    target: r.a.userId ? (r.personName ?? "(removed person)") : (r.teamName ?? "(removed team)"),
    targetType: r.a.userId ? "person" : "team",
    organizationId: r.a.organizationId,
    past: r.a.dueAt.getTime() < now.getTime(),
  }));
}

export type AssignedItem = {
  id: number;
  kind: "module" | "path";
  slug: string;
  title: string;
  dueAt: string;
  via: "you" | "team";
  status: BoardStatus;
  modulesDone: number;
  modules: number;
  /** first module of the item that is not done (where to continue) */
  nextModule: string | null;
};

/**
 * One person's effective assignments (direct, and through their current team), each with its
 * status from the board's cells, ordered by due date. One item per assignment row.
 */
/** `locale`: the language of the items' titles. */
export async function assignedWork(person: Person, now = new Date(), locale: ContentLocale = "en"): Promise<{ items: AssignedItem[]; cells: Record<string, BoardCell> }> {
  const rows = await db
    .select()
    .from(assignment)
    .where(
      and(
        eq(assignment.organizationId, person.organizationId),
        person.teamId ? or(eq(assignment.userId, person.id), eq(assignment.teamId, person.teamId)) : eq(assignment.userId, person.id),
      ),
    )
    .orderBy(asc(assignment.dueAt), asc(assignment.id));
  // the person's direct and team assignments just read are all the board rule needs for them
  const known = rows.map((a) => ({ kind: a.kind, target_slug: a.targetSlug, user_id: a.userId, team_id: a.teamId, due_at: a.dueAt }));
  const [row] = await rowsFor([person], now, undefined, known);
  const cells = row?.cells ?? {};
  const items = rows.map((a): AssignedItem => {
    const mods = itemModules(a.kind, a.targetSlug);
    const done = mods.filter((m) => cells[m] && isDone(cells[m].status)).length;
    const started = mods.some((m) => cells[m] && cells[m].status !== "not_started");
    let status: BoardStatus;
    if (a.kind === "module") status = cells[a.targetSlug]?.status ?? "not_started";
    else if (mods.length > 0 && done === mods.length) status = mods.some((m) => cells[m]?.status === "expiring") ? "expiring" : "passed";
    else if (a.dueAt.getTime() < now.getTime()) status = "overdue";
    else status = started ? "in_progress" : "not_started";
    return {
      id: a.id,
      kind: a.kind as "module" | "path",
      slug: a.targetSlug,
      title: itemTitle(a.kind, a.targetSlug, locale),
      dueAt: a.dueAt.toISOString(),
      via: a.userId ? "you" : "team",
      status,
      modulesDone: done,
      modules: mods.length,
      nextModule: mods.find((m) => !(cells[m] && isDone(cells[m].status))) ?? null,
    };
  });
  return { items, cells };
}

/** People search for the assign form (name or e-mail), at most 20. */
export async function searchPeople(scope: OrgScope, q: string) {
  const like = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  return db
    .select({ id: user.id, name: user.name, email: user.email, team: team.name })
    .from(user)
    .leftJoin(team, eq(team.id, user.teamId))
    .where(
      and(
        scope.orgId ? eq(user.organizationId, scope.orgId) : sql`${user.organizationId} IS NOT NULL`,
        sql`${user.role} <> 'admin'`,
        q ? or(sql`${user.name} LIKE ${like}`, sql`${user.email} LIKE ${like}`) : undefined,
      ),
    )
    .orderBy(asc(user.name))
    .limit(20);
}
