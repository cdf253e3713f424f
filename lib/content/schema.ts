/**
 * The contract for everything under content/. Parsed with gray-matter (MDX frontmatter) or yaml
 * (module.yaml, quiz.yaml, skills.yaml, paths.yaml, glossary.yaml) and validated here with zod.
 * A bad or missing field fails `npm run content:build` (and so the build) naming file and field.
 */
import { z } from "zod";
import { EDITIONS } from "./editions";

/** NFPA 13D edition years a question may be limited to. */
const editionList = z
  .array(z.number().int().refine((n) => (EDITIONS as readonly number[]).includes(n), { message: `must be one of ${EDITIONS.join(", ")}` }))
  .min(1)
  .optional();
/** Content revision (absent = 1). Raising it with `changed` set marks a material change. */
const revision = z.number().int().min(1).max(999).optional();
/** One line for the people who completed before: what changed and why it matters. */
const changed = z.string().min(10).max(200).optional();

export const slug = z
  .string()
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "must be a lower-case slug like 'cpvc-joints'");

export const audience = z.enum(["installer", "designer", "sales", "manager"]);
export type Audience = z.infer<typeof audience>;

const isoDate = z
  .union([z.string(), z.date()])
  .transform((v) => (v instanceof Date ? v.toISOString().slice(0, 10) : v))
  .pipe(z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date like 2026-11-20"));

/** content/modules/<module>/module.yaml */
export const moduleMeta = z.object({
  title: z.string().min(3),
  summary: z.string().min(20),
  order: z.number().int().min(1),
  audience: z.array(audience).min(1),
  paths: z.array(slug).min(1),
  ceHours: z.number().positive().max(8),
  passMark: z.number().int().min(50).max(100),
  validityMonths: z.number().int().min(1).max(120),
  quiz: z.object({
    questionsPerAttempt: z.number().int().min(3).max(40),
    attemptsPerPeriod: z.number().int().min(1).max(20),
    periodHours: z.number().int().min(1).max(24 * 30),
    waitMinutes: z.number().int().min(0).max(24 * 60),
    timeLimitMinutes: z.number().int().min(1).max(240).nullable(),
  }),
  /** lesson slugs in teaching order; each must have <slug>.mdx beside module.yaml */
  lessons: z.array(slug).min(3).max(5),
  /** ids of skills in skills.yaml that must be signed off before the module completes */
  requiredSkills: z.array(slug).default([]),
});
export type ModuleMeta = z.infer<typeof moduleMeta>;

/** frontmatter of content/modules/<module>/<lesson>.mdx */
export const lessonMeta = z.object({
  title: z.string().min(3),
  summary: z.string().min(20),
  minutes: z.number().int().min(3).max(20),
  objectives: z.array(z.string().min(10)).min(2),
  sources: z.array(z.string().min(5)).min(1),
  edition: z.string().min(20),
  updated: isoDate,
  revision,
  changed,
  /** card topics this lesson teaches (local amendments on them show here); cards that list the lesson in relatedLessons add theirs */
  topics: z.array(z.lazy(() => cardTopic)).optional(),
});
export type LessonMeta = z.infer<typeof lessonMeta>;

export const cardTopic = z.enum([
  "system",
  "pipe",
  "sprinklers",
  "freeze",
  "hydraulics",
  "testing",
  "trades",
  "officials",
  "sales",
]);

/** frontmatter of content/reference/<card>.mdx */
export const cardMeta = z.object({
  title: z.string().min(3),
  summary: z.string().min(20),
  topic: cardTopic,
  audience: z.array(audience).min(1),
  /** "module-slug/lesson-slug" */
  relatedLessons: z.array(z.string().regex(/^[a-z0-9-]+\/[a-z0-9-]+$/)).min(1),
  sources: z.array(z.string().min(5)).min(1),
  edition: z.string().min(20),
  updated: isoDate,
});
export type CardMeta = z.infer<typeof cardMeta>;

/** content/glossary.yaml */
export const glossary = z.object({
  terms: z
    .array(
      z.object({
        id: slug,
        term: z.string().min(2),
        definition: z.string().min(20),
        see: z.array(slug).default([]),
      }),
    )
    .min(60),
});

/** content/paths.yaml */
export const paths = z.object({
  paths: z
    .array(
      z.object({
        slug,
        title: z.string().min(3),
        summary: z.string().min(20),
        audience: z.array(audience).min(1),
        modules: z.array(slug).min(1),
        validityMonths: z.number().int().min(1).max(120),
      }),
    )
    .min(4),
});

/** content/modules/<module>/skills.yaml */
export const skills = z.object({
  skills: z
    .array(
      z.object({
        id: slug,
        title: z.string().min(10),
        observe: z.array(z.string().min(10)).min(2),
        evidence: z.string().min(10),
      }),
    )
    .min(1),
});

const option = z.object({ id: z.string().regex(/^[a-z]$/), text: z.string().min(1) });
const qBase = {
  id: slug,
  prompt: z.string().min(10),
  explanation: z.string().min(20),
  /** slug of the lesson (in this module) the explanation points to */
  lesson: slug,
  /** the NFPA 13D editions the question is right for; absent = every edition */
  editions: editionList,
  revision,
  changed,
};
/** the named computations a parametric question may use; implemented by lib/quiz/formulas.ts over lib/hydraulics */
export const parametricFormula = z.enum([
  "sprinklerFlowGpm", // params: kFactor, pressurePsi
  "sprinklerPressurePsi", // params: kFactor, flowGpm
  "elevationPsi", // params: heightFt
  "frictionLossPsi", // params: flowGpm, lengthFt, cFactor, insideDiameterIn
  "flowTestAvailablePsi", // params: staticPsi, residualPsi, testFlowGpm, demandFlowGpm
  "storedWaterGal", // params: flowGpm, durationMin
  "sprinklersNeeded", // params: lengthFt, widthFt, maxSpacingFt, maxAreaSqFt
]);
export type ParametricFormula = z.infer<typeof parametricFormula>;

export const question = z.discriminatedUnion("type", [
  z.object({ ...qBase, type: z.literal("single"), options: z.array(option).min(3).max(6), correct: z.string() }),
  z.object({
    ...qBase,
    type: z.literal("multiple"),
    options: z.array(option).min(3).max(7),
    correct: z.array(z.string()).min(1),
  }),
  z.object({ ...qBase, type: z.literal("truefalse"), correct: z.boolean() }),
  z.object({
    ...qBase,
    type: z.literal("numeric"),
    answer: z.number(),
    unit: z.string().min(1),
    /** absolute tolerance, in the question's unit */
    tolerance: z.number().nonnegative(),
  }),
  z.object({
    ...qBase,
    type: z.literal("parametric"),
    formula: parametricFormula,
    /** each drawn per attempt: min..max in steps; the prompt shows them as {name} */
    params: z.record(z.string(), z.object({ min: z.number(), max: z.number(), step: z.number().positive() })),
    /** fixed inputs the formula also needs (not drawn) */
    fixed: z.record(z.string(), z.number()).default({}),
    unit: z.string().min(1),
    /** tolerance as a percentage of the computed answer */
    tolerancePercent: z.number().positive().max(10),
  }),
]);
export type Question = z.infer<typeof question>;

export const quizBank = z.object({ questions: z.array(question).min(12) });
