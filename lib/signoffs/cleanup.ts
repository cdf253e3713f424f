import "server-only";
/**
 * Orphan cleanup: deletes evidence objects that no sign-off_evidence row points to (an upload that
 * crashed between storing its files and committing its row, or rows removed with their person).
 * Only objects older than `olderThanMinutes` are touched, so an upload in progress keeps its files.
 * Safe to run twice and on two machines at once (deleting a missing object is not an error).
 */
import { inArray, or } from "drizzle-orm";
import { db } from "@/db/client";
import { signOffEvidence } from "@/db/schema";
import { deleteObject, listObjects } from "@/lib/storage";
import { EVIDENCE_PREFIX } from "./keys";

export type CleanupResult = { scanned: number; deleted: number; keys: string[] };

export async function removeOrphanedEvidence(opts: { olderThanMinutes?: number; now?: Date } = {}): Promise<CleanupResult> {
  const cutoff = (opts.now ?? new Date()).getTime() - (opts.olderThanMinutes ?? 60) * 60_000;
  const result: CleanupResult = { scanned: 0, deleted: 0, keys: [] };
  for await (const page of listObjects(EVIDENCE_PREFIX)) {
    result.scanned += page.length;
    const old = page.filter((o) => o.lastModified.getTime() <= cutoff).map((o) => o.key);
    if (!old.length) continue;
    const known = new Set<string>();
    for (let i = 0; i < old.length; i += 500) {
      const chunk = old.slice(i, i + 500);
      const rows = await db
        .select({ o: signOffEvidence.objectKey, t: signOffEvidence.thumbnailKey })
        .from(signOffEvidence)
        .where(or(inArray(signOffEvidence.objectKey, chunk), inArray(signOffEvidence.thumbnailKey, chunk)));
      for (const r of rows) {
        known.add(r.o);
        if (r.t) known.add(r.t);
      }
    }
    for (const key of old.filter((k) => !known.has(k))) {
      await deleteObject(key);
      result.deleted++;
      result.keys.push(key);
    }
  }
  if (result.keys.length > 50) result.keys = [...result.keys.slice(0, 50), `… and ${result.keys.length - 50} more`];
  return result;
}
