import "server-only";
import { timingSafeEqual } from "node:crypto";
import { DomainError } from "@/lib/errors";
import { env } from "@/lib/env";

/**
 * Job routes are called by scripts or an external scheduler with the header `x-jobs-secret`.
 * No header → 401 (say who you are); a wrong one, or no JOBS_SECRET configured → 403.
 */
export function assertJobsSecret(req: Request): void {
  const given = req.headers.get("x-jobs-secret");
  if (!given) throw new DomainError("unauthenticated", "This job needs the x-jobs-secret header.");
  const expected = env.JOBS_SECRET;
  if (!expected) throw new DomainError("forbidden", "Jobs are switched off here: JOBS_SECRET is not set.");
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  if (a.length !== b.length || !timingSafeEqual(a, b)) throw new DomainError("forbidden", "The x-jobs-secret header does not match.");
}
