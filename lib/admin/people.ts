import "server-only";
import { and, count, eq, gt, isNull, like, or, sql, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { db, type Tx } from "@/db/client";
import { assignment, formerMembership, organization, session, signOff, team, user } from "@/db/schema";
import type { Role, Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { forgetCachedSessions } from "@/lib/auth";
import { containing, iso, offsetOf, ordered } from "./paging";
import type { Paged, peopleQuery } from "./schemas";

export type PersonRow = {
  id: string;
  name: string;
  email: string;
  role: string;
  emailVerified: boolean;
  banned: boolean;
  banReason: string | null;
  banExpires: string | null;
  organizationId: string | null;
  organization: string | null;
  team: string | null;
  sessions: number;
  createdAt: string | null;
};

type Actor = Pick<Viewer, "id" | "email">;
/** What an admin action needs from the request: the admin's own headers (better-auth checks them) and address. */
export type RequestContext = { headers: Headers; ip: string };

export async function listPeople(q: z.infer<typeof peopleQuery>): Promise<Paged<PersonRow>> {
  const filters: (SQL | undefined)[] = [];
  if (q.q) filters.push(or(like(user.name, containing(q.q)), like(user.email, containing(q.q))));
  if (q.role) filters.push(eq(user.role, q.role));
  if (q.organizationId === "none") filters.push(isNull(user.organizationId));
  else if (q.organizationId) filters.push(eq(user.organizationId, q.organizationId));
  if (q.status === "banned") filters.push(eq(user.banned, true));
  if (q.status === "active") filters.push(or(eq(user.banned, false), isNull(user.banned)));
  const where = and(...filters);

  const live = db
    .select({ userId: session.userId, n: count().as("live_n") })
    .from(session)
    .where(gt(session.expiresAt, new Date()))
    .groupBy(session.userId)
    .as("live");
  const sortColumn = { name: user.name, email: user.email, role: user.role, organization: organization.name, createdAt: user.createdAt }[q.sort];
  const rows = await db
    .select({
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      emailVerified: user.emailVerified,
      banned: user.banned,
      banReason: user.banReason,
      banExpires: user.banExpires,
      organizationId: user.organizationId,
      organization: organization.name,
      team: team.name,
      sessions: sql<number>`coalesce(${live.n}, 0)`,
      createdAt: user.createdAt,
    })
    .from(user)
    .leftJoin(organization, eq(organization.id, user.organizationId))
    .leftJoin(team, eq(team.id, user.teamId))
    .leftJoin(live, eq(live.userId, user.id))
    .where(where)
    .orderBy(ordered(sortColumn, q.dir), ordered(user.id, "asc"))
    .limit(q.pageSize)
    .offset(offsetOf(q));
  const [total] = await db.select({ n: count() }).from(user).leftJoin(organization, eq(organization.id, user.organizationId)).where(where);
  return {
    rows: rows.map((r) => ({
      ...r,
      banned: Boolean(r.banned),
      sessions: Number(r.sessions),
      banExpires: iso(r.banExpires),
      createdAt: iso(r.createdAt),
    })),
    total: total?.n ?? 0,
    page: q.page,
    pageSize: q.pageSize,
  };
}

type Target = { id: string; name: string; email: string; role: string; organizationId: string | null; teamId: string | null; banned: boolean };

async function findPerson(id: string): Promise<Target> {
  const [row] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, organizationId: user.organizationId, teamId: user.teamId, banned: user.banned })
    .from(user)
    .where(eq(user.id, id));
  if (!row) throw new DomainError("not-found", "No such person.");
  return { ...row, banned: Boolean(row.banned) };
}

/**
 * Applies one admin change and writes its audit row in the same transaction, on the same
 * connection: both commit or neither does. (The change is written here rather than through
 * better-auth's admin endpoints, which would commit on a connection of their own.)
 */
async function auditedChange(entry: Parameters<typeof audit>[0], change: (tx: Tx) => Promise<unknown>): Promise<void> {
  await db.transaction(async (tx) => {
    await change(tx);
    await audit(entry, tx);
  });
  // every change here is to a person (role, ban, sessions): their cached sessions stop at once
  if (entry.targetType === "user" && entry.targetId) forgetCachedSessions(entry.targetId);
}

export async function changeRole(actor: Actor, personId: string, role: Role, reason: string, ctx: RequestContext): Promise<void> {
  const person = await findPerson(personId);
  if (person.id === actor.id) throw new DomainError("invalid", "You cannot change your own role; ask another admin.");
  if (person.role === role) throw new DomainError("invalid", "Some fields need attention.", { role: [`${person.name} already has this role.`] });
  if (role !== "admin" && !person.organizationId) {
    throw new DomainError("invalid", "Some fields need attention.", { role: ["Move this person into an organization first: every role but admin belongs to one."] });
  }
  await auditedChange(
    { actor, organizationId: person.organizationId, action: "user.role", targetType: "user", targetId: person.id, reason, ip: ctx.ip, details: { from: person.role, to: role } },
    (tx) => tx.update(user).set({ role, updatedAt: new Date() }).where(eq(user.id, person.id)),
  );
}

