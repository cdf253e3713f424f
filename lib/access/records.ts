import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { formerMembership } from "@/db/schema";
import type { Viewer } from "./index";

/**
 * Whose records a manager sees after an admin moved a person to another organization (README,
 * "Security model"). The records belong to the person. An admin sees all of them.
 *  - The current organization acts on the person and sees what happened from the move onward
 *    (`from` = the move), plus all of the person's certificates: a certificate is proof the person
 *    carries wherever they work.
 *  - An organization the person left sees, read only, what happened while they were its member
 *    (`from` = when they joined it, if by a move; `until` = the move), certificates included, as its
 *    proof of training for that time; it can no longer act on the person.
 *  - Anyone else: nothing.
 */
export type RecordWindow = { current: boolean; from: Date | null; until: Date | null; allCertificates: boolean };

export async function recordWindow(viewer: Viewer, person: { id: string; organizationId: string | null; organizationSince: Date | null }): Promise<RecordWindow | null> {
  if (viewer.role === "admin") return { current: true, from: null, until: null, allCertificates: true };
  if (viewer.role === "manager" && person.organizationId !== null && viewer.organizationId === person.organizationId) return { current: true, from: person.organizationSince, until: null, allCertificates: true };
  if (viewer.role !== "manager" || !viewer.organizationId) return null;
  const [former] = await db
    .select({ joinedAt: formerMembership.joinedAt, leftAt: formerMembership.leftAt })
    .from(formerMembership)
    .where(and(eq(formerMembership.userId, person.id), eq(formerMembership.organizationId, viewer.organizationId)))
    .orderBy(desc(formerMembership.leftAt))
    .limit(1);
  return former ? { current: false, from: former.joinedAt, until: former.leftAt, allCertificates: false } : null;
}

/** Whether a date falls inside the window (start included, end excluded). */
export function inWindow(w: Pick<RecordWindow, "from" | "until">, at: Date | null): boolean {
  if (!at) return w.from === null && w.until === null;
  return (w.from === null || at >= w.from) && (w.until === null || at < w.until);
}
