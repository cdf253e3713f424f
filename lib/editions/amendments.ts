import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, eq, inArray } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { localAmendment } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { audit } from "@/lib/audit";
import { DomainError } from "@/lib/errors";
import { cardTopic } from "@/lib/content";
import { TOPIC_LABELS, amendmentSchema } from "./browser";

/**
 * Local amendments: one short plain-text note per organization and card topic, written by a
 * manager and shown to that organization's people beside every lesson and card on the topic, with
 * the author's name and the date. Stored as typed; pages render it as text (React escapes it).
 */
export type Amendment = { topic: string; body: string; authorName: string; updatedAt: Date };

export async function listAmendments(orgId: string): Promise<Amendment[]> {
  return db
    .select({ topic: localAmendment.topic, body: localAmendment.body, authorName: localAmendment.authorName, updatedAt: localAmendment.updatedAt })
    .from(localAmendment)
    .where(eq(localAmendment.organizationId, orgId))
    .orderBy(asc(localAmendment.topic));
}

/** The notes of the viewer's own organization on these topics (none without an organization). */
export async function amendmentsFor(orgId: string | null, topics: string[]): Promise<Amendment[]> {
  if (!orgId || topics.length === 0) return [];
  return db
    .select({ topic: localAmendment.topic, body: localAmendment.body, authorName: localAmendment.authorName, updatedAt: localAmendment.updatedAt })
    .from(localAmendment)
    .where(and(eq(localAmendment.organizationId, orgId), inArray(localAmendment.topic, topics)))
    .orderBy(asc(localAmendment.topic));
}

/** Writes (or replaces) the organization's note on a topic; the change and its audit row commit together. */
export async function saveAmendment(viewer: Viewer, orgId: string, raw: z.input<typeof amendmentSchema>, ip: string) {
  const input = amendmentSchema.parse(raw);
  const now = new Date();
  await db.transaction(async (tx) => {
    const [old] = await tx
      .select()
      .from(localAmendment)
      .where(and(eq(localAmendment.organizationId, orgId), eq(localAmendment.topic, input.topic)))
      .for("update");
    const values = { body: input.body, authorId: viewer.id, authorName: viewer.name, updatedAt: now };
    if (old) await tx.update(localAmendment).set(values).where(eq(localAmendment.id, old.id));
    else await tx.insert(localAmendment).values({ id: randomUUID(), organizationId: orgId, topic: input.topic, ...values });
    await audit(
      { actor: viewer, organizationId: orgId, action: old ? "amendment.update" : "amendment.create", targetType: "local_amendment", targetId: input.topic, ip, details: { from: old?.body ?? null, to: input.body } },
      tx,
    );
  });
  return { topic: input.topic };
}

export async function removeAmendment(viewer: Viewer, orgId: string, topic: string, ip: string) {
  const t = cardTopic.safeParse(topic);
  if (!t.success) throw new DomainError("not-found", "No such topic.");
  await db.transaction(async (tx) => {
    const [old] = await tx
      .select()
      .from(localAmendment)
      .where(and(eq(localAmendment.organizationId, orgId), eq(localAmendment.topic, t.data)))
      .for("update");
    if (!old) throw new DomainError("not-found", "There is no local rule on this topic.");
    await tx.delete(localAmendment).where(eq(localAmendment.id, old.id));
    await audit({ actor: viewer, organizationId: orgId, action: "amendment.remove", targetType: "local_amendment", targetId: t.data, ip, details: { body: old.body } }, tx);
  });
  return { topic: t.data };
}

/** Local rules ready for a page: topic label, text, author and day. */
export async function localRulesFor(orgId: string | null, topics: string[]) {
  const rows = await amendmentsFor(orgId, topics);
  return rows.map((r) => ({ topic: r.topic, label: TOPIC_LABELS[r.topic as keyof typeof TOPIC_LABELS] ?? r.topic, body: r.body, authorName: r.authorName, date: r.updatedAt.toISOString().slice(0, 10) }));
}
