import "server-only";
/**
 * Read side of sign-offs, each query scoped to who asks: a learner's own submissions per module,
 * the review queue (a manager's own organization; an admin's all), and the small summaries the
 * team board and the person page show. Plain objects with only what the screens need.
 */
import { and, asc, desc, eq, inArray, sql, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import { organization, signOff, signOffEvidence, team, user, type SignOffStatus } from "@/db/schema";
import { AccessError, canManageOrganization, organizationFilter, type Viewer } from "@/lib/access";
import { localizedModule, type ContentLocale } from "@/lib/content";

export type EvidenceItem = { id: string; name: string; contentType: string; size: number; thumbnail: boolean };

export type SignOffItem = {
  id: string;
  moduleSlug: string;
  skillId: string;
  status: SignOffStatus;
  note: string | null;
  submittedAt: Date;
  reviewerName: string | null;
  reviewComment: string | null;
  reviewedAt: Date | null;
  evidence: EvidenceItem[];
};

export type QueueItem = SignOffItem & {
  learner: { id: string; name: string; email: string };
  teamName: string | null;
  organizationName: string | null;
  moduleTitle: string;
  skill: { title: string; observe: string[]; evidence: string } | null;
};

/** URL of the checking route that streams one evidence file (or its thumbnail). */
export const evidenceUrl = (signOffId: string, evidenceId: string, thumb = false) => `/api/sign-offs/${signOffId}/evidence/${evidenceId}${thumb ? "?thumb=1" : ""}`;

async function evidenceOf(ids: string[]): Promise<Map<string, EvidenceItem[]>> {
  const out = new Map<string, EvidenceItem[]>();
  if (!ids.length) return out;
  const rows = await db
    .select({ id: signOffEvidence.id, signOffId: signOffEvidence.signOffId, name: signOffEvidence.originalName, contentType: signOffEvidence.contentType, size: signOffEvidence.size, thumb: signOffEvidence.thumbnailKey })
    .from(signOffEvidence)
    .where(inArray(signOffEvidence.signOffId, ids))
    .orderBy(asc(signOffEvidence.signOffId), asc(signOffEvidence.position));
  for (const r of rows) {
    const list = out.get(r.signOffId) ?? [];
    list.push({ id: r.id, name: r.name, contentType: r.contentType, size: r.size, thumbnail: Boolean(r.thumb) });
    out.set(r.signOffId, list);
  }
  return out;
}

const reviewer = alias(user, "reviewer");

const itemColumns = {
  id: signOff.id,
  moduleSlug: signOff.moduleSlug,
  skillId: signOff.skillId,
  status: signOff.status,
  note: signOff.note,
  submittedAt: signOff.submittedAt,
  reviewerName: reviewer.name,
  reviewComment: signOff.reviewComment,
  reviewedAt: signOff.reviewedAt,
};

/** One person's submissions (newest first), optionally for one module. */
export async function signOffsOf(userId: string, moduleSlug?: string): Promise<SignOffItem[]> {
  const where = moduleSlug ? and(eq(signOff.userId, userId), eq(signOff.moduleSlug, moduleSlug)) : eq(signOff.userId, userId);
  const rows = await db.select(itemColumns).from(signOff).leftJoin(reviewer, eq(reviewer.id, signOff.reviewerId)).where(where).orderBy(desc(signOff.submittedAt)).limit(200);
  const ev = await evidenceOf(rows.map((r) => r.id));
  return rows.map((r) => ({ ...r, evidence: ev.get(r.id) ?? [] }));
}

export type QueueFilter = "submitted" | "approved" | "returned";

/**
 * The review queue: waiting sign-offs oldest first (the longest wait on top); decided ones newest
 * first. Managers see their own organization only; admins every organization (or one, by id).
 */
/** `locale`: the language of module and skill titles, observations and evidence. */
export async function reviewQueue(viewer: Viewer, filter: QueueFilter = "submitted", orgId?: string | null, limit = 100, locale: ContentLocale = "en"): Promise<QueueItem[]> {
  const conds: SQL[] = [eq(signOff.status, filter)];
  const scope = organizationFilter(viewer, orgId);
  if (scope === undefined) throw new AccessError(403, "Only managers and admins review sign-offs.");
  if (scope) conds.push(eq(signOff.organizationId, scope));
  const learner = alias(user, "learner");
  const rows = await db
    .select({
      ...itemColumns,
      learnerId: learner.id,
      learnerName: learner.name,
      learnerEmail: learner.email,
      teamName: team.name,
      organizationName: organization.name,
    })
    .from(signOff)
    .innerJoin(learner, eq(learner.id, signOff.userId))
    .leftJoin(team, eq(team.id, learner.teamId))
    .leftJoin(organization, eq(organization.id, signOff.organizationId))
    .leftJoin(reviewer, eq(reviewer.id, signOff.reviewerId))
    .where(and(...conds))
    .orderBy(filter === "submitted" ? asc(signOff.submittedAt) : desc(signOff.reviewedAt))
    .limit(limit);
  const ev = await evidenceOf(rows.map((r) => r.id));
  return rows.map((r) => {
    const mod = localizedModule(r.moduleSlug, locale);
    const skill = mod?.skills.find((s) => s.id === r.skillId) ?? null;
    return {
      id: r.id,
      moduleSlug: r.moduleSlug,
      skillId: r.skillId,
      status: r.status,
      note: r.note,
      submittedAt: r.submittedAt,
      reviewerName: r.reviewerName,
      reviewComment: r.reviewComment,
      reviewedAt: r.reviewedAt,
      evidence: ev.get(r.id) ?? [],
      learner: { id: r.learnerId, name: r.learnerName, email: r.learnerEmail },
      teamName: r.teamName,
      organizationName: r.organizationName,
      moduleTitle: mod?.meta.title ?? r.moduleSlug,
      skill: skill ? { title: skill.title, observe: skill.observe, evidence: skill.evidence } : null,
    };
  });
}

/** Number of waiting sign-offs in the viewer's queue (for a badge on the team pages). */
export async function waitingCount(viewer: Viewer, orgId?: string | null): Promise<number> {
  const scope = organizationFilter(viewer, orgId);
  if (scope === undefined) return 0;
  const where = scope ? and(eq(signOff.status, "submitted"), eq(signOff.organizationId, scope)) : eq(signOff.status, "submitted");
  const [r] = await db.select({ n: sql<number>`count(*)` }).from(signOff).where(where);
  return Number(r?.n ?? 0);
}

export type SignOffCounts = { approved: number; waiting: number; returned: number };

/**
 * For the team board: per person, how many skills are signed off, waiting and returned (a returned
 * one counts only until the person sends new evidence for that skill). The caller has already
 * scoped `userIds` to what the viewer may see.
 */
export async function signOffCountsFor(userIds: string[]): Promise<Map<string, SignOffCounts>> {
  const out = new Map<string, SignOffCounts>();
  if (!userIds.length) return out;
  const rows = await db
    .select({ userId: signOff.userId, moduleSlug: signOff.moduleSlug, skillId: signOff.skillId, status: signOff.status, at: signOff.submittedAt })
    .from(signOff)
    .where(inArray(signOff.userId, userIds))
    .orderBy(desc(signOff.submittedAt));
  const seen = new Set<string>();
  for (const r of rows) {
    const key = `${r.userId}|${r.moduleSlug}|${r.skillId}`;
    if (seen.has(key)) continue; // only the latest submission per skill counts
    seen.add(key);
    const c = out.get(r.userId) ?? { approved: 0, waiting: 0, returned: 0 };
    if (r.status === "approved") c.approved++;
    else if (r.status === "submitted") c.waiting++;
    else c.returned++;
    out.set(r.userId, c);
  }
  return out;
}

export type PersonSignOff = SignOffItem & { moduleTitle: string; skillTitle: string };

/** For the person page: that person's sign-offs, if the viewer is them, a manager of their organization or an admin. */
export async function signOffsOfPerson(viewer: Viewer, personId: string, locale: ContentLocale = "en"): Promise<PersonSignOff[]> {
  if (personId !== viewer.id) {
    const [person] = await db.select({ organizationId: user.organizationId }).from(user).where(eq(user.id, personId));
    if (!person || !canManageOrganization(viewer, person.organizationId)) throw new AccessError(403, "You cannot see this person's sign-offs.");
  }
  return (await signOffsOf(personId)).map((s) => {
    const mod = localizedModule(s.moduleSlug, locale);
    return { ...s, moduleTitle: mod?.meta.title ?? s.moduleSlug, skillTitle: mod?.skills.find((k) => k.id === s.skillId)?.title ?? s.skillId };
  });
}
