import "server-only";
import { createHash } from "node:crypto";
import { and, eq, isNull, notInArray } from "drizzle-orm";
import { db } from "@/db/client";
import { questionVersion } from "@/db/schema";
import type { Catalog } from "@/lib/content";
import type { Question } from "@/lib/content";

/** Stable JSON (sorted keys) so that the hash changes only when the question's content changes. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(",")}]`;
  if (value && typeof value === "object") {
    return `{${Object.keys(value as object)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${canonical((value as Record<string, unknown>)[k])}`)
      .join(",")}}`;
  }
  return JSON.stringify(value);
}

export const questionHash = (q: Question) => createHash("sha256").update(canonical(q)).digest("hex");

/**
 * A question whose content changed gets a new version (the old one is kept, retired, so that old
 * attempts still show what was asked); a question removed from content is retired.
 */
export async function syncQuestionVersions(catalog: Catalog, now: Date): Promise<{ questions: number; questionVersionsAdded: number }> {
  let added = 0;
  let total = 0;
  await db.transaction(async (tx) => {
    const existing = await tx.select().from(questionVersion);
    const latest = new Map<string, (typeof existing)[number]>();
    for (const v of existing) {
      const cur = latest.get(v.questionId);
      if (!cur || v.version > cur.version) latest.set(v.questionId, v);
    }
    const live: string[] = [];
    for (const m of catalog.modules) {
      for (const q of m.questions) {
        total++;
        live.push(q.id);
        const hash = questionHash(q);
        const cur = latest.get(q.id);
        if (cur && cur.hash === hash && cur.moduleSlug === m.slug) {
          if (cur.retiredAt) await tx.update(questionVersion).set({ retiredAt: null }).where(eq(questionVersion.id, cur.id));
          continue;
        }
        await tx.update(questionVersion).set({ retiredAt: now }).where(and(eq(questionVersion.questionId, q.id), isNull(questionVersion.retiredAt)));
        await tx.insert(questionVersion).values({ moduleSlug: m.slug, questionId: q.id, version: (cur?.version ?? 0) + 1, hash, body: q });
        added++;
      }
    }
    if (live.length) await tx.update(questionVersion).set({ retiredAt: now }).where(and(isNull(questionVersion.retiredAt), notInArray(questionVersion.questionId, live)));
  });
  return { questions: total, questionVersionsAdded: added };
}
