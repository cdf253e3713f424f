import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, lessonOpen, lessonProgress, user } from "@/db/schema";
import { DomainError } from "@/lib/errors";
import { AccessError, canManageOrganization, type Viewer } from "@/lib/access";

export type ModuleProgress = { module: string; completed: string[]; lastAt: Date | null };

/**
 * Seat-time rule: a lesson counts as done only when at least half its stated reading time
 * (`minutes` in its frontmatter) has passed since the server first saw the person open it. Both
 * times are the server's own clock; nothing the client sends is trusted for it.
 */
export const SEAT_TIME_SHARE = 0.5;
export const minimumSeatSeconds = (minutes: number) => Math.ceil(minutes * 60 * SEAT_TIME_SHARE);

async function findLesson(moduleSlug: string, lessonSlug: string) {
  const [lesson] = await db
    .select({ id: catalogLesson.id, minutes: catalogLesson.minutes })
    .from(catalogLesson)
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(and(eq(catalogModule.slug, moduleSlug), eq(catalogLesson.slug, lessonSlug), isNull(catalogLesson.retiredAt)));
  return lesson ?? null;
}

/**
 * Lesson ids by slug for the page's first-open stamp, kept for a minute per process (catalog rows
 * change only at a content sync), and the (person, lesson) pairs this process has already stamped:
 * the stamp is the first open and is never moved or removed, so a repeat view needs no statement.
 */
const LESSON_IDS_TTL_MS = 60_000;
const lessonIds = new Map<string, { id: number | null; at: number }>();
const stamped = new Set<string>();
const STAMPED_MAX = 200_000;

/** The server's stamp of the person's first open of a lesson (called when the lesson page renders). */
export async function recordLessonOpen(userId: string, moduleSlug: string, lessonSlug: string): Promise<void> {
  const key = `${moduleSlug}/${lessonSlug}`;
  let known = lessonIds.get(key);
  if (!known || Date.now() - known.at > LESSON_IDS_TTL_MS) {
    known = { id: (await findLesson(moduleSlug, lessonSlug))?.id ?? null, at: Date.now() };
    lessonIds.set(key, known);
  }
  if (known.id === null) return;
  const pair = `${userId} ${known.id}`;
  if (stamped.has(pair)) return;
  await db.insert(lessonOpen).ignore().values({ userId, lessonId: known.id, firstOpenedAt: new Date() });
  if (stamped.size >= STAMPED_MAX) stamped.clear();
  stamped.add(pair);
}

/**
 * `readingSeconds` is the server's own measure (first open → completion). `deviceReadingSeconds` is
 * set only for a mark made offline and sent later: the time the phone says the lesson was on screen,
 * recorded and shown as the phone's, never used to decide whether the lesson counts.
 */
export type LessonTime = {
  lesson: string;
  firstOpenedAt: string;
  completedAt: string | null;
  readingSeconds: number | null;
  deviceReadingSeconds: number | null;
  deviceMarkedAt: string | null;
};

/** A mark made with no connection, as the phone reports it (lib/offline queues it). */
export type DeviceReport = { readingSeconds: number; markedAt: Date };

/** Per lesson of a module: when the person first opened it and the reading time counted at completion. */
export async function readingTimes(userId: string, moduleSlug: string): Promise<LessonTime[]> {
  const rows = await db
    .select({
      lesson: catalogLesson.slug,
      openedAt: lessonOpen.firstOpenedAt,
      completedAt: lessonProgress.completedAt,
      deviceSeconds: lessonProgress.deviceReadingSeconds,
      deviceMarkedAt: lessonProgress.deviceMarkedAt,
    })
    .from(lessonOpen)
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonOpen.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .leftJoin(lessonProgress, and(eq(lessonProgress.userId, lessonOpen.userId), eq(lessonProgress.lessonId, lessonOpen.lessonId)))
    .where(and(eq(lessonOpen.userId, userId), eq(catalogModule.slug, moduleSlug)));
  return rows.map((r) => ({
    lesson: r.lesson,
    firstOpenedAt: r.openedAt.toISOString(),
    completedAt: r.completedAt?.toISOString() ?? null,
    readingSeconds: r.completedAt ? Math.max(0, Math.round((r.completedAt.getTime() - r.openedAt.getTime()) / 1000)) : null,
    deviceReadingSeconds: r.deviceSeconds ?? null,
    deviceMarkedAt: r.deviceMarkedAt?.toISOString() ?? null,
  }));
}

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

/**
 * Marks a lesson complete once the seat-time rule is met; a second call changes nothing (one row
 * per person and lesson). Too early → 409 saying how long is left. A mark queued offline brings the
 * phone's report (`device`): it is stored beside the row as the phone's, and the same server-side
 * rule decides whether the lesson counts (a forged report cannot shorten the minimum).
 */
export async function markLessonComplete(userId: string, moduleSlug: string, lessonSlug: string, device?: DeviceReport): Promise<string[]> {
  const lesson = await findLesson(moduleSlug, lessonSlug);
  if (!lesson) throw new DomainError("not-found", `No lesson "${lessonSlug}" in module "${moduleSlug}".`);
  const [done] = await db
    .select({ at: lessonProgress.completedAt })
    .from(lessonProgress)
    .where(and(eq(lessonProgress.userId, userId), eq(lessonProgress.lessonId, lesson.id)));
  if (!done) {
    const [opened] = await db
      .select({ at: lessonOpen.firstOpenedAt })
      .from(lessonOpen)
      .where(and(eq(lessonOpen.userId, userId), eq(lessonOpen.lessonId, lesson.id)));
    if (!opened) throw new DomainError("conflict", "Open the lesson and read it first: reading time is counted from when you open it.");
    const needed = minimumSeatSeconds(lesson.minutes);
    const left = needed - Math.floor((Date.now() - opened.at.getTime()) / 1000);
    if (left > 0) {
      const mins = Math.ceil(left / 60);
      throw DomainError.fromStatus(
        409,
        `Keep reading: this ${lesson.minutes}-minute lesson counts as done after ${Math.ceil(needed / 60)} minutes of reading time. About ${mins} minute${mins === 1 ? "" : "s"} to go.`,
      );
    }
    const now = new Date();
    await db
      .insert(lessonProgress)
      .ignore()
      .values({
        userId,
        lessonId: lesson.id,
        completedAt: now,
        deviceReadingSeconds: device ? device.readingSeconds : null,
        // A phone's clock may run ahead: a mark can never be later than its arrival.
        deviceMarkedAt: device ? new Date(Math.min(device.markedAt.getTime(), now.getTime())) : null,
      });
  }
  // The last lesson done after a passing quiz completes the module (lazy import: completion uses this module).
  const { checkAndRecordCompletion } = await import("@/lib/completion");
  await checkAndRecordCompletion(userId, moduleSlug);
  return (await progressByModule(userId)).get(moduleSlug)?.completed ?? [];
}

/** Whose progress the viewer may read: their own, or (managers, admins) their organization's people. */
export async function assertCanReadPerson(viewer: Viewer, personId: string): Promise<void> {
  if (personId === viewer.id) return;
  const [person] = await db.select({ organizationId: user.organizationId }).from(user).where(eq(user.id, personId));
  if (!person) throw new DomainError("not-found", "No such person.");
  if (!canManageOrganization(viewer, person.organizationId)) throw new AccessError(403, "You cannot see this person's progress.");
}
