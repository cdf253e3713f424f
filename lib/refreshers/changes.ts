import "server-only";
import { and, eq, inArray, max } from "drizzle-orm";
import { db } from "@/db/client";
import { materialChange, moduleCompletion, refresherCompletion, user } from "@/db/schema";
import type { Catalog } from "@/lib/content";
import { dueChanges, type ChangeFact } from "./due";

/**
 * Catalog-sync step: every lesson or question whose frontmatter/field carries `changed` is a
 * material change at its `revision`, recorded once (the unique key ignores repeats), stamped with
 * the sync's time. Edits without `changed` record nothing and flag nobody.
 */
export async function recordMaterialChanges(catalog: Catalog, now: Date): Promise<{ materialChanges: number }> {
  const rows: (typeof materialChange.$inferInsert)[] = [];
  for (const m of catalog.modules) {
    for (const l of m.lessons) if (l.meta.changed) rows.push({ moduleSlug: m.slug, kind: "lesson", itemSlug: l.slug, revision: l.meta.revision ?? 1, whatChanged: l.meta.changed, recordedAt: now });
    for (const q of m.questions) if (q.changed) rows.push({ moduleSlug: m.slug, kind: "question", itemSlug: q.id, revision: q.revision ?? 1, whatChanged: q.changed, recordedAt: now });
  }
  let added = 0;
  for (const r of rows) {
    const [res] = await db.insert(materialChange).ignore().values(r);
    added += res.affectedRows;
  }
  return { materialChanges: added };
}

/** The due changes of these people (all modules or one), keyed "userId|moduleSlug". */
export async function dueFor(userIds: string[], moduleSlug?: string): Promise<Map<string, ChangeFact[]>> {
  if (userIds.length === 0) return new Map();
  const changes = (await db
    .select()
    .from(materialChange)
    .where(moduleSlug ? eq(materialChange.moduleSlug, moduleSlug) : undefined)) as ChangeFact[];
  if (changes.length === 0) return new Map();
  const modules = [...new Set(changes.map((c) => c.moduleSlug))];
  const [completions, refreshers] = await Promise.all([
    db
      .select({ userId: moduleCompletion.userId, moduleSlug: moduleCompletion.moduleSlug, at: max(moduleCompletion.completedAt) })
      .from(moduleCompletion)
      .where(and(inArray(moduleCompletion.userId, userIds), inArray(moduleCompletion.moduleSlug, modules)))
      .groupBy(moduleCompletion.userId, moduleCompletion.moduleSlug),
    db
      .select({ userId: refresherCompletion.userId, moduleSlug: refresherCompletion.moduleSlug, at: max(refresherCompletion.completedAt) })
      .from(refresherCompletion)
      .where(and(inArray(refresherCompletion.userId, userIds), inArray(refresherCompletion.moduleSlug, modules)))
      .groupBy(refresherCompletion.userId, refresherCompletion.moduleSlug),
  ]);
  const facts = (rows: { userId: string; moduleSlug: string; at: Date | string | null }[]) =>
    rows.filter((r) => r.at !== null).map((r) => ({ userId: r.userId, moduleSlug: r.moduleSlug, at: r.at instanceof Date ? r.at : new Date(`${String(r.at).replace(" ", "T")}Z`) }));
  return dueChanges(facts(completions), facts(refreshers), changes);
}

/** How many people of an organization owe a refresher (the managers' weekly digest). */
export async function refresherCountFor(orgId: string): Promise<number> {
  const people = await db.select({ id: user.id }).from(user).where(eq(user.organizationId, orgId));
  const due = await dueFor(people.map((p) => p.id));
  return new Set([...due.keys()].map((k) => k.slice(0, k.indexOf("|")))).size;
}
