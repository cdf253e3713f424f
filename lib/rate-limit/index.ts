import "server-only";
import { lt, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { rateLimitBucket } from "@/db/schema";

export type RateLimitResult = { allowed: boolean; hits: number; limit: number; retryAfterSeconds: number };

/**
 * Fixed-window counter in MariaDB (every app server sees the same counts): one upsert per hit,
 * which answers the window's total after that hit. Concurrent hits can only make the count higher, never lower.
 */
export async function hitRateLimit(key: string, limit: number, windowSeconds: number, now: Date = new Date()): Promise<RateLimitResult> {
  const nowS = Math.floor(now.getTime() / 1000);
  const windowStart = nowS - (nowS % windowSeconds);
  const bucketKey = key.slice(0, 120);
  // The count this hit brought the window to, from the upsert itself: a new row is 1 (one affected
  // row); an existing one hands its new value back through LAST_INSERT_ID(expr) in the statement's
  // answer (two affected rows). Each of several hits at once sees its own count, so exactly one of
  // them sees the limit reached (a separate read afterwards could show two of them the same total).
  const [res] = await db
    .insert(rateLimitBucket)
    .values({ bucketKey, windowStart, hits: 1 })
    .onDuplicateKeyUpdate({ set: { hits: sql`LAST_INSERT_ID(${rateLimitBucket.hits} + 1)` } });
  const hits = res.affectedRows === 1 ? 1 : Number(res.insertId);
  return { allowed: hits <= limit, hits, limit, retryAfterSeconds: windowStart + windowSeconds - nowS };
}

/** Deletes windows that ended more than an hour ago (a job; the table stays small). */
export async function pruneRateLimitBuckets(now: Date = new Date()): Promise<{ deleted: number }> {
  const cutoff = Math.floor(now.getTime() / 1000) - 3600;
  const r = await db.delete(rateLimitBucket).where(lt(rateLimitBucket.windowStart, cutoff));
  return { deleted: r[0].affectedRows };
}
