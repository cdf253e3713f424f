/**
 * The contract for the Spanish twins under content/es/ (layout: the same file names, slugs and ids as
 * the English tree). A Spanish file holds ONLY the translated text and the `en:` stamp of its English
 * twin; ids, answers, units, params, editions and revisions come from the English file, so grading is
 * the same in both languages. Strict objects: a field that must not be there fails, named.
 */
import { z } from "zod";

/** First 16 hex digits of the SHA-256 of the English twin's bytes (written by `npm run content:stamp`). */
export const enStamp = z.string().regex(/^[0-9a-f]{16}$/, "must be the 16-hex stamp of the English twin: run npm run content:stamp -- <file>");

const text = (min: number) => z.string().min(min);
const changed = z.string().min(10).max(240).optional();

/** frontmatter of content/es/modules/<m>/<lesson>.mdx */
export const esLessonMeta = z.strictObject({
  title: text(3),
  summary: text(20),
  objectives: z.array(text(10)).min(2),
  sources: z.array(text(5)).min(1),
  edition: text(20),
  changed,
  en: enStamp,
});
export type EsLessonMeta = z.infer<typeof esLessonMeta>;

/** frontmatter of content/es/reference/<card>.mdx */
export const esCardMeta = z.strictObject({
  title: text(3),
  summary: text(20),
  sources: z.array(text(5)).min(1),
  edition: text(20),
  en: enStamp,
});
export type EsCardMeta = z.infer<typeof esCardMeta>;

/** content/es/modules/<m>/module.yaml */
export const esModuleMeta = z.strictObject({ title: text(3), summary: text(20), en: enStamp });

const esOption = z.strictObject({ id: z.string().regex(/^[a-z]$/), text: text(1) });
/** content/es/modules/<m>/quiz.yaml */
export const esQuizBank = z.strictObject({
  en: enStamp,
  questions: z.array(
    z.strictObject({
      id: z.string().min(1),
      prompt: text(10),
      explanation: text(20),
      options: z.array(esOption).optional(),
      changed,
    }),
  ),
});
export type EsQuestion = z.infer<typeof esQuizBank>["questions"][number];

/** content/es/modules/<m>/skills.yaml */
export const esSkills = z.strictObject({
  en: enStamp,
  skills: z.array(z.strictObject({ id: z.string().min(1), title: text(10), observe: z.array(text(10)).min(1), evidence: text(10) })),
});

/** content/es/glossary.yaml */
export const esGlossary = z.strictObject({
  en: enStamp,
  terms: z.array(z.strictObject({ id: z.string().min(1), term: text(2), definition: text(20) })),
});

/** content/es/paths.yaml */
export const esPaths = z.strictObject({
  en: enStamp,
  paths: z.array(z.strictObject({ slug: z.string().min(1), title: text(3), summary: text(20) })),
});
