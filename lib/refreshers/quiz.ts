import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { questionVersion, refresherCompletion } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { displayQuestion, localizedModule, questionApplies, type ContentLocale, type Question } from "@/lib/content";
import { adoptedCode } from "@/lib/editions";
import { DomainError } from "@/lib/errors";
import { answerProblem, drawAttempt, gradeItem, publicItem, score, type Answer, type DrawnItem } from "@/lib/quiz/browser";
import { dueFor } from "./changes";
import { seedOf, type ChangeFact } from "./due";

/**
 * The refresher a person owes after material changes to a module they completed: the changed
 * lessons to re-read (with what changed) and a short quiz on the changed questions, drawn
 * deterministically from the person, the module and the changes, so the server grades the same
 * draw it showed without storing it. Passing (the module's pass mark) records a refresher
 * completion, which clears every change recorded before it. Only lessons changed → re-reading is
 * confirmed without a quiz. The certificate is never touched.
 */
export type RefresherView = {
  module: string;
  title: string;
  lessons: { slug: string; title: string; href: string; whatChanged: string; recordedAt: string }[];
  questionChanges: string[];
  questions: ReturnType<typeof publicItem>[];
  passMark: number;
};

async function draw(viewer: Viewer, moduleSlug: string, changes: ChangeFact[]): Promise<DrawnItem[]> {
  const ids = [...new Set(changes.filter((c) => c.kind === "question").map((c) => c.itemSlug))];
  if (ids.length === 0) return [];
  const rows = await db
    .select({ questionId: questionVersion.questionId, body: questionVersion.body })
    .from(questionVersion)
    .where(and(eq(questionVersion.moduleSlug, moduleSlug), inArray(questionVersion.questionId, ids), isNull(questionVersion.retiredAt)));
  const edition = (await adoptedCode(viewer.organizationId))?.edition ?? null;
  const bank = rows
    .map((r) => r.body as Question)
    .filter((q) => questionApplies(q, edition))
    .sort((a, b) => a.id.localeCompare(b.id));
  const seed = seedOf(`${viewer.id}|${moduleSlug}|${changes.map((c) => c.id).join(",")}`);
  return drawAttempt(bank, bank.length, seed);
}

function viewOf(moduleSlug: string, changes: ChangeFact[], drawn: DrawnItem[], locale: ContentLocale): RefresherView {
  const mod = localizedModule(moduleSlug, locale);
  const lessons = changes
    .filter((c) => c.kind === "lesson")
    .map((c) => ({
      slug: c.itemSlug,
      title: mod?.lessons.find((l) => l.slug === c.itemSlug)?.meta.title ?? c.itemSlug,
      href: `/modules/${moduleSlug}/${c.itemSlug}`,
      whatChanged: c.whatChanged,
      recordedAt: c.recordedAt.toISOString(),
    }));
  return {
    module: moduleSlug,
    title: mod?.meta.title ?? moduleSlug,
    lessons,
    questionChanges: changes.filter((c) => c.kind === "question").map((c) => c.whatChanged),
    questions: drawn.map((d, i) => publicItem(i + 1, { ...d, question: displayQuestion(d.question, locale) })),
    passMark: mod?.meta.passMark ?? 80,
  };
}

/** Every refresher the viewer owes, module by module (empty when none). */
/** `locale`: the language of titles and question text (grading is the same in both). */
export async function refreshersOf(viewer: Viewer, locale: ContentLocale = "en"): Promise<RefresherView[]> {
  const due = await dueFor([viewer.id]);
  const out: RefresherView[] = [];
  for (const [key, changes] of due) {
    const moduleSlug = key.slice(key.indexOf("|") + 1);
    out.push(viewOf(moduleSlug, changes, await draw(viewer, moduleSlug, changes), locale));
  }
  return out.sort((a, b) => a.module.localeCompare(b.module));
}

/** The changes the viewer still owes on one lesson (shown highlighted at the top of the lesson). */
export async function lessonChangesDue(viewer: Viewer, moduleSlug: string, lessonSlug: string): Promise<ChangeFact[]> {
  const due = (await dueFor([viewer.id], moduleSlug)).get(`${viewer.id}|${moduleSlug}`) ?? [];
  return due.filter((c) => c.kind === "lesson" && c.itemSlug === lessonSlug);
}

export const refresherSubmitSchema = z.object({
  module: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Choose a module").max(80),
  answers: z
    .array(z.object({ position: z.number().int().min(1).max(100), answer: z.union([z.string().max(200), z.array(z.string().max(200)).max(10), z.boolean(), z.number(), z.null()]) }))
    .max(100)
    .default([]),
});

/** Grades a refresher on the server; a pass records it (and clears the due changes). */
export async function submitRefresher(viewer: Viewer, input: z.infer<typeof refresherSubmitSchema>) {
  const mod = localizedModule(input.module, "en");
  if (!mod) throw new DomainError("not-found", `No module "${input.module}".`);
  const changes = (await dueFor([viewer.id], input.module)).get(`${viewer.id}|${input.module}`) ?? [];
  if (changes.length === 0) throw new DomainError("conflict", "No refresher is due for this module.");
  const drawn = await draw(viewer, input.module, changes);
  const byPos = new Map(input.answers.map((a) => [a.position, a.answer as Answer]));
  const fieldErrors: Record<string, string[]> = {};
  for (const [pos] of byPos) if (pos > drawn.length) fieldErrors[`answers.${pos}`] = ["this question is not part of the refresher"];
  drawn.forEach((d, i) => {
    const problem = answerProblem(d, byPos.get(i + 1) ?? null);
    if (problem) fieldErrors[`answers.${i + 1}`] = [problem];
  });
  if (Object.keys(fieldErrors).length) throw new DomainError("invalid", "Some answers do not fit their questions.", fieldErrors);
  const right = drawn.filter((d, i) => gradeItem(d, byPos.get(i + 1) ?? null)).length;
  const pct = drawn.length ? score(right, drawn.length) : null;
  const passed = pct === null || pct >= mod.meta.passMark;
  if (passed) await db.insert(refresherCompletion).values({ userId: viewer.id, moduleSlug: input.module, score: pct, completedAt: new Date() });
  return { passed, score: pct, correct: right, total: drawn.length, passMark: mod.meta.passMark };
}
