/**
 * The team board's cell status as a pure function of one person's facts for one module (no server
 * code here, so the rule is unit-tested on its own).
 *
 * Precedence, first match wins:
 *   1. a valid certificate that expires within 30 days      → expiring
 *   2. a valid certificate                                  → passed
 *   3. assigned, not passed, and past its due date          → overdue
 *   4. the certificate (or completion) has expired          → expired
 *   5. the last graded attempt failed                       → failed
 *   6. any lesson done or any attempt started               → in progress
 *   7. otherwise                                            → not started
 * A completion that has no certificate row (yet) counts for the module's validity period; a
 * revoked certificate counts as none.
 */
import { addMonthsUtc } from "@/lib/dates";
import { EXPIRING_DAYS, isExpiring } from "@/lib/expiring";
import type { BoardStatus } from "./schemas";

export { EXPIRING_DAYS };

export type CellFacts = {
  lessonsDone: number;
  attempts: number;
  bestScore: number | null;
  lastGradedAt: Date | null;
  lastPassAt: Date | null;
  completedAt: Date | null;
  /** number of module certificates (any state) and the latest expiry among the non-revoked ones */
  certificates: number;
  validUntil: Date | null;
  dueAt: Date | null;
};

export const NO_FACTS: CellFacts = {
  lessonsDone: 0,
  attempts: 0,
  bestScore: null,
  lastGradedAt: null,
  lastPassAt: null,
  completedAt: null,
  certificates: 0,
  validUntil: null,
  dueAt: null,
};

/** When the person's standing in the module runs out (null: never passed, or only revoked). */
export function expiryOf(f: CellFacts, validityMonths: number): Date | null {
  if (f.certificates > 0) return f.validUntil;
  return f.completedAt ? addMonthsUtc(f.completedAt, validityMonths) : null;
}

export function cellStatus(f: CellFacts, validityMonths: number, now: Date): BoardStatus {
  const t = now.getTime();
  const expires = expiryOf(f, validityMonths);
  if (expires && expires.getTime() > t) {
    return isExpiring(expires, now) ? "expiring" : "passed";
  }
  if (f.dueAt && f.dueAt.getTime() < t) return "overdue";
  if (expires) return "expired";
  if (f.lastGradedAt && (!f.lastPassAt || f.lastPassAt.getTime() < f.lastGradedAt.getTime())) return "failed";
  if (f.lessonsDone > 0 || f.attempts > 0) return "in_progress";
  return "not_started";
}

export const isDone = (s: BoardStatus) => s === "passed" || s === "expiring";

/** The statuses the team totals count (in progress and not started are not counted). */
export type CountedStatus = "passed" | "expiring" | "overdue" | "expired" | "failed";

/**
 * cellStatus reduced to the three facts the team totals need: the expiry (expiryOf), the due date
 * and whether the last graded attempt failed. Same precedence; null where cellStatus says
 * "in progress" or "not started".
 */
export function countedStatus(expiresAt: Date | null, dueAt: Date | null, failed: boolean, now: Date): CountedStatus | null {
  const t = now.getTime();
  if (expiresAt && expiresAt.getTime() > t) return isExpiring(expiresAt, now) ? "expiring" : "passed";
  if (dueAt && dueAt.getTime() < t) return "overdue";
  if (expiresAt) return "expired";
  return failed ? "failed" : null;
}