export async function moveOrganization(actor: Actor, personId: string, organizationId: string, reason: string | undefined, ctx: RequestContext): Promise<void> {
  const person = await findPerson(personId);
  const [dest] = await db.select({ id: organization.id, name: organization.name }).from(organization).where(eq(organization.id, organizationId));
  if (!dest) throw new DomainError("invalid", "Some fields need attention.", { organizationId: ["No such organization."] });
  if (person.organizationId === dest.id) throw new DomainError("invalid", "Some fields need attention.", { organizationId: [`${person.name} is already in ${dest.name}.`] });
  await db.transaction(async (tx) => {
    // The records rule after a move (lib/access/records.ts): the organization left keeps read-only
    // sight of the time the person was its member; its assignments to them end (team ones end with
    // the team); sign-offs still waiting for review go to the new organization's managers.
    const now = new Date();
    let ended: { assignments: number; signOffsMoved: number } = { assignments: 0, signOffsMoved: 0 };
    if (person.organizationId) {
      const [since] = await tx.select({ at: user.organizationSince }).from(user).where(eq(user.id, person.id));
      await tx.insert(formerMembership).values({ userId: person.id, organizationId: person.organizationId, joinedAt: since?.at ?? null, leftAt: now });
      const [a] = await tx.delete(assignment).where(and(eq(assignment.organizationId, person.organizationId), eq(assignment.userId, person.id)));
      const [s] = await tx
        .update(signOff)
        .set({ organizationId: dest.id })
        .where(and(eq(signOff.userId, person.id), eq(signOff.organizationId, person.organizationId), eq(signOff.status, "submitted")));
      ended = { assignments: a.affectedRows, signOffsMoved: s.affectedRows };
    }
    // Teams belong to one organization, so the person leaves their team.
    await tx.update(user).set({ organizationId: dest.id, teamId: null, organizationSince: now }).where(eq(user.id, person.id));
    await audit(
      {
        actor,
        organizationId: dest.id,
        action: "user.move",
        targetType: "user",
        targetId: person.id,
        reason: reason ?? null,
        ip: ctx.ip,
        details: { from: person.organizationId, to: dest.id, teamCleared: person.teamId, ...ended },
      },
      tx,
    );
  });
  forgetCachedSessions(person.id);
}

export async function banPerson(actor: Actor, personId: string, reason: string, days: number | null, ctx: RequestContext): Promise<void> {
  const person = await findPerson(personId);
  if (person.id === actor.id) throw new DomainError("invalid", "You cannot ban yourself.");
  if (person.banned) throw new DomainError("invalid", `${person.name} is already banned.`);
  await auditedChange(
    { actor, organizationId: person.organizationId, action: "user.ban", targetType: "user", targetId: person.id, reason, ip: ctx.ip, details: { days } },
    // the ban, as better-auth's admin plugin stores it, and every session of the person ended
    async (tx) => {
      await tx
        .update(user)
        .set({ banned: true, banReason: reason, banExpires: days ? new Date(Date.now() + days * 86_400_000) : null, updatedAt: new Date() })
        .where(eq(user.id, person.id));
      await tx.delete(session).where(eq(session.userId, person.id));
    },
  );
}

export async function unbanPerson(actor: Actor, personId: string, reason: string | undefined, ctx: RequestContext): Promise<void> {
  const person = await findPerson(personId);
  if (!person.banned) throw new DomainError("invalid", `${person.name} is not banned.`);
  await auditedChange(
    { actor, organizationId: person.organizationId, action: "user.unban", targetType: "user", targetId: person.id, reason: reason ?? null, ip: ctx.ip },
    (tx) => tx.update(user).set({ banned: false, banReason: null, banExpires: null, updatedAt: new Date() }).where(eq(user.id, person.id)),
  );
}

export async function signOutPerson(actor: Actor, personId: string, reason: string | undefined, ctx: RequestContext): Promise<{ sessionsEnded: number }> {
  const person = await findPerson(personId);
  const [live] = await db.select({ n: count() }).from(session).where(and(eq(session.userId, person.id), gt(session.expiresAt, new Date())));
  const sessionsEnded = live?.n ?? 0;
  await auditedChange(
    { actor, organizationId: person.organizationId, action: "user.sign-out", targetType: "user", targetId: person.id, reason: reason ?? null, ip: ctx.ip, details: { sessionsEnded } },
    (tx) => tx.delete(session).where(eq(session.userId, person.id)),
  );
  return { sessionsEnded };
}
