// The offline area's server face: what a phone stores for a module and the versions to compare.
import "server-only";
import { readFileSync } from "node:fs";
import path from "node:path";
import { loadCatalog, localizeCatalog, type ContentLocale } from "@/lib/content";
import { CALCULATOR_IDS } from "@/lib/hydraulics";
import { offlinePlan, type OfflinePlan } from "./plan";

export * from "./names";
export { linkedCards, offlinePlan, type OfflinePlan } from "./plan";

/** The running build's id (pages kept on a phone load this build's scripts); "dev" under next dev. */
function buildId(): string {
  try {
    return readFileSync(path.join(process.cwd(), process.env.NEXT_DIST_DIR || ".next", "BUILD_ID"), "utf8").trim();
  } catch {
    return "dev";
  }
}

const memo = new Map<ContentLocale, { id: string; plans: Map<string, OfflinePlan> }>();

/** Every module's plan in the reader's language (the pages a phone stores are rendered in it). */
function plans(locale: ContentLocale): Map<string, OfflinePlan> {
  const id = buildId();
  const hit = memo.get(locale);
  if (hit && hit.id === id && process.env.NODE_ENV !== "development") return hit.plans;
  const catalog = localizeCatalog(loadCatalog(), locale);
  const map = new Map<string, OfflinePlan>();
  for (const m of catalog.modules) map.set(m.slug, offlinePlan(catalog, m.slug, id, CALCULATOR_IDS, locale)!);
  memo.set(locale, { id, plans: map });
  return map;
}

export function planFor(moduleSlug: string, locale: ContentLocale): OfflinePlan | null {
  return plans(locale).get(moduleSlug) ?? null;
}

/**
 * Current version of every module's offline copy in the reader's language, for a phone to find its
 * stale ones (a reader who changed language finds every copy stale and gets it in the new one).
 */
export function moduleVersions(locale: ContentLocale): Record<string, string> {
  return Object.fromEntries([...plans(locale)].map(([slug, p]) => [slug, p.version]));
}
