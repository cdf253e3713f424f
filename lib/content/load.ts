/**
 * Reads and validates everything under content/. Used by the build script (scripts/content-build.ts),
 * the catalog sync and the server pages. Node-only (fs); never imported by client components.
 * A bad or missing field raises ContentError naming the file and the field.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import matter from "gray-matter";
import YAML from "yaml";
import type { ZodType } from "zod";
import {
  cardMeta,
  glossary as glossarySchema,
  lessonMeta,
  moduleMeta,
  paths as pathsSchema,
  quizBank,
  skills as skillsSchema,
  type CardMeta,
  type LessonMeta,
  type ModuleMeta,
  type Question,
} from "./schema";
import { editionsOf, editionTags } from "./editions";
import { loadSpanish, type SpanishText } from "./load-es";

/** Edition tags that do not parse, and a "what changed" line without a raised revision. */
function revisionAndEditionProblems(file: string, body: string, meta: { revision?: number; changed?: string }, problems: string[]) {
  for (const t of editionTags(body)) {
    const r = editionsOf(t.spec);
    if ("problem" in r) problems.push(`${file}: ${t.raw}: ${r.problem}`);
  }
  if (meta.changed && (meta.revision ?? 1) < 2) problems.push(`${file}: field "changed": raise "revision" (to 2 or more) when you mark a material change`);
}

export class ContentError extends Error {
  constructor(readonly problems: string[]) {
    super(`Content has ${problems.length} problem(s):\n${problems.map((p) => `  - ${p}`).join("\n")}`);
  }
}

export type Lesson = { module: string; slug: string; meta: LessonMeta; body: string; file: string };
export type Module = {
  slug: string;
  meta: ModuleMeta;
  lessons: Lesson[];
  questions: Question[];
  skills: { id: string; title: string; observe: string[]; evidence: string }[];
};
export type Card = { slug: string; meta: CardMeta; body: string; file: string };
export type GlossaryTerm = {
  id: string;
  term: string;
  definition: string;
  see: string[];
  /** in a localized catalog (./text.ts): the English term, heard on site and on drawings */
  english?: string;
};
export type LearningPath = {
  slug: string;
  title: string;
  summary: string;
  audience: string[];
  modules: string[];
  validityMonths: number;
};
export type Catalog = {
  modules: Module[];
  cards: Card[];
  glossary: GlossaryTerm[];
  paths: LearningPath[];
  /** the Spanish text of the same ids (content/es/), merged over the English by ./text.ts */
  es: SpanishText;
};

export const contentRoot = () => process.env.RISER_CONTENT_DIR ?? path.join(process.cwd(), "content");

function validate<T>(schema: ZodType<T>, data: unknown, file: string, problems: string[]): T | null {
  const parsed = schema.safeParse(data);
  if (parsed.success) return parsed.data;
  for (const issue of parsed.error.issues) {
    problems.push(`${file}: field "${issue.path.join(".") || "(root)"}": ${issue.message}`);
  }
  return null;
}

function readYaml(file: string, problems: string[]): unknown {
  try {
    return YAML.parse(readFileSync(file, "utf8"));
  } catch (err) {
    problems.push(`${file}: not valid YAML: ${(err as Error).message.split("\n")[0]}`);
    return null;
  }
}

function readMdx(file: string, problems: string[]): { data: unknown; content: string } | null {
  try {
    const { data, content } = matter(readFileSync(file, "utf8"));
    return { data, content };
  } catch (err) {
    problems.push(`${file}: frontmatter is not valid YAML: ${(err as Error).message.split("\n")[0]}`);
    return null;
  }
}

