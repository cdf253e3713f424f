/**
 * Reads the Spanish twins under content/es/ and checks their structure against the English catalog:
 * every English lesson, card, module.yaml, quiz.yaml, skills.yaml, glossary and paths file needs its
 * twin; a Spanish file without an English twin, ids/order/option ids that differ, and fields that must
 * not be there are problems naming file and field. Spanish supplies text only; the English file stays
 * the single source of ids, answers, units, params, editions and revisions.
 * (Stamps and the numbers/tags comparison are checked by ./twins.ts, from the content build and tests.)
 */
import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import matter from "gray-matter";
import YAML from "yaml";
import type { ZodType } from "zod";
import { esCardMeta, esGlossary, esLessonMeta, esModuleMeta, esPaths, esQuizBank, esSkills, type EsCardMeta, type EsLessonMeta, type EsQuestion } from "./es-schema";
import type { Catalog } from "./load";

export type EsLesson = EsLessonMeta & { body: string };
export type EsCard = EsCardMeta & { body: string };
export type EsSkill = { title: string; observe: string[]; evidence: string };
/** The Spanish text of the catalog, by the English ids ("module/lesson" for lessons, "module/skill" for skills). */
export type SpanishText = {
  modules: Record<string, { title: string; summary: string }>;
  lessons: Record<string, EsLesson>;
  cards: Record<string, EsCard>;
  questions: Record<string, EsQuestion>;
  skills: Record<string, EsSkill>;
  terms: Record<string, { term: string; definition: string }>;
  paths: Record<string, { title: string; summary: string }>;
};
/** One Spanish file and its English twin (paths relative to the content root). */
export type TwinPair = { en: string; es: string; kind: "mdx" | "yaml" };

export const emptySpanish = (): SpanishText => ({ modules: {}, lessons: {}, cards: {}, questions: {}, skills: {}, terms: {}, paths: {} });

/** Every English file that needs a Spanish twin, in the catalog's order. */
export function twinPairs(catalog: Pick<Catalog, "modules" | "cards">): TwinPair[] {
  const pairs: TwinPair[] = [];
  const add = (rel: string) => pairs.push({ en: rel, es: path.join("es", rel), kind: rel.endsWith(".mdx") ? "mdx" : "yaml" });
  for (const m of catalog.modules) {
    add(`modules/${m.slug}/module.yaml`);
    for (const l of m.lessons) add(`modules/${m.slug}/${l.slug}.mdx`);
    add(`modules/${m.slug}/quiz.yaml`);
    if (m.skills.length) add(`modules/${m.slug}/skills.yaml`);
  }
  for (const c of catalog.cards) add(`reference/${c.slug}.mdx`);
  add("glossary.yaml");
  add("paths.yaml");
  return pairs;
}

function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir).flatMap((f) => {
    const p = path.join(dir, f);
    return statSync(p).isDirectory() ? filesUnder(p) : [p];
  });
}

function check<T>(schema: ZodType<T>, data: unknown, file: string, problems: string[]): T | null {
  const r = schema.safeParse(data);
  if (r.success) return r.data;
  for (const i of r.error.issues) {
    const keys = "keys" in i && Array.isArray(i.keys) ? ` (${(i.keys as string[]).join(", ")})` : "";
    const msg = i.code === "unrecognized_keys" ? `must not be in the Spanish file${keys}: it comes from the English` : i.message;
    problems.push(`${file}: field "${i.path.join(".") || "(root)"}": ${msg}`);
  }
  return null;
}

const sameList = (a: string[], b: string[]) => a.length === b.length && a.every((x, i) => x === b[i]);

