import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { assignment, session, team, user } from "@/db/schema";
import { canManageOrganization, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { forgetCachedSessions } from "@/lib/auth";
import type { InviteRole } from "./schemas";

/**
 * A manager's changes to one person of their organization: team and role (learner, sales, manager;
 * never admin), and removal from the organization. Each change and its audit row commit in one
 * transaction. Removal frees the seat (seats count the organization's members) and keeps the
 * person's account, progress and certificates: certificates carry the holder's and the
 * organization's names, so they stay verifiable.
 */
type Target = { id: string; name: string; email: string; role: string; organizationId: string; teamId: string | null };

async function target(viewer: Viewer, personId: string): Promise<Target> {
  if (!/^[A-Za-z0-9-]{1,36}$/.test(personId)) throw new DomainError("not-found", "No such person.");
  const [p] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, organizationId: user.organizationId, teamId: user.teamId })
    .from(user)
    .where(eq(user.id, personId));
  if (!p || !p.organizationId) throw new DomainError("not-found", "No such person.");
  if (!canManageOrganization(viewer, p.organizationId)) throw new DomainError("forbidden", "That belongs to another organization.");
  if (p.role === "admin") throw new DomainError("forbidden", "Administrators are managed on the admin console.");
  return { ...p, organizationId: p.organizationId };
}

export async function updatePerson(viewer: Viewer, personId: string, input: { teamId?: string | null; role?: InviteRole }, ip: string) {
  const p = await target(viewer, personId);
  const changes: { teamId?: string | null; role?: InviteRole } = {};
  if (input.teamId !== undefined && input.teamId !== p.teamId) {
    if (input.teamId !== null) {
      const [t] = await db.select({ id: team.id }).from(team).where(and(eq(team.id, input.teamId), eq(team.organizationId, p.organizationId), isNull(team.archivedAt)));
      if (!t) throw new DomainError("invalid", "Some fields need attention.", { teamId: ["Choose one of your organization's active teams"] });
    }
    changes.teamId = input.teamId;
  }
  if (input.role !== undefined && input.role !== p.role) {
    if (p.id === viewer.id) throw new DomainError("invalid", "Some fields need attention.", { role: ["You cannot change your own role; ask another manager."] });
    changes.role = input.role;
  }
  if (Object.keys(changes).length === 0) return { changed: false, person: p };
  await db.transaction(async (tx) => {
    await tx.update(user).set(changes).where(and(eq(user.id, p.id), eq(user.organizationId, p.organizationId)));
    await audit(
      {
        actor: viewer,
        organizationId: p.organizationId,
        action: "person.update",
        targetType: "user",
        targetId: p.id,
        ip,
        details: {
          ...(changes.teamId !== undefined ? { team: { from: p.teamId, to: changes.teamId } } : {}),
          ...(changes.role !== undefined ? { role: { from: p.role, to: changes.role } } : {}),
        },
      },
      tx,
    );
  });
  forgetCachedSessions(p.id);
  return { changed: true, person: { ...p, ...changes } };
}

/**
 * Removes the person from the organization: they leave it and its team, become a learner without
 * an organization, their personal assignments there are dropped and their sessions end (the next
 * sign-in sees the new state). Account, progress and certificates stay.
 */
export async function removePerson(viewer: Viewer, personId: string, ip: string) {
  const p = await target(viewer, personId);
  if (p.id === viewer.id) throw new DomainError("invalid", "You cannot remove yourself from your organization.");
  await db.transaction(async (tx) => {
    const [r] = await tx.update(user).set({ organizationId: null, teamId: null, role: "learner" }).where(and(eq(user.id, p.id), eq(user.organizationId, p.organizationId)));
    if (r.affectedRows !== 1) throw new DomainError("conflict", "This person was changed at the same moment; reload the page.");
    await tx.delete(assignment).where(and(eq(assignment.organizationId, p.organizationId), eq(assignment.userId, p.id)));
    await tx.delete(session).where(eq(session.userId, p.id));
    await audit(
      { actor: viewer, organizationId: p.organizationId, action: "person.remove", targetType: "user", targetId: p.id, ip, details: { email: p.email, role: p.role, teamId: p.teamId } },
      tx,
    );
  });
  forgetCachedSessions(p.id);
  return { removed: true, name: p.name, email: p.email };
}
