/**
 * Dates, one place: day arithmetic in milliseconds (UTC, no time-zone rules needed for whole days
 * of 86 400 000 ms) and the handful of ways Riser prints a date. Every formatter prints UTC, so the
 * server and the browser show the same day. No server code: also used by client components.
 */
export const DAY_MS = 86_400_000;

type DateLike = Date | string | number;
const toDate = (d: DateLike) => (d instanceof Date ? d : new Date(d));

/** `date` plus `days` whole days (negative goes back). */
export const addDays = (date: Date, days: number) => new Date(date.getTime() + days * DAY_MS);

/** Whole days from `now` until `date`, rounded up (0 or less once it has passed). */
export const daysUntil = (date: Date, now: Date = new Date()) => Math.ceil((date.getTime() - now.getTime()) / DAY_MS);

/** Whole days since `date`, rounded down, never negative. */
export const daysSince = (date: Date, now: Date = new Date()) => Math.max(0, Math.floor((now.getTime() - date.getTime()) / DAY_MS));

/** `date` plus whole calendar months in UTC; the day is clamped (Jan 31 + 1 month = Feb 28/29). */
export function addMonthsUtc(date: Date, months: number): Date {
  const y = date.getUTCFullYear();
  const m = date.getUTCMonth() + months;
  const target = new Date(Date.UTC(y, m, 1, date.getUTCHours(), date.getUTCMinutes(), date.getUTCSeconds(), date.getUTCMilliseconds()));
  const lastDay = new Date(Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0)).getUTCDate();
  target.setUTCDate(Math.min(date.getUTCDate(), lastDay));
  return target;
}

/** Midnight UTC at the start of a "YYYY-MM-DD" day. */
export const startOfIsoDay = (day: string) => new Date(`${day}T00:00:00.000Z`);

/** "2026-12-01" (ISO 8601 calendar date, UTC); `empty` for a missing date. */
export function isoDay(d: DateLike | null | undefined, empty = ""): string {
  return d === null || d === undefined || d === "" ? empty : toDate(d).toISOString().slice(0, 10);
}

/** "2026-12-01 08:30" (UTC, to the minute). */
export const isoMinute = (d: DateLike) => toDate(d).toISOString().slice(0, 16).replace("T", " ");

/** "2026-12-01 08:30 UTC". */
export const utcStamp = (d: DateLike) => `${isoMinute(d)} UTC`;

const fmt = (locale: string, o: Intl.DateTimeFormatOptions) => {
  const f = new Intl.DateTimeFormat(locale, { ...o, timeZone: "UTC" });
  return (d: DateLike) => f.format(toDate(d));
};

/** "December 1, 2026": certificates, letters and mail. */
export const longDate = fmt("en-US", { year: "numeric", month: "long", day: "numeric" });
/** "Dec 1, 2026": tables and badges. */
export const shortDate = fmt("en-US", { year: "numeric", month: "short", day: "numeric" });
/** "Dec 1": chart axes. */
export const monthDay = fmt("en-US", { month: "short", day: "numeric" });
/** "Tue, Dec 1, 2026": due dates. */
export const weekdayShortDate = fmt("en-US", { weekday: "short", month: "short", day: "numeric", year: "numeric" });
/** "Tue, December 1, 2026": reminder mail. */
export const weekdayLongDate = fmt("en-US", { weekday: "short", month: "long", day: "numeric", year: "numeric" });
/** "1 Dec 2026" and "1 Dec 2026, 08:30": billing (receipts follow the day-month-year order). */
export const receiptDate = fmt("en-GB", { day: "numeric", month: "short", year: "numeric" });
export const receiptDateTime = fmt("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", hour12: false });
