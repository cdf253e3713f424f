import "server-only";
import { count, countDistinct, desc, eq, isNotNull, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogCard, catalogLesson, catalogModule, catalogPath, contentSync, questionVersion } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { audit } from "@/lib/audit";
import { ContentError, contentRoot, loadCatalogFrom, type Catalog } from "@/lib/content";
import { syncCatalog, type SyncCounts } from "@/lib/catalog";
import "@/lib/catalog";
import { iso } from "./paging";

type Kind = "modules" | "lessons" | "paths" | "cards" | "questions";
export type KindCounts = Record<Kind, { live: number; retired: number }>;
export type SyncRun = { id: number; at: string | null; ok: boolean; counts: Record<string, number>; problems: string[] };
export type RetiredItem = { kind: string; slug: string; title: string; retiredAt: string | null };

export type ContentStatus = {
  database: KindCounts;
  /** What content/ holds now, or the problems that stop it from loading. */
  repository: { ok: true; counts: Record<Kind, number> } | { ok: false; problems: string[] };
  lastSync: SyncRun | null;
  recentSyncs: SyncRun[];
  retired: RetiredItem[];
};

function readRepository(): { ok: true; catalog: Catalog } | { ok: false; problems: string[] } {
  try {
    return { ok: true, catalog: loadCatalogFrom(contentRoot()) };
  } catch (err) {
    if (err instanceof ContentError) return { ok: false, problems: err.problems };
    return { ok: false, problems: [err instanceof Error ? err.message : String(err)] };
  }
}

function repositoryCounts(c: Catalog): Record<Kind, number> {
  return {
    modules: c.modules.length,
    lessons: c.modules.reduce((n, m) => n + m.lessons.length, 0),
    paths: c.paths.length,
    cards: c.cards.length,
    questions: c.modules.reduce((n, m) => n + m.questions.length, 0),
  };
}

const splitProblems = (p: string | null) => (p ? p.split("\n").filter(Boolean) : []);

function syncRun(r: typeof contentSync.$inferSelect): SyncRun {
  return { id: r.id, at: iso(r.at), ok: r.ok, counts: (r.counts ?? {}) as Record<string, number>, problems: splitProblems(r.problems) };
}

async function liveRetired(table: typeof catalogModule | typeof catalogLesson | typeof catalogPath | typeof catalogCard) {
  const [row] = await db
    .select({ live: sql<number>`sum(${table.retiredAt} is null)`, retired: sql<number>`sum(${table.retiredAt} is not null)` })
    .from(table);
  return { live: Number(row?.live ?? 0), retired: Number(row?.retired ?? 0) };
}

export async function contentStatus(): Promise<ContentStatus> {
  const [modules, lessons, paths, cards] = await Promise.all([liveRetired(catalogModule), liveRetired(catalogLesson), liveRetired(catalogPath), liveRetired(catalogCard)]);
  const [liveQuestions] = await db.select({ n: countDistinct(questionVersion.questionId) }).from(questionVersion).where(isNull(questionVersion.retiredAt));
  const [retiredVersions] = await db.select({ n: count() }).from(questionVersion).where(isNotNull(questionVersion.retiredAt));
  const runs = await db.select().from(contentSync).orderBy(desc(contentSync.at), desc(contentSync.id)).limit(5);

  const retiredOf = async (kind: string, table: typeof catalogModule | typeof catalogPath | typeof catalogCard) =>
    (await db.select({ slug: table.slug, title: table.title, retiredAt: table.retiredAt }).from(table).where(isNotNull(table.retiredAt))).map((r) => ({ kind, ...r }));
  const retiredLessons = (
    await db
      .select({ slug: catalogLesson.slug, module: catalogModule.slug, title: catalogLesson.title, retiredAt: catalogLesson.retiredAt })
      .from(catalogLesson)
      .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
      .where(isNotNull(catalogLesson.retiredAt))
  ).map((r) => ({ kind: "lesson", slug: `${r.module}/${r.slug}`, title: r.title, retiredAt: r.retiredAt }));
  const retiredQuestions = (
    await db
      .select({ slug: questionVersion.questionId, version: questionVersion.version, module: questionVersion.moduleSlug, retiredAt: questionVersion.retiredAt })
      .from(questionVersion)
      .where(isNotNull(questionVersion.retiredAt))
      .orderBy(desc(questionVersion.retiredAt))
      .limit(100)
  ).map((r) => ({ kind: "question version", slug: `${r.module}/${r.slug}`, title: `version ${r.version}`, retiredAt: r.retiredAt }));
  const retired = [...(await retiredOf("module", catalogModule)), ...retiredLessons, ...(await retiredOf("path", catalogPath)), ...(await retiredOf("card", catalogCard)), ...retiredQuestions]
    .map((r) => ({ ...r, retiredAt: iso(r.retiredAt) }))
    .sort((a, b) => (b.retiredAt ?? "").localeCompare(a.retiredAt ?? ""))
    .slice(0, 200);

  const repo = readRepository();
  return {
    database: { modules, lessons, paths, cards, questions: { live: Number(liveQuestions?.n ?? 0), retired: retiredVersions?.n ?? 0 } },
    repository: repo.ok ? { ok: true, counts: repositoryCounts(repo.catalog) } : repo,
    lastSync: runs[0] ? syncRun(runs[0]) : null,
    recentSyncs: runs.map(syncRun),
    retired,
  };
}

export type SyncOutcome = { ok: true; counts: SyncCounts } | { ok: false; problems: string[] };

/**
 * "Sync now": reads content/ afresh and syncs it. Content that fails validation changes nothing;
 * the failed run is recorded with its problems. Either way one audit row (content.sync).
 */
export async function syncNow(actor: Pick<Viewer, "id" | "email">, ip: string): Promise<SyncOutcome> {
  const repo = readRepository();
  if (!repo.ok) {
    await db.transaction(async (tx) => {
      await tx.insert(contentSync).values({ ok: false, counts: {}, problems: repo.problems.join("\n") });
      await audit({ actor, organizationId: null, action: "content.sync", targetType: "content", targetId: "catalog", ip, details: { ok: false, problems: repo.problems.length } }, tx);
    });
    return { ok: false, problems: repo.problems };
  }
  const counts = await syncCatalog(repo.catalog);
  await audit({ actor, organizationId: null, action: "content.sync", targetType: "content", targetId: "catalog", ip, details: { ok: true, ...counts } });
  return { ok: true, counts };
}
