/**
 * The one "expiring" rule: a certificate or a module standing is expiring while it is still valid
 * and ends within EXPIRING_DAYS. The team board, the certificate pages, the exports and the
 * expiry reminder all ask this module. No server code.
 */
import { DAY_MS, addDays } from "@/lib/dates";

/** Days before the end of validity that count as "expiring" (Riser's own choice; the reminder goes out then). */
export const EXPIRING_DAYS = 30;

/** Still valid at `now` (ends after it) and ends within EXPIRING_DAYS of it. */
export function isExpiring(expiresAt: Date, now: Date = new Date()): boolean {
  const left = expiresAt.getTime() - now.getTime();
  return left > 0 && left <= EXPIRING_DAYS * DAY_MS;
}

/** The latest end of validity that is "expiring" at `now` (for queries: expiresAt ≤ horizon). */
export const expiringHorizon = (now: Date = new Date()) => addDays(now, EXPIRING_DAYS);
