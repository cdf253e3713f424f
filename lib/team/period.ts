import { DAY_MS } from "@/lib/dates";
/** Reminder periods (pure). */

/** ISO 8601 week of a date (UTC), e.g. "2027-W03". */
export function isoWeek(d: Date): string {
  const t = new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), d.getUTCDate()));
  const dayNum = t.getUTCDay() || 7; // Monday 1 … Sunday 7
  t.setUTCDate(t.getUTCDate() + 4 - dayNum); // the Thursday of this week decides the year
  const yearStart = Date.UTC(t.getUTCFullYear(), 0, 1);
  const week = Math.ceil(((t.getTime() - yearStart) / DAY_MS + 1) / 7);
  return `${t.getUTCFullYear()}-W${String(week).padStart(2, "0")}`;
}
