import "server-only";
import { and, desc, eq, gt, isNull, or, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { invitation, organization, team } from "@/db/schema";
import { canManageOrganization, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { sendMail } from "@/lib/mail";
import { checkAssignItems, hashInviteToken, inviteMail, newInviteToken } from "./invites";
import { INVITE_DAYS, type AssignItem, type InviteRole } from "./schemas";
import { assertSeatAvailable } from "@/lib/billing";

/**
 * The manager's view of invitations: every invitation with its status, resend (a fresh link on the
 * same row; the old link stops working) and revoke (the seat is free at once). Revoking and
 * accepting race on one conditional UPDATE each, so exactly one of them wins.
 */
export type InviteStatus = "pending" | "accepted" | "revoked" | "replaced" | "expired";

export function inviteStatus(r: { acceptedAt: Date | null; revokedAt: Date | null; revokedBy: string | null; expiresAt: Date }, now = new Date()): InviteStatus {
  if (r.acceptedAt) return "accepted";
  if (r.revokedAt) return r.revokedBy ? "revoked" : "replaced";
  if (r.expiresAt.getTime() <= now.getTime()) return "expired";
  return "pending";
}

export const INVITE_STATUS_LABELS: Record<InviteStatus, string> = {
  pending: "Waiting for acceptance",
  accepted: "Accepted",
  revoked: "Revoked",
  replaced: "Replaced by a newer invitation",
  expired: "Expired",
};

/** Open invitations first, then the last 90 days of the others; at most 300 rows. */
export async function listInvitations(orgId: string, now = new Date()) {
  const since = new Date(now.getTime() - 90 * 86_400_000);
  const rows = await db
    .select({
      id: invitation.id,
      email: invitation.email,
      name: invitation.name,
      role: invitation.role,
      team: team.name,
      language: invitation.language,
      createdAt: invitation.createdAt,
      lastSentAt: invitation.lastSentAt,
      sendCount: invitation.sendCount,
      expiresAt: invitation.expiresAt,
      acceptedAt: invitation.acceptedAt,
      revokedAt: invitation.revokedAt,
      revokedBy: invitation.revokedBy,
      assignOnAccept: invitation.assignOnAccept,
    })
    .from(invitation)
    .leftJoin(team, eq(team.id, invitation.teamId))
    .where(and(eq(invitation.organizationId, orgId), or(gt(invitation.createdAt, since), and(isNull(invitation.acceptedAt), isNull(invitation.revokedAt)))))
    .orderBy(sql`(${invitation.acceptedAt} is null and ${invitation.revokedAt} is null) desc`, desc(invitation.createdAt))
    .limit(300);
  return rows.map((r) => ({ ...r, status: inviteStatus(r, now) }));
}

/** The invitation if the viewer manages its organization: unknown → 404, another organization's → 403. */
async function invitationFor(viewer: Viewer, id: string) {
  if (!/^[A-Za-z0-9-]{1,36}$/.test(id)) throw new DomainError("not-found", "No such invitation.");
  const [row] = await db.select().from(invitation).where(eq(invitation.id, id));
  if (!row) throw new DomainError("not-found", "No such invitation.");
  if (!canManageOrganization(viewer, row.organizationId)) throw new DomainError("forbidden", "That belongs to another organization.");
  return row;
}

/** Withdraws an open invitation: its link stops working and its seat is free at once. */
export async function revokeInvitation(viewer: Viewer, id: string, ip: string) {
  const row = await invitationFor(viewer, id);
  const orgId = row.organizationId;
  const now = new Date();
  const done = await db.transaction(async (tx) => {
    const [r] = await tx
      .update(invitation)
      .set({ revokedAt: now, revokedBy: viewer.id })
      .where(and(eq(invitation.id, id), eq(invitation.organizationId, orgId), isNull(invitation.acceptedAt), isNull(invitation.revokedAt)));
    if (r.affectedRows !== 1) return false;
    await audit({ actor: viewer, organizationId: orgId, action: "invite.revoke", targetType: "invitation", targetId: id, ip, details: { email: row.email } }, tx);
    return true;
  });
  if (!done) {
    const fresh = await invitationFor(viewer, id);
    throw new DomainError("conflict", fresh.acceptedAt ? `${row.email} has already accepted; remove the person from their page instead.` : "This invitation was already withdrawn.");
  }
  return { email: row.email };
}

/**
 * Sends the invitation again with a fresh link (the old one stops working) and a fresh expiry.
 * An expired invitation takes its seat again, so the seat rule is checked under the organization lock.
 */
export async function resendInvitation(viewer: Viewer, id: string, ip: string) {
  const row = await invitationFor(viewer, id);
  const orgId = row.organizationId;
  if (row.acceptedAt) throw new DomainError("conflict", `${row.email} has already accepted this invitation.`);
  if (row.revokedAt) throw new DomainError("conflict", "This invitation was withdrawn or replaced; send a new one from the form.");
  const now = new Date();
  const token = newInviteToken();
  const expiresAt = new Date(now.getTime() + INVITE_DAYS * 86_400_000);
  const wasExpired = row.expiresAt.getTime() <= now.getTime();
  await db.transaction(async (tx) => {
    if (wasExpired) await assertSeatAvailable(orgId, 1, tx);
    const [r] = await tx
      .update(invitation)
      .set({ tokenHash: hashInviteToken(token), expiresAt, lastSentAt: now, sendCount: sql`${invitation.sendCount} + 1` })
      .where(and(eq(invitation.id, id), eq(invitation.organizationId, orgId), isNull(invitation.acceptedAt), isNull(invitation.revokedAt)));
    if (r.affectedRows !== 1) throw new DomainError("conflict", "This invitation was accepted or withdrawn a moment ago; reload the list.");
    await audit({ actor: viewer, organizationId: orgId, action: "invite.resend", targetType: "invitation", targetId: id, ip, details: { email: row.email, wasExpired } }, tx);
  });
  const [org] = await db.select({ name: organization.name }).from(organization).where(eq(organization.id, orgId));
  const [t] = row.teamId ? await db.select({ name: team.name }).from(team).where(eq(team.id, row.teamId)) : [];
  const mail = await sendMail(inviteMail({ to: row.email, name: row.name, orgName: org?.name ?? "", inviterName: viewer.name, role: row.role as InviteRole, teamName: t?.name ?? null, token, expiresAt, language: row.language }));
  return { email: row.email, expiresAt, mailed: mail.ok };
}

/**
 * Adds work (modules or a path with due dates) to an open invitation; it becomes the person's
 * assignments when they accept. An item already carried is updated (new due date), not doubled.
 */
export async function addInvitationWork(viewer: Viewer, id: string, items: AssignItem[], ip: string) {
  const row = await invitationFor(viewer, id);
  if (inviteStatus(row) !== "pending") throw new DomainError("conflict", "Only an open invitation can carry work; send a new invitation first.");
  checkAssignItems(items);
  const merged = new Map((row.assignOnAccept ?? []).map((i) => [`${i.kind}:${i.slug}`, i]));
  for (const i of items) merged.set(`${i.kind}:${i.slug}`, i);
  const list = [...merged.values()];
  if (list.length > 10) throw new DomainError("invalid", "Some fields need attention.", { items: ["At most 10 items per invitation"] });
  await db.transaction(async (tx) => {
    const [r] = await tx
      .update(invitation)
      .set({ assignOnAccept: list })
      .where(and(eq(invitation.id, id), isNull(invitation.acceptedAt), isNull(invitation.revokedAt)));
    if (r.affectedRows !== 1) throw new DomainError("conflict", "This invitation was accepted or withdrawn a moment ago; reload the page.");
    await audit({ actor: viewer, organizationId: row.organizationId, action: "invite.assign", targetType: "invitation", targetId: id, ip, details: { email: row.email, items } }, tx);
  });
  return { email: row.email, items: list };
}
