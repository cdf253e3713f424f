/**
 * Reading lessons honestly in tests: the person opens each lesson page (the server stamps the first
 * open with its own clock), then the test back-dates that server stamp in the database — for
 * throw-away test people only — as if the reading time had passed. The app offers no client-side
 * way around the seat-time rule; this fixture only moves the server's own record back in time.
 */
import { and, eq, inArray, sql } from "drizzle-orm";
import { expect } from "vitest";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, lessonOpen, user } from "@/db/schema";
import { postJson, type Client } from "./http";

const THROW_AWAY = /@test\.example$/i;

/** Opens each lesson page as the person (200 expected): the server records the first open. */
export async function openLessons(client: Client, moduleSlug: string, lessons: string[]) {
  for (const l of lessons) {
    const res = await client.fetch(`/modules/${moduleSlug}/${l}`);
    expect(res.status, `open ${moduleSlug}/${l}`).toBe(200);
    await res.arrayBuffer();
  }
}

/** Moves a throw-away person's recorded first opens `minutes` back (refuses demo people). */
export async function backdateOpens(userId: string, moduleSlug: string, minutes = 24 * 60) {
  const [p] = await db.select({ email: user.email }).from(user).where(eq(user.id, userId));
  if (!p || !THROW_AWAY.test(p.email)) throw new Error("backdateOpens is only for throw-away test people (@test.example)");
  const ids = (
    await db
      .select({ id: catalogLesson.id })
      .from(catalogLesson)
      .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
      .where(eq(catalogModule.slug, moduleSlug))
  ).map((r) => r.id);
  if (!ids.length) return;
  await db
    .update(lessonOpen)
    .set({ firstOpenedAt: sql`${lessonOpen.firstOpenedAt} - INTERVAL ${minutes} MINUTE` })
    .where(and(eq(lessonOpen.userId, userId), inArray(lessonOpen.lessonId, ids)));
}

/** Opens, lets the reading time pass (back-dated) and marks every given lesson complete. */
export async function readAndComplete(client: Client, userId: string, moduleSlug: string, lessons: string[]) {
  await openLessons(client, moduleSlug, lessons);
  await backdateOpens(userId, moduleSlug);
  const results = [];
  for (const l of lessons) {
    const r = await postJson(client, "/api/progress", { module: moduleSlug, lesson: l });
    expect(r.status, `complete ${moduleSlug}/${l}: ${r.text}`).toBe(200);
    results.push(r);
  }
  return results;
}