/** Loads and validates the whole content tree from `root`; throws ContentError listing every problem. */
export function loadCatalogFrom(root: string): Catalog {
  const problems: string[] = [];
  const rel = (f: string) => path.relative(path.dirname(root), f);
  const modules: Module[] = [];
  const modulesDir = path.join(root, "modules");
  const moduleDirs = existsSync(modulesDir)
    ? readdirSync(modulesDir, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name)
    : [];
  for (const slug of moduleDirs) {
    const dir = path.join(modulesDir, slug);
    const metaFile = path.join(dir, "module.yaml");
    if (!existsSync(metaFile)) {
      problems.push(`${rel(metaFile)}: missing (every module folder needs module.yaml)`);
      continue;
    }
    const meta = validate(moduleMeta, readYaml(metaFile, problems), rel(metaFile), problems);
    if (!meta) continue;
    const lessons: Lesson[] = [];
    for (const lessonSlug of meta.lessons) {
      const file = path.join(dir, `${lessonSlug}.mdx`);
      if (!existsSync(file)) {
        problems.push(`${rel(metaFile)}: field "lessons": no file ${lessonSlug}.mdx`);
        continue;
      }
      const parsed = readMdx(file, problems);
      const lm = parsed && validate(lessonMeta, parsed.data, rel(file), problems);
      if (parsed && lm) {
        revisionAndEditionProblems(rel(file), parsed.content, lm, problems);
        lessons.push({ module: slug, slug: lessonSlug, meta: lm, body: parsed.content, file });
      }
    }
    const quizFile = path.join(dir, "quiz.yaml");
    let questions: Question[] = [];
    if (existsSync(quizFile)) {
      const bank = validate(quizBank, readYaml(quizFile, problems), rel(quizFile), problems);
      if (bank) {
        questions = bank.questions;
        for (const q of questions) {
          if (q.changed && (q.revision ?? 1) < 2) problems.push(`${rel(quizFile)}: question "${q.id}" field "changed": raise "revision" (to 2 or more) when you mark a material change`);
          if (!meta.lessons.includes(q.lesson)) problems.push(`${rel(quizFile)}: question "${q.id}" field "lesson": "${q.lesson}" is not a lesson of this module`);
          if (q.type === "single" && !q.options.some((o) => o.id === q.correct)) problems.push(`${rel(quizFile)}: question "${q.id}" field "correct": no option "${q.correct}"`);
          if (q.type === "multiple") for (const c of q.correct) if (!q.options.some((o) => o.id === c)) problems.push(`${rel(quizFile)}: question "${q.id}" field "correct": no option "${c}"`);
          if (q.type === "parametric") {
            for (const [, name] of q.prompt.matchAll(/\{(\w+)\}/g)) {
              if (!(name! in q.params) && !(name! in q.fixed)) problems.push(`${rel(quizFile)}: question "${q.id}" field "prompt": placeholder {${name}} is neither a param nor fixed`);
            }
            for (const [name, r] of Object.entries(q.params)) if (r.max < r.min) problems.push(`${rel(quizFile)}: question "${q.id}" field "params.${name}": max is below min`);
          }
        }
      }
    } else problems.push(`${rel(quizFile)}: missing (every module needs a question bank)`);
    const skillsFile = path.join(dir, "skills.yaml");
    let skillList: Module["skills"] = [];
    if (existsSync(skillsFile)) {
      const s = validate(skillsSchema, readYaml(skillsFile, problems), rel(skillsFile), problems);
      if (s) skillList = s.skills;
    }
    for (const req of meta.requiredSkills) {
      if (!skillList.some((s) => s.id === req)) problems.push(`${rel(metaFile)}: field "requiredSkills": no skill "${req}" in skills.yaml`);
    }
    modules.push({ slug, meta, lessons, questions, skills: skillList });
  }
  modules.sort((a, b) => a.meta.order - b.meta.order);

  const cards: Card[] = [];
  const cardsDir = path.join(root, "reference");
  if (existsSync(cardsDir)) {
    for (const f of readdirSync(cardsDir).filter((f) => f.endsWith(".mdx")).sort()) {
      const file = path.join(cardsDir, f);
      const parsed = readMdx(file, problems);
      const meta = parsed && validate(cardMeta, parsed.data, rel(file), problems);
      if (parsed && meta) {
        revisionAndEditionProblems(rel(file), parsed.content, {}, problems);
        cards.push({ slug: f.replace(/\.mdx$/, ""), meta, body: parsed.content, file });
      }
    }
  }

  const glossaryFile = path.join(root, "glossary.yaml");
  const g = existsSync(glossaryFile) ? validate(glossarySchema, readYaml(glossaryFile, problems), rel(glossaryFile), problems) : null;
  if (!existsSync(glossaryFile)) problems.push(`${rel(glossaryFile)}: missing`);
  const pathsFile = path.join(root, "paths.yaml");
  const p = existsSync(pathsFile) ? validate(pathsSchema, readYaml(pathsFile, problems), rel(pathsFile), problems) : null;
  if (!existsSync(pathsFile)) problems.push(`${rel(pathsFile)}: missing`);

  // Cross-references.
  const moduleSlugs = new Set(modules.map((m) => m.slug));
  const pathSlugs = new Set((p?.paths ?? []).map((x) => x.slug));
  for (const m of modules) for (const ps of m.meta.paths) if (p && !pathSlugs.has(ps)) problems.push(`content/modules/${m.slug}/module.yaml: field "paths": no learning path "${ps}"`);
  for (const lp of p?.paths ?? []) for (const ms of lp.modules) if (!moduleSlugs.has(ms)) problems.push(`content/paths.yaml: path "${lp.slug}" field "modules": no module "${ms}"`);
  const lessonKeys = new Set(modules.flatMap((m) => m.lessons.map((l) => `${m.slug}/${l.slug}`)));
  for (const c of cards) for (const rl of c.meta.relatedLessons) if (!lessonKeys.has(rl)) problems.push(`content/reference/${c.slug}.mdx: field "relatedLessons": no lesson "${rl}"`);
  const questionIds = new Set<string>();
  for (const m of modules) for (const q of m.questions) {
    if (questionIds.has(q.id)) problems.push(`content/modules/${m.slug}/quiz.yaml: question id "${q.id}" is used twice`);
    questionIds.add(q.id);
  }
  const termIds = new Set<string>();
  for (const t of g?.terms ?? []) {
    if (termIds.has(t.id)) problems.push(`content/glossary.yaml: term id "${t.id}" is used twice`);
    termIds.add(t.id);
  }

  const english = { modules, cards, glossary: g?.terms ?? [], paths: p?.paths ?? [] };
  const es = loadSpanish(root, english, problems);
  if (problems.length) throw new ContentError(problems);
  return { ...english, es };
}

let cached: Catalog | null = null;
/** The app's content, loaded once per process. */
export function loadCatalog(): Catalog {
  if (!cached || process.env.NODE_ENV === "development") cached = loadCatalogFrom(contentRoot());
  return cached;
}

export function findModule(slug: string): Module | undefined {
  return loadCatalog().modules.find((m) => m.slug === slug);
}

/** The card topics a lesson teaches: its own `topics` plus the topic of every card that lists it as related. */
export function lessonTopics(moduleSlug: string, lessonSlug: string, catalog: Catalog = loadCatalog()): string[] {
  const lesson = catalog.modules.find((m) => m.slug === moduleSlug)?.lessons.find((l) => l.slug === lessonSlug);
  const key = `${moduleSlug}/${lessonSlug}`;
  const topics = new Set<string>(lesson?.meta.topics ?? []);
  for (const c of catalog.cards) if (c.meta.relatedLessons.includes(key)) topics.add(c.meta.topic);
  return [...topics].sort();
}
