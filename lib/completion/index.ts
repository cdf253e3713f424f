import "server-only";
import { and, desc, eq, isNull, max, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, lessonProgress, moduleCompletion, quizAttempt } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { localizedModule, type ContentLocale } from "@/lib/content";
import { missingSignOffs } from "@/lib/completion/signoff-requirement";

export type ModuleStatus = { completedAt: Date | null; bestScore: number | null; lastPassed: boolean | null };

export async function moduleStatus(userId: string, moduleSlug: string): Promise<ModuleStatus> {
  const [c] = await db
    .select({ at: moduleCompletion.completedAt })
    .from(moduleCompletion)
    .where(and(eq(moduleCompletion.userId, userId), eq(moduleCompletion.moduleSlug, moduleSlug)))
    .orderBy(desc(moduleCompletion.completedAt))
    .limit(1);
  const graded = and(eq(quizAttempt.userId, userId), eq(quizAttempt.moduleSlug, moduleSlug), eq(quizAttempt.status, "graded"));
  const [best] = await db.select({ best: max(quizAttempt.score) }).from(quizAttempt).where(graded);
  const [last] = await db.select({ passed: quizAttempt.passed }).from(quizAttempt).where(graded).orderBy(desc(quizAttempt.submittedAt)).limit(1);
  return { completedAt: c?.at ?? null, bestScore: best?.best ?? null, lastPassed: last?.passed ?? null };
}

/** Latest completion per module for one person. */
export async function completionsOf(userId: string): Promise<Map<string, Date>> {
  const rows = await db
    .select({ module: moduleCompletion.moduleSlug, at: max(moduleCompletion.completedAt) })
    .from(moduleCompletion)
    .where(eq(moduleCompletion.userId, userId))
    .groupBy(moduleCompletion.moduleSlug);
  return new Map(rows.filter((r) => r.at).map((r) => [r.module, r.at as Date]));
}

/** Extra conditions other areas add (practical sign-offs): each returns what is still missing. */
type Requirement = (userId: string, moduleSlug: string) => Promise<string[]>;
const requirements: Requirement[] = [];
export function addCompletionRequirement(fn: Requirement) {
  requirements.push(fn);
}
addCompletionRequirement(missingSignOffs); // required practical sign-offs (module.yaml requiredSkills)

/** What the person still needs before the module completes (empty = complete on the next pass). */
/** `locale`: the language of the lesson titles named (a page matches them against its own lesson list). */
export async function missingForCompletion(userId: string, moduleSlug: string, locale: ContentLocale = "en"): Promise<string[]> {
  const mod = localizedModule(moduleSlug, locale);
  if (!mod) return ["unknown module"];
  const done = await db
    .select({ slug: catalogLesson.slug })
    .from(lessonProgress)
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(and(eq(lessonProgress.userId, userId), eq(catalogModule.slug, moduleSlug), isNull(catalogLesson.retiredAt)));
  const doneSet = new Set(done.map((d) => d.slug));
  const missing = mod.lessons.filter((l) => !doneSet.has(l.slug)).map((l) => `lesson: ${l.meta.title}`);
  for (const r of requirements) missing.push(...(await r(userId, moduleSlug)));
  return missing;
}

/**
 * Completion = all lessons done and the quiz passed (and any required sign-offs approved).
 * Called after a passing grade and after each lesson or sign-off; records one completion per
 * passing attempt (a later pass is a renewal) and issues the certificate through one function.
 * Safe to call any number of times.
 */
export async function checkAndRecordCompletion(userId: string, moduleSlug: string): Promise<number | null> {
  const [pass] = await db
    .select({ id: quizAttempt.id, at: quizAttempt.submittedAt })
    .from(quizAttempt)
    .where(and(eq(quizAttempt.userId, userId), eq(quizAttempt.moduleSlug, moduleSlug), eq(quizAttempt.status, "graded"), eq(quizAttempt.passed, true)))
    .orderBy(desc(quizAttempt.submittedAt))
    .limit(1);
  if (!pass) return null;
  if ((await missingForCompletion(userId, moduleSlug)).length) return null;
  const result = await db
    .insert(moduleCompletion)
    .ignore()
    .values({ userId, moduleSlug, attemptId: pass.id, completedAt: sql`CURRENT_TIMESTAMP(3)` as unknown as Date });
  if (result[0].affectedRows === 0) return null; // this pass already completed the module
  const id = result[0].insertId;
  await issueCertificateForCompletion(id);
  return id;
}

/**
 * Job: passed attempts of the last `days` whose module has no completion from that pass yet (a
 * failure after grading, or a lesson or sign-off finished later) get the completion check again.
 * Idempotent: checkAndRecordCompletion records one completion per passing attempt.
 */
export async function retryPendingCompletions(days = 30, limit = 500): Promise<{ checked: number; completed: number }> {
  const since = new Date(Date.now() - days * 86_400_000);
  const rows = await db.execute(sql`
    SELECT DISTINCT a.user_id AS userId, a.module_slug AS moduleSlug
    FROM quiz_attempt a
    LEFT JOIN module_completion c ON c.attempt_id = a.id
    WHERE a.status = 'graded' AND a.passed = 1 AND a.submitted_at >= ${since} AND c.id IS NULL
    LIMIT ${limit}`);
  const list = (rows[0] as unknown as { userId: string; moduleSlug: string }[]) ?? [];
  let completed = 0;
  for (const r of list) if ((await checkAndRecordCompletion(r.userId, r.moduleSlug)) !== null) completed++;
  return { checked: list.length, completed };
}
export * from "./signoff-requirement";
