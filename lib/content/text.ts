/**
 * The catalog in the reader's language. The English catalog is the single source of ids, answers,
 * units, params, editions and revisions; these accessors lay the Spanish text (content/es/) over it by
 * id, so anything that grades, counts or links reads the same structure in both languages.
 * Text the Spanish tree lacks falls back to the English (the content build requires every twin).
 */
import { loadCatalog, type Card, type Catalog, type GlossaryTerm, type LearningPath, type Lesson, type Module } from "./load";
import type { Question } from "./schema";

/** Riser's content languages (the same codes as lib/i18n's Locale). */
export type ContentLocale = "en" | "es";
export const contentLocale = (v: unknown): ContentLocale => (v === "es" ? "es" : "en");

/** One question with its prompt, options and explanation in `locale`; every other field is the English one. */
export function questionText<Q extends Question>(q: Q, locale: ContentLocale, catalog: Catalog = loadCatalog()): Q {
  const es = locale === "es" ? catalog.es.questions[q.id] : undefined;
  if (!es) return q;
  const out = { ...q, prompt: es.prompt, explanation: es.explanation, ...(q.changed && es.changed ? { changed: es.changed } : {}) };
  if ("options" in q) {
    const text = new Map((es.options ?? []).map((o) => [o.id, o.text]));
    return { ...out, options: q.options.map((o) => ({ ...o, text: text.get(o.id) ?? o.text })) };
  }
  return out;
}

/**
 * A question an attempt drew (its stored English version) as a viewer in `locale` reads it: the
 * Spanish text by question id, but only while the drawn version is the current one (same type,
 * revision and option ids); an older snapshot keeps its own English words rather than a translation
 * of newer text. Grading never reads this: it stays on the stored English structure.
 */
export function displayQuestion<Q extends Question>(snapshot: Q, locale: ContentLocale, catalog: Catalog = loadCatalog()): Q {
  if (locale === "en") return snapshot;
  const current = catalog.modules.flatMap((m) => m.questions).find((q) => q.id === snapshot.id);
  if (!current || current.type !== snapshot.type || (current.revision ?? 1) !== (snapshot.revision ?? 1)) return snapshot;
  const ids = (q: Question) => ("options" in q ? q.options.map((o) => o.id).sort().join(",") : "");
  if (ids(current) !== ids(snapshot)) return snapshot;
  return questionText(snapshot, locale, catalog);
}

function localizeLesson(l: Lesson, catalog: Catalog): Lesson {
  const es = catalog.es.lessons[`${l.module}/${l.slug}`];
  if (!es) return l;
  const meta = { ...l.meta, title: es.title, summary: es.summary, objectives: es.objectives, sources: es.sources, edition: es.edition };
  if (l.meta.changed && es.changed) meta.changed = es.changed;
  return { ...l, meta, body: es.body };
}

function localizeModule(m: Module, catalog: Catalog): Module {
  const es = catalog.es.modules[m.slug];
  return {
    ...m,
    meta: es ? { ...m.meta, title: es.title, summary: es.summary } : m.meta,
    lessons: m.lessons.map((l) => localizeLesson(l, catalog)),
    questions: m.questions.map((q) => questionText(q, "es", catalog)),
    skills: m.skills.map((s) => ({ ...s, ...(catalog.es.skills[`${m.slug}/${s.id}`] ?? {}) })),
  };
}

function localizeCard(c: Card, catalog: Catalog): Card {
  const es = catalog.es.cards[c.slug];
  return es ? { ...c, meta: { ...c.meta, title: es.title, summary: es.summary, sources: es.sources, edition: es.edition }, body: es.body } : c;
}

const memo = new WeakMap<Catalog, Catalog>();
/** The whole catalog in `locale` (the same object for English; Spanish built once per catalog). */
export function localizeCatalog(catalog: Catalog, locale: ContentLocale): Catalog {
  if (locale === "en") return catalog;
  const done = memo.get(catalog);
  if (done) return done;
  const out: Catalog = {
    ...catalog,
    modules: catalog.modules.map((m) => localizeModule(m, catalog)),
    cards: catalog.cards.map((c) => localizeCard(c, catalog)),
    glossary: catalog.glossary.map((t) => ({ ...t, ...(catalog.es.terms[t.id] ?? {}), english: t.term })),
    paths: catalog.paths.map((p) => ({ ...p, ...(catalog.es.paths[p.slug] ?? {}) })),
  };
  memo.set(catalog, out);
  return out;
}

/** The app's catalog in the reader's language. */
export const localizedCatalog = (locale: ContentLocale): Catalog => localizeCatalog(loadCatalog(), locale);

/** A module with its title, summary, lessons (frontmatter and body), questions and skills in `locale`. */
export function localizedModule(slug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): Module | undefined {
  return localizeCatalog(catalog, locale).modules.find((m) => m.slug === slug);
}

/** A module's title in `locale` (certificates, lists built from DB rows); the slug when unknown. */
export function moduleTitle(slug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): string {
  return localizedModule(slug, locale, catalog)?.meta.title ?? slug;
}

/** A lesson's frontmatter text and body in `locale`. */
export function lessonText(moduleSlug: string, lessonSlug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): Lesson | undefined {
  return localizedModule(moduleSlug, locale, catalog)?.lessons.find((l) => l.slug === lessonSlug);
}

/** A lesson's title in `locale`; the slug when unknown. */
export function lessonTitle(moduleSlug: string, lessonSlug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): string {
  return lessonText(moduleSlug, lessonSlug, locale, catalog)?.meta.title ?? lessonSlug;
}

/** A code-reference card's frontmatter text and body in `locale`. */
export function cardText(slug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): Card | undefined {
  return localizeCatalog(catalog, locale).cards.find((c) => c.slug === slug);
}

/** A sign-off skill's title, observations and evidence in `locale`. */
export function skillText(moduleSlug: string, skillId: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): Module["skills"][number] | undefined {
  return localizedModule(moduleSlug, locale, catalog)?.skills.find((s) => s.id === skillId);
}

/** A learning path with its title and summary in `locale`. */
export function pathText(slug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): LearningPath | undefined {
  return localizeCatalog(catalog, locale).paths.find((p) => p.slug === slug);
}

/** A glossary term in `locale`, with `english`: the English term, the word heard on site and on drawings. */
export type LocalizedTerm = GlossaryTerm & { english: string };
export function glossaryTerm(id: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): LocalizedTerm | undefined {
  const en = catalog.glossary.find((t) => t.id === id);
  if (!en) return undefined;
  const es = locale === "es" ? catalog.es.terms[id] : undefined;
  return { ...en, ...(es ?? {}), english: en.english ?? en.term };
}

/** The whole glossary in `locale`, each entry with its English term. */
export function glossaryTerms(locale: ContentLocale, catalog: Catalog = loadCatalog()): LocalizedTerm[] {
  return catalog.glossary.map((t) => glossaryTerm(t.id, locale, catalog)!);
}

/**
 * The title of a certificate's subject (a module or a learning path) in `locale`, for the certificate
 * PDF and the verification page, so both name the same module in the holder's or viewer's language.
 */
export function subjectTitle(kind: "module" | "path" | string, slug: string, locale: ContentLocale, catalog: Catalog = loadCatalog()): string {
  if (kind === "module") return moduleTitle(slug, locale, catalog);
  return pathText(slug, locale, catalog)?.title ?? slug;
}
