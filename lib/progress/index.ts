import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, lessonProgress, user } from "@/db/schema";
import { ApiError } from "@/lib/api";
import { AccessError, canManageOrganization, type Viewer } from "@/lib/access";

export type ModuleProgress = { module: string; completed: string[]; lastAt: Date | null };

/** Completed lesson slugs per module for one person. */
export async function progressByModule(userId: string): Promise<Map<string, ModuleProgress>> {
  const rows = await db
    .select({ module: catalogModule.slug, lesson: catalogLesson.slug, at: lessonProgress.completedAt })
    .from(lessonProgress)
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(eq(lessonProgress.userId, userId));
  const out = new Map<string, ModuleProgress>();
  for (const r of rows) {
    const p = out.get(r.module) ?? { module: r.module, completed: [], lastAt: null };
    p.completed.push(r.lesson);
    if (!p.lastAt || r.at > p.lastAt) p.lastAt = r.at;
    out.set(r.module, p);
  }
  return out;
}

/** The person's most recently completed lesson (for "continue where you left off"). */
export async function lastCompletedLesson(userId: string): Promise<{ module: string; lesson: string; at: Date } | null> {
  const [row] = await db
    .select({ module: catalogModule.slug, lesson: catalogLesson.slug, at: lessonProgress.completedAt })
    .from(lessonProgress)
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(eq(lessonProgress.userId, userId))
    .orderBy(sql`${lessonProgress.completedAt} desc`)
    .limit(1);
  return row ?? null;
}

/** Marks a lesson complete; a second call changes nothing (one row per person and lesson). */
export async function markLessonComplete(userId: string, moduleSlug: string, lessonSlug: string): Promise<string[]> {
  const [lesson] = await db
    .select({ id: catalogLesson.id })
    .from(catalogLesson)
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(and(eq(catalogModule.slug, moduleSlug), eq(catalogLesson.slug, lessonSlug), isNull(catalogLesson.retiredAt)));
  if (!lesson) throw new ApiError(404, `No lesson "${lessonSlug}" in module "${moduleSlug}".`);
  await db.insert(lessonProgress).ignore().values({ userId, lessonId: lesson.id });
  // The last lesson done after a passing quiz completes the module (lazy import: completion uses this module).
  const { checkAndRecordCompletion } = await import("@/lib/completion");
  await checkAndRecordCompletion(userId, moduleSlug);
  return (await progressByModule(userId)).get(moduleSlug)?.completed ?? [];
}

/** Whose progress the viewer may read: their own, or (managers, admins) their organization's people. */
export async function assertCanReadPerson(viewer: Viewer, personId: string): Promise<void> {
  if (personId === viewer.id) return;
  const [person] = await db.select({ organizationId: user.organizationId }).from(user).where(eq(user.id, personId));
  if (!person) throw new ApiError(404, "No such person.");
  if (!canManageOrganization(viewer, person.organizationId)) throw new AccessError(403, "You cannot see this person's progress.");
}
