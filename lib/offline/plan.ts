import { createHash } from "node:crypto";
import type { Catalog } from "@/lib/content";
import { OFFLINE_PAGE } from "./names";

/**
 * What "Keep on this phone" stores for one module, and the version that tells a phone its copy is
 * stale. Pure: works on a loaded catalog, so unit tests can feed it changed content.
 */
export type OfflinePlan = {
  module: string;
  /** The language the pages are stored in (the reader's: lessons, cards and glossary in it). */
  locale: string;
  title: string;
  /** Content hash of everything the plan stores, plus the app build it was rendered with. */
  version: string;
  /** Same-origin page addresses to store, in the order they are fetched. */
  urls: string[];
};

const CARD_LINK = /\/reference\/([a-z0-9-]+)/g;

/** Cards a module's lessons link to (`/reference/<slug>` in their MDX), existing ones only, sorted. */
export function linkedCards(catalog: Catalog, moduleSlug: string): string[] {
  const mod = catalog.modules.find((m) => m.slug === moduleSlug);
  if (!mod) return [];
  const known = new Set(catalog.cards.map((c) => c.slug));
  const lessonKeys = new Set(mod.lessons.map((l) => `${mod.slug}/${l.slug}`));
  const found = new Set<string>();
  for (const l of mod.lessons) for (const m of l.body.matchAll(CARD_LINK)) if (known.has(m[1]!)) found.add(m[1]!);
  // Cards that name one of the module's lessons as related belong with it too.
  for (const c of catalog.cards) if (c.meta.relatedLessons.some((k) => lessonKeys.has(k))) found.add(c.slug);
  return [...found].sort();
}

/**
 * The plan for one module: its page, its lessons (figures are inline SVG in the lesson pages, and
 * glossary terms are defined inline by <Term>), the cards they link to, the glossary page and every
 * field calculator (they compute in the browser). `buildId` ties cached pages to the build whose
 * scripts they load; `calculatorIds` come from lib/hydraulics. `catalog` is the catalog in the reader's
 * language `locale` (lib/content localizeCatalog), so a Spanish reader's copy is versioned by the
 * Spanish text and a change of language makes every kept copy stale.
 */
export function offlinePlan(catalog: Catalog, moduleSlug: string, buildId: string, calculatorIds: readonly string[], locale = "en"): OfflinePlan | null {
  const mod = catalog.modules.find((m) => m.slug === moduleSlug);
  if (!mod) return null;
  const cards = linkedCards(catalog, moduleSlug);
  const h = createHash("sha256");
  h.update(`build:${buildId}\nlocale:${locale}\n`);
  h.update(JSON.stringify(mod.meta));
  for (const l of mod.lessons) h.update(`\nlesson:${l.slug}\n${JSON.stringify(l.meta)}\n${l.body}`);
  for (const slug of cards) {
    const c = catalog.cards.find((x) => x.slug === slug)!;
    h.update(`\ncard:${slug}\n${JSON.stringify(c.meta)}\n${c.body}`);
  }
  h.update(`\nglossary\n${JSON.stringify(catalog.glossary)}`);
  h.update(`\ncalculators:${calculatorIds.join(",")}`);
  return {
    module: mod.slug,
    locale,
    title: mod.meta.title,
    version: h.digest("hex").slice(0, 16),
    urls: [
      `/modules/${mod.slug}`,
      ...mod.lessons.map((l) => `/modules/${mod.slug}/${l.slug}`),
      ...cards.map((c) => `/reference/${c}`),
      "/glossary",
      "/tools",
      // the "needs a connection" page in the reader's language, for pages that are not kept
      OFFLINE_PAGE,
      ...calculatorIds.map((id) => `/tools/${id}`),
    ],
  };
}
