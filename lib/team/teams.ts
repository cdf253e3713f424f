import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, count, eq, isNotNull, isNull, ne } from "drizzle-orm";
import { db } from "@/db/client";
import { team, user } from "@/db/schema";
import { canManageOrganization, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";

/**
 * Teams of one organization (crews, sales offices): create, rename, archive, restore. Every change
 * and its audit row commit in one transaction. Archiving keeps the people on the team and their
 * history; the team only leaves pickers, filters and new invitations.
 */
function isDuplicateKey(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 4; depth++) {
    if ((e as { code?: unknown }).code === "ER_DUP_ENTRY") return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

export type TeamRow = { id: string; name: string; archivedAt: Date | null; people: number };

export async function listTeams(orgId: string): Promise<TeamRow[]> {
  const rows = await db
    .select({ id: team.id, name: team.name, archivedAt: team.archivedAt, people: count(user.id) })
    .from(team)
    .leftJoin(user, and(eq(user.teamId, team.id), eq(user.organizationId, orgId)))
    .where(eq(team.organizationId, orgId))
    .groupBy(team.id, team.name, team.archivedAt)
    .orderBy(asc(team.name));
  return rows.map((r) => ({ ...r, people: Number(r.people) }));
}

async function nameTaken(orgId: string, name: string, exceptId?: string) {
  const where = exceptId ? and(eq(team.organizationId, orgId), eq(team.name, name), ne(team.id, exceptId)) : and(eq(team.organizationId, orgId), eq(team.name, name));
  return (await db.select({ id: team.id }).from(team).where(where).limit(1)).length > 0;
}

const taken = (name: string) => new DomainError("conflict", `A team named “${name}” already exists.`, { name: ["Choose another name"] });

export async function createTeam(viewer: Viewer, orgId: string, name: string, ip: string): Promise<{ id: string; name: string }> {
  if (await nameTaken(orgId, name)) throw taken(name);
  const id = randomUUID();
  try {
    await db.transaction(async (tx) => {
      await tx.insert(team).values({ id, organizationId: orgId, name });
      await audit({ actor: viewer, organizationId: orgId, action: "team.create", targetType: "team", targetId: id, ip, details: { name } }, tx);
    });
  } catch (err) {
    if (isDuplicateKey(err)) throw taken(name);
    throw err;
  }
  return { id, name };
}

/** The team if the viewer manages its organization: unknown → 404, another organization's → 403. */
export async function teamForViewer(viewer: Viewer, id: string) {
  if (!/^[A-Za-z0-9-]{1,36}$/.test(id)) throw new DomainError("not-found", "No such team.");
  const [t] = await db.select().from(team).where(eq(team.id, id));
  if (!t) throw new DomainError("not-found", "No such team.");
  if (!canManageOrganization(viewer, t.organizationId)) throw new DomainError("forbidden", "That belongs to another organization.");
  return t;
}

export async function renameTeam(viewer: Viewer, id: string, name: string, ip: string) {
  const t = await teamForViewer(viewer, id);
  const orgId = t.organizationId;
  if (t.name === name) return { id, name };
  if (await nameTaken(orgId, name, id)) throw taken(name);
  try {
    await db.transaction(async (tx) => {
      await tx.update(team).set({ name }).where(and(eq(team.id, id), eq(team.organizationId, orgId)));
      await audit({ actor: viewer, organizationId: orgId, action: "team.rename", targetType: "team", targetId: id, ip, details: { from: t.name, to: name } }, tx);
    });
  } catch (err) {
    if (isDuplicateKey(err)) throw taken(name);
    throw err;
  }
  return { id, name };
}

export async function setTeamArchived(viewer: Viewer, id: string, archived: boolean, ip: string) {
  const t = await teamForViewer(viewer, id);
  const orgId = t.organizationId;
  const now = new Date();
  await db.transaction(async (tx) => {
    const [r] = await tx
      .update(team)
      .set({ archivedAt: archived ? now : null })
      .where(and(eq(team.id, id), eq(team.organizationId, orgId), archived ? isNull(team.archivedAt) : isNotNull(team.archivedAt)));
    if (r.affectedRows === 0) return;
    await audit({ actor: viewer, organizationId: orgId, action: archived ? "team.archive" : "team.restore", targetType: "team", targetId: id, ip, details: { name: t.name } }, tx);
  });
  return { id, name: t.name, archived };
}