/** Reads content/es under `root` for the English `catalog`; pushes every structural problem. */
export function loadSpanish(root: string, catalog: Pick<Catalog, "modules" | "cards" | "glossary" | "paths">, problems: string[]): SpanishText {
  const es = emptySpanish();
  const shown = (rel: string) => path.join(path.basename(root), rel);
  const pairs = twinPairs(catalog);
  const expected = new Set(pairs.map((p) => path.join(root, p.es)));
  for (const f of filesUnder(path.join(root, "es")).sort()) {
    if (!expected.has(f)) problems.push(`${shown(path.relative(root, f))}: extra Spanish file: no English twin ${shown(path.relative(path.join(root, "es"), f))}`);
  }
  const read = (p: TwinPair): { data: unknown; body: string } | null => {
    const file = path.join(root, p.es);
    if (!existsSync(file)) {
      problems.push(`${shown(p.es)}: missing Spanish twin of ${shown(p.en)}`);
      return null;
    }
    try {
      const raw = readFileSync(file, "utf8");
      if (p.kind === "mdx") {
        const { data, content } = matter(raw);
        return { data, body: content };
      }
      return { data: YAML.parse(raw), body: "" };
    } catch (err) {
      problems.push(`${shown(p.es)}: not valid YAML: ${(err as Error).message.split("\n")[0]}`);
      return null;
    }
  };
  const idsMatch = (file: string, list: string, en: string[], got: string[]) => {
    if (sameList(en, got)) return true;
    problems.push(`${shown(file)}: field "${list}": ids/order differ from the English. English: ${en.join(", ")}; Spanish: ${got.join(", ")}`);
    return false;
  };

  for (const p of pairs) {
    const r = read(p);
    if (!r) continue;
    const file = shown(p.es);
    const parts = p.en.split("/");
    if (p.en.startsWith("modules/")) {
      const m = catalog.modules.find((x) => x.slug === parts[1])!;
      const name = parts[2]!;
      if (name === "module.yaml") {
        const v = check(esModuleMeta, r.data, file, problems);
        if (v) es.modules[m.slug] = { title: v.title, summary: v.summary };
      } else if (name === "quiz.yaml") {
        const v = check(esQuizBank, r.data, file, problems);
        if (!v || !idsMatch(p.es, "questions", m.questions.map((q) => q.id), v.questions.map((q) => q.id))) continue;
        v.questions.forEach((sq, i) => {
          const q = m.questions[i]!;
          const enOpts = "options" in q ? q.options.map((o) => o.id) : null;
          if (enOpts && !sameList(enOpts, (sq.options ?? []).map((o) => o.id))) problems.push(`${file}: question "${q.id}" field "options": option ids/order differ from the English (${enOpts.join(", ")})`);
          if (!enOpts && sq.options) problems.push(`${file}: question "${q.id}" field "options": must not be in the Spanish file (the English question has no options)`);
          if (q.type === "parametric") {
            const names = (t: string) => [...t.matchAll(/\{(\w+)\}/g)].map((x) => x[1]).sort().join(", ");
            if (names(q.prompt) !== names(sq.prompt)) problems.push(`${file}: question "${q.id}" field "prompt": placeholders {…} must be those of the English (${names(q.prompt)})`);
          }
          if (sq.changed && !q.changed) problems.push(`${file}: question "${q.id}" field "changed": must not be in the Spanish file (the English has no "changed")`);
          es.questions[q.id] = sq;
        });
      } else if (name === "skills.yaml") {
        const v = check(esSkills, r.data, file, problems);
        if (!v || !idsMatch(p.es, "skills", m.skills.map((s) => s.id), v.skills.map((s) => s.id))) continue;
        v.skills.forEach((s, i) => {
          const en = m.skills[i]!;
          if (s.observe.length !== en.observe.length) problems.push(`${file}: skill "${s.id}" field "observe": must have ${en.observe.length} items, as in English`);
          es.skills[`${m.slug}/${s.id}`] = { title: s.title, observe: s.observe, evidence: s.evidence };
        });
      } else {
        const lesson = m.lessons.find((l) => `${l.slug}.mdx` === name)!;
        const v = check(esLessonMeta, r.data, file, problems);
        if (!v) continue;
        if (v.objectives.length !== lesson.meta.objectives.length) problems.push(`${file}: field "objectives": must have ${lesson.meta.objectives.length} items, as in English`);
        if (v.sources.length !== lesson.meta.sources.length) problems.push(`${file}: field "sources": must have ${lesson.meta.sources.length} items, as in English`);
        if (v.changed && !lesson.meta.changed) problems.push(`${file}: field "changed": must not be in the Spanish file (the English has no "changed")`);
        es.lessons[`${m.slug}/${lesson.slug}`] = { ...v, body: r.body };
      }
    } else if (p.en.startsWith("reference/")) {
      const card = catalog.cards.find((c) => `reference/${c.slug}.mdx` === p.en)!;
      const v = check(esCardMeta, r.data, file, problems);
      if (!v) continue;
      if (v.sources.length !== card.meta.sources.length) problems.push(`${file}: field "sources": must have ${card.meta.sources.length} items, as in English`);
      es.cards[card.slug] = { ...v, body: r.body };
    } else if (p.en === "glossary.yaml") {
      const v = check(esGlossary, r.data, file, problems);
      if (v && idsMatch(p.es, "terms", catalog.glossary.map((t) => t.id), v.terms.map((t) => t.id))) for (const t of v.terms) es.terms[t.id] = { term: t.term, definition: t.definition };
    } else if (p.en === "paths.yaml") {
      const v = check(esPaths, r.data, file, problems);
      if (v && idsMatch(p.es, "paths", catalog.paths.map((x) => x.slug), v.paths.map((x) => x.slug))) for (const x of v.paths) es.paths[x.slug] = { title: x.title, summary: x.summary };
    }
  }
  return es;
}
