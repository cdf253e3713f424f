import "server-only";
import { and, desc, eq, max } from "drizzle-orm";
import { db } from "@/db/client";
import { moduleCompletion, quizAttempt } from "@/db/schema";

export type ModuleStatus = { completedAt: Date | null; bestScore: number | null; lastPassed: boolean | null };

export async function moduleStatus(userId: string, moduleSlug: string): Promise<ModuleStatus> {
  const [c] = await db
    .select({ at: moduleCompletion.completedAt })
    .from(moduleCompletion)
    .where(and(eq(moduleCompletion.userId, userId), eq(moduleCompletion.moduleSlug, moduleSlug)))
    .orderBy(desc(moduleCompletion.completedAt))
    .limit(1);
  const [best] = await db
    .select({ best: max(quizAttempt.score) })
    .from(quizAttempt)
    .where(and(eq(quizAttempt.userId, userId), eq(quizAttempt.moduleSlug, moduleSlug), eq(quizAttempt.status, "graded")));
  const [last] = await db
    .select({ passed: quizAttempt.passed })
    .from(quizAttempt)
    .where(and(eq(quizAttempt.userId, userId), eq(quizAttempt.moduleSlug, moduleSlug), eq(quizAttempt.status, "graded")))
    .orderBy(desc(quizAttempt.submittedAt))
    .limit(1);
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
