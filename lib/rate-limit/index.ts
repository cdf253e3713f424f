import "server-only";
import { eq, lt, and, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { rateLimitBucket } from "@/db/schema";

export type RateLimitResult = { allowed: boolean; hits: number; limit: number; retryAfterSeconds: number };

/**
 * Fixed-window counter in MariaDB (every app server sees the same counts): one upsert per hit,
 * then a read of the window's total. Concurrent hits can only make the count higher, never lower.
 */
export async function hitRateLimit(key: string, limit: number, windowSeconds: number, now: Date = new Date()): Promise<RateLimitResult> {
  const nowS = Math.floor(now.getTime() / 1000);
  const windowStart = nowS - (nowS % windowSeconds);
  const bucketKey = key.slice(0, 120);
  await db
    .insert(rateLimitBucket)
    .values({ bucketKey, windowStart, hits: 1 })
    .onDuplicateKeyUpdate({ set: { hits: sql`${rateLimitBucket.hits} + 1` } });
  const [row] = await db
    .select({ hits: rateLimitBucket.hits })
    .from(rateLimitBucket)
    .where(and(eq(rateLimitBucket.bucketKey, bucketKey), eq(rateLimitBucket.windowStart, windowStart)));
  const hits = row?.hits ?? 1;
  return { allowed: hits <= limit, hits, limit, retryAfterSeconds: windowStart + windowSeconds - nowS };
}

/** Deletes windows that ended more than an hour ago (a job; the table stays small). */
export async function pruneRateLimitBuckets(now: Date = new Date()): Promise<{ deleted: number }> {
  const cutoff = Math.floor(now.getTime() / 1000) - 3600;
  const r = await db.delete(rateLimitBucket).where(lt(rateLimitBucket.windowStart, cutoff));
  return { deleted: r[0].affectedRows };
}
