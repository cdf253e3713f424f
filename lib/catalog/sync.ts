import "server-only";
import { and, eq, isNull, notInArray } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogCard, catalogLesson, catalogModule, catalogPath, contentSync } from "@/db/schema";
import { loadCatalog, type Catalog } from "@/lib/content";

export type SyncCounts = { modules: number; lessons: number; paths: number; cards: number; retired: number; questions: number; questionVersionsAdded?: number; materialChanges?: number };

type SyncHook = (catalog: Catalog, now: Date) => Promise<Partial<SyncCounts>>;
const hooks: SyncHook[] = [];
/** Other areas (quiz question versions) add their own sync step. */
export function onCatalogSync(hook: SyncHook) {
  hooks.push(hook);
}

/**
 * Upserts catalog rows by slug inside one transaction. Items no longer in content are marked
 * retired, never deleted, so that progress and attempts keep their reference.
 */
export async function syncCatalog(catalog: Catalog = loadCatalog()): Promise<SyncCounts> {
  const now = new Date();
  let retired = 0;
  await db.transaction(async (tx) => {
    for (const m of catalog.modules) {
      const values = {
        title: m.meta.title,
        position: m.meta.order,
        ceHours: m.meta.ceHours.toFixed(2),
        passMark: m.meta.passMark,
        validityMonths: m.meta.validityMonths,
        quizRules: m.meta.quiz,
        requiredSkills: m.meta.requiredSkills,
        retiredAt: null,
        syncedAt: now,
      };
      await tx.insert(catalogModule).values({ slug: m.slug, ...values }).onDuplicateKeyUpdate({ set: values });
      const [row] = await tx.select({ id: catalogModule.id }).from(catalogModule).where(eq(catalogModule.slug, m.slug));
      const moduleId = row!.id;
      for (const [i, l] of m.lessons.entries()) {
        const lv = { title: l.meta.title, minutes: l.meta.minutes, position: i + 1, revision: l.meta.revision ?? 1, retiredAt: null, syncedAt: now };
        await tx.insert(catalogLesson).values({ moduleId, slug: l.slug, ...lv }).onDuplicateKeyUpdate({ set: lv });
      }
      const keep = m.lessons.map((l) => l.slug);
      const r = await tx
        .update(catalogLesson)
        .set({ retiredAt: now })
        .where(and(eq(catalogLesson.moduleId, moduleId), isNull(catalogLesson.retiredAt), keep.length ? notInArray(catalogLesson.slug, keep) : undefined));
      retired += r[0].affectedRows;
    }
    const moduleSlugs = catalog.modules.map((m) => m.slug);
    if (moduleSlugs.length) {
      const r = await tx.update(catalogModule).set({ retiredAt: now }).where(and(isNull(catalogModule.retiredAt), notInArray(catalogModule.slug, moduleSlugs)));
      retired += r[0].affectedRows;
    }
    for (const p of catalog.paths) {
      const pv = { title: p.title, moduleSlugs: p.modules, validityMonths: p.validityMonths, retiredAt: null, syncedAt: now };
      await tx.insert(catalogPath).values({ slug: p.slug, ...pv }).onDuplicateKeyUpdate({ set: pv });
    }
    for (const c of catalog.cards) {
      const cv = { title: c.meta.title, retiredAt: null, syncedAt: now };
      await tx.insert(catalogCard).values({ slug: c.slug, ...cv }).onDuplicateKeyUpdate({ set: cv });
    }
    const cardSlugs = catalog.cards.map((c) => c.slug);
    if (cardSlugs.length) {
      const r = await tx.update(catalogCard).set({ retiredAt: now }).where(and(isNull(catalogCard.retiredAt), notInArray(catalogCard.slug, cardSlugs)));
      retired += r[0].affectedRows;
    }
  });
  let extra: Partial<SyncCounts> = {};
  for (const hook of hooks) extra = { ...extra, ...(await hook(catalog, now)) };
  const counts: SyncCounts = {
    modules: catalog.modules.length,
    lessons: catalog.modules.reduce((n, m) => n + m.lessons.length, 0),
    paths: catalog.paths.length,
    cards: catalog.cards.length,
    questions: 0,
    ...extra,
    retired,
  };
  await db.insert(contentSync).values({ ok: true, counts });
  return counts;
}
