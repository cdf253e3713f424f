import "server-only";
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { and, eq, gt, inArray, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { assignment, invitation, organization, team, user } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { createAccount } from "@/lib/accounts";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { INVITE_DAYS, endOfDayUtc, type AcceptInviteInput, type AssignItem, type InviteRole } from "./schemas";
import { mailAssigned } from "./assigned-mail";
import { after } from "next/server";
import { getTranslations } from "next-intl/server";
import { loadCatalog } from "@/lib/content";
import { assertSeatAvailable } from "@/lib/billing";
import { addDays, longDate } from "@/lib/dates";
import { greeting, mailDate, mailTranslator } from "@/lib/mail";
import { isLocale, type Locale } from "@/lib/i18n/browser";


/** 256 random bits, URL-safe. Only its SHA-256 is stored: a database leak reveals no usable link. */
export function newInviteToken(): string {
  return randomBytes(32).toString("base64url");
}
export const hashInviteToken = (token: string) => createHash("sha256").update(token, "utf8").digest("hex");

export const inviteUrl = (token: string) => `${env.APP_URL}/invite/${token}`;

export type InviteRow = typeof invitation.$inferSelect;
export type NewInvite = { email: string; name?: string | null; role: InviteRole; teamId: string | null; assign?: AssignItem[]; language: Locale };

/**
 * Writes one invitation inside the caller's transaction: earlier open invitations for the same
 * e-mail in this organization are revoked (their links stop working), then the new one is stored
 * with the hash of a fresh token. Returns the token for the mail (never stored).
 */
export async function insertInvitation(tx: Tx, orgId: string, invite: NewInvite, invitedBy: Viewer, now = new Date()): Promise<{ id: string; token: string; expiresAt: Date; replaced: number }> {
  const [revoked] = await tx
    .update(invitation)
    .set({ revokedAt: now })
    .where(and(eq(invitation.organizationId, orgId), eq(invitation.email, invite.email), isNull(invitation.acceptedAt), isNull(invitation.revokedAt)));
  const token = newInviteToken();
  const id = randomUUID();
  const expiresAt = addDays(now, INVITE_DAYS);
  await tx.insert(invitation).values({
    id,
    organizationId: orgId,
    teamId: invite.teamId,
    email: invite.email,
    name: invite.name ?? null,
    role: invite.role,
    assignOnAccept: invite.assign?.length ? invite.assign : null,
    language: invite.language,
    tokenHash: hashInviteToken(token),
    invitedBy: invitedBy.id,
    createdAt: now,
    expiresAt,
  });
  return { id, token, expiresAt, replaced: revoked.affectedRows };
}

const dateText = (d: Date) => longDate(d);

export function inviteMail(p: { to: string; name?: string | null; orgName: string; inviterName: string; role: InviteRole; teamName?: string | null; token: string; expiresAt: Date; language?: string | null }) {
  const t = mailTranslator(p.language);
  return {
    to: p.to,
    kind: "invite",
    subject: t("invite.subject", { org: p.orgName }),
    text: `${greeting(t, p.name)}

${t("invite.body", {
  inviter: p.inviterName,
  org: p.orgName,
  where: p.teamName ? ` (${p.teamName})` : "",
  role: t(`role.${p.role}`),
  url: inviteUrl(p.token),
  date: mailDate(p.language, p.expiresAt),
  days: INVITE_DAYS,
})}`,
  };
}

/**
 * Whether the e-mail is already a member of this organization. Whether it has an account anywhere
 * else is deliberately not asked: a manager must not learn that (acceptance resolves it).
 */
export async function accountState(email: string, orgId: string): Promise<{ state: "none" } | { state: "member"; name: string }> {
  const [u] = await db.select({ name: user.name }).from(user).where(and(eq(user.email, email), eq(user.organizationId, orgId))).limit(1);
  return u ? { state: "member", name: u.name } : { state: "none" };
}

/** Each module or path carried by an invitation must exist (400 with the field named otherwise). */
export function checkAssignItems(items: AssignItem[] | undefined) {
  if (!items?.length) return;
  const catalog = loadCatalog();
  for (const i of items) {
    const ok = i.kind === "module" ? catalog.modules.some((m) => m.slug === i.slug) : catalog.paths.some((p) => p.slug === i.slug);
    if (!ok) throw new DomainError("invalid", "Some fields need attention.", { assign: [`No ${i.kind === "module" ? "module" : "learning path"} “${i.slug}”`] });
  }
}

/** One invitation from the form. Re-inviting a member changes nothing and says so. */
export async function inviteOne(viewer: Viewer, org: { orgId: string; orgName: string }, input: NewInvite, ip: string) {
  let teamName: string | null = null;
  if (input.teamId) {
    const [t] = await db.select({ name: team.name }).from(team).where(and(eq(team.id, input.teamId), eq(team.organizationId, org.orgId), isNull(team.archivedAt)));
    if (!t) throw new DomainError("invalid", "Some fields need attention.", { teamId: ["Choose one of your organization's teams"] });
    teamName = t.name;
  }
  checkAssignItems(input.assign);
  const existing = await accountState(input.email, org.orgId);
  if (existing.state === "member") {
    const t = await getTranslations("teamApi");
    throw new DomainError("conflict", t("alreadyMember", { name: existing.name, email: input.email, org: org.orgName }));
  }
  const created = await db.transaction(async (tx) => {
    const row = await insertInvitation(tx, org.orgId, input, viewer);
    // After revoking the earlier invitation (a re-send does not take a second seat) and writing the
    // new one (counted once: `written`).
    await assertSeatAvailable(org.orgId, 1, tx, { written: 1 });
    await audit(
      {
        actor: viewer,
        organizationId: org.orgId,
        action: "invite.send",
        targetType: "invitation",
        targetId: row.id,
        ip,
        details: { email: input.email, role: input.role, teamId: input.teamId, language: input.language, replaced: row.replaced },
      },
      tx,
    );
    return row;
  });
  const mail = await sendMail(inviteMail({ to: input.email, name: input.name, orgName: org.orgName, inviterName: viewer.name, role: input.role, teamName, token: created.token, expiresAt: created.expiresAt, language: input.language }));
  return { id: created.id, email: input.email, replaced: created.replaced, mailed: mail.ok, expiresAt: created.expiresAt };
}

export type InviteLookup =
  | { state: "ok"; invite: InviteRow; orgName: string; teamName: string | null }
  | { state: "unknown" | "used" | "revoked" }
  | { state: "expired"; expiresAt: Date };

/** What a link's token points to, and whether it can still be used. */
export async function lookupInvite(token: string, now = new Date()): Promise<InviteLookup> {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return { state: "unknown" };
  const [row] = await db
    .select({ invite: invitation, orgName: organization.name, teamName: team.name })
    .from(invitation)
    .innerJoin(organization, eq(organization.id, invitation.organizationId))
    .leftJoin(team, eq(team.id, invitation.teamId))
    .where(eq(invitation.tokenHash, hashInviteToken(token)));
  if (!row) return { state: "unknown" };
  if (row.invite.acceptedAt) return { state: "used" };
  if (row.invite.revokedAt) return { state: "revoked" };
  if (row.invite.expiresAt.getTime() <= now.getTime()) return { state: "expired", expiresAt: row.invite.expiresAt };
  return { state: "ok", invite: row.invite, orgName: row.orgName, teamName: row.teamName ?? null };
}

/** The refusal a person sees for a link that cannot be used (page and API say the same). */
export function refusalText(l: Exclude<InviteLookup, { state: "ok" }>): { title: string; message: string } {
  switch (l.state) {
    case "used":
      return {
        title: "This invitation has been used",
        message: "An account was already created with this link; each invitation works once. If it was you, sign in. If not, ask your training manager for a new invitation.",
      };
    case "revoked":
      return {
        title: "This invitation was replaced",
        message: "A newer invitation was sent to the same address, or the invitation was withdrawn. Use the link in the most recent invitation mail, or ask your training manager.",
      };
    case "expired":
      return {
        title: "This invitation has expired",
        message: `The link expired on ${dateText(l.expiresAt)}; invitation links work for ${INVITE_DAYS} days. Ask your training manager to send a new one.`,
      };
    default:
      return {
        title: "This invitation link is not valid",
        message: "Check that the whole link from the mail was opened (mail programs sometimes break long links), or ask your training manager for a new invitation.",
      };
  }
}

/**
 * Accepting: the invitation is claimed first with one conditional UPDATE (so a link used twice at
 * the same moment creates one account), then the account is created through better-auth inside
 * the organization; if that fails the claim is released. The e-mail is marked verified: opening
 * the mailed link proved the address.
 */
export async function acceptInvite(input: AcceptInviteInput, headers: Headers, ip: string): Promise<{ email: string; userId: string }> {
  const found = await lookupInvite(input.token);
  if (found.state !== "ok") throw new DomainError("gone", refusalText(found).message);
  const inv = found.invite;
  // Resolved here, not when inviting: an address that already has an account (in another
  // organization, or none) is told so by its owner's own link; the manager never learns it.
  const [holder] = await db.select({ org: user.organizationId }).from(user).where(eq(user.email, inv.email)).limit(1);
  if (holder) {
    throw DomainError.fromStatus(
      409,
      holder.org === inv.organizationId
        ? `${inv.email} is already a member of ${found.orgName}. Sign in with your password.`
        : `${inv.email} already has a Riser account, and a Riser account belongs to one organization. Sign in with it, or ask your training manager to invite another address.`,
    );
  }
  const now = new Date(); // application time, as everywhere dates are written (UTC)
  const [claim] = await db
    .update(invitation)
    .set({ acceptedAt: now })
    .where(and(eq(invitation.id, inv.id), isNull(invitation.acceptedAt), isNull(invitation.revokedAt), gt(invitation.expiresAt, now)));
  if (claim.affectedRows !== 1) throw new DomainError("gone", refusalText({ state: "used" }).message);
  const release = () => db.update(invitation).set({ acceptedAt: null }).where(and(eq(invitation.id, inv.id), isNull(invitation.acceptedUserId)));
  let userId: string;
  try {
    // The team may have been removed since the invitation was sent.
    const teamId = inv.teamId ? ((await db.select({ id: team.id }).from(team).where(eq(team.id, inv.teamId)))[0]?.id ?? null) : null;
    const result = await createAccount({ name: input.name, email: inv.email, password: input.password }, { organizationId: inv.organizationId, teamId, role: inv.role as InviteRole, emailVerified: true }, headers);
    if (!result.ok) {
      await release();
      const emailProblem = result.fieldErrors?.email?.[0];
      if (emailProblem) throw new DomainError("conflict", `${emailProblem} (${inv.email})`);
      throw new DomainError("invalid", result.message, result.fieldErrors);
    }
    userId = result.userId;
  } catch (err) {
    if (!(err instanceof DomainError)) await release().catch(() => undefined);
    throw err;
  }
  await db.transaction(async (tx) => {
    // the invitation's language is the new account's starting language (changeable under Account)
    await tx.update(user).set({ emailVerified: true, language: isLocale(inv.language) ? inv.language : "en" }).where(eq(user.id, userId));
    await tx.update(invitation).set({ acceptedUserId: userId }).where(eq(invitation.id, inv.id));
    await audit(
      { actor: { id: userId, email: inv.email }, organizationId: inv.organizationId, action: "invite.accept", targetType: "invitation", targetId: inv.id, ip, details: { role: inv.role, teamId: inv.teamId } },
      tx,
    );
    // Work the manager attached to the invitation becomes the person's own assignments now.
    for (const item of inv.assignOnAccept ?? []) {
      const dueAt = endOfDayUtc(item.dueAt);
      await tx
        .insert(assignment)
        .values({ organizationId: inv.organizationId, kind: item.kind, targetSlug: item.slug, userId, teamId: null, targetKey: `u:${userId}`, dueAt, createdBy: inv.invitedBy, createdAt: now })
        .onDuplicateKeyUpdate({ set: { dueAt } });
      await audit(
        { actor: { id: userId, email: inv.email }, organizationId: inv.organizationId, action: "assignment.set", targetType: "user", targetId: userId, ip, details: { kind: item.kind, slug: item.slug, dueAt: dueAt.toISOString(), via: "invitation", invitationId: inv.id } },
        tx,
      );
    }
  });
  const items = inv.assignOnAccept ?? [];
  if (items.length) {
    const [inviter] = inv.invitedBy ? await db.select({ name: user.name }).from(user).where(eq(user.id, inv.invitedBy)) : [];
    after(async () => {
      for (const item of items) {
        await mailAssigned({ orgId: inv.organizationId, userIds: [userId], teamIds: [], kind: item.kind, slug: item.slug, dueAt: endOfDayUtc(item.dueAt), assignedBy: inviter?.name ?? null });
      }
    });
  }
  return { email: inv.email, userId };
}

/** Open invitations of an organization (for the invite page). */
export async function openInvitations(orgId: string, now = new Date()) {
  return db
    .select({ id: invitation.id, email: invitation.email, name: invitation.name, role: invitation.role, team: team.name, createdAt: invitation.createdAt, expiresAt: invitation.expiresAt })
    .from(invitation)
    .leftJoin(team, eq(team.id, invitation.teamId))
    .where(and(eq(invitation.organizationId, orgId), isNull(invitation.acceptedAt), isNull(invitation.revokedAt), gt(invitation.expiresAt, now)))
    .orderBy(sql`${invitation.createdAt} desc`)
    .limit(200);
}

/** E-mails among `emails` with an open invitation in the organization. */
export async function pendingEmails(orgId: string, emails: string[], tx: Tx | typeof db = db): Promise<Set<string>> {
  const out = new Set<string>();
  for (let i = 0; i < emails.length; i += 500) {
    const chunk = emails.slice(i, i + 500);
    if (!chunk.length) continue;
    const rows = await tx
      .select({ email: invitation.email })
      .from(invitation)
      .where(and(eq(invitation.organizationId, orgId), inArray(invitation.email, chunk), isNull(invitation.acceptedAt), isNull(invitation.revokedAt), gt(invitation.expiresAt, new Date())));
    for (const r of rows) out.add(r.email);
  }
  return out;
}
