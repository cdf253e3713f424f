/**
 * Continuing-education hours per reporting period (pure: no server code).
 *
 * A period setting is "periods of `lengthMonths` months, one of which starts on the first day of
 * `startMonth` in `startYear`" (UTC), tiled forwards and backwards; without a setting, calendar years.
 * What counts (Riser's rule, stated on every download):
 * - module certificates only: a learning-path certificate's hours are its modules' hours again;
 * - a revoked certificate counts nowhere; an expired one still counts in the period it was earned;
 * - a module counts once per period: passing it again in the same period (a renewal) adds no hours
 *   (common practice of licensing bodies for a repeated course — verify with yours).
 * Sums are kept in hundredths of an hour, as certificates store them, so no rounding drifts.
 */
export type PeriodSetting = { startYear: number; startMonth: number; lengthMonths: number };
export const CALENDAR_YEARS: PeriodSetting = { startYear: 2000, startMonth: 1, lengthMonths: 12 };
/** lengths an organization may choose: one to five years, or half a year */
export const PERIOD_LENGTHS = [6, 12, 24, 36, 48, 60] as const;

export type Period = { start: Date; end: Date; label: string };

const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];
/** The first instant of month `monthIndex` (0-based, may run past 11 or below 0) after January of `year`. */
const utcMonth = (year: number, monthIndex: number) => {
  const d = new Date(Date.UTC(2000, 0, 1));
  d.setUTCFullYear(year + Math.floor(monthIndex / 12), ((monthIndex % 12) + 12) % 12, 1);
  return d;
};

export function isCalendarYears(s: PeriodSetting): boolean {
  return s.startMonth === 1 && s.lengthMonths === 12;
}

/** "2026" for calendar years, "Jul 2025 – Jun 2027" otherwise (the end month is the last one included). */
export function periodLabel(start: Date, end: Date, s: PeriodSetting): string {
  if (isCalendarYears(s)) return String(start.getUTCFullYear());
  const last = new Date(end.getTime() - 1);
  return `${MONTHS[start.getUTCMonth()]} ${start.getUTCFullYear()} – ${MONTHS[last.getUTCMonth()]} ${last.getUTCFullYear()}`;
}

/** The period containing `at`: start ≤ at < end. */
export function periodOf(at: Date, s: PeriodSetting): Period {
  const months = (at.getUTCFullYear() - s.startYear) * 12 + (at.getUTCMonth() - (s.startMonth - 1));
  const k = Math.floor(months / s.lengthMonths);
  const start = utcMonth(s.startYear, s.startMonth - 1 + k * s.lengthMonths);
  const end = utcMonth(s.startYear, s.startMonth - 1 + (k + 1) * s.lengthMonths);
  return { start, end, label: periodLabel(start, end, s) };
}

/** How the setting reads in words, for pages and downloads. */
export function describeSetting(s: PeriodSetting): string {
  if (isCalendarYears(s)) return "calendar years (January to December)";
  const first = periodOf(new Date(Date.UTC(s.startYear, s.startMonth - 1, 1)), s);
  return `${s.lengthMonths}-month licence periods starting in ${MONTHS[s.startMonth - 1]} (for example ${first.label})`;
}

export type CountedCertificate = { kind: "module" | "path"; subjectSlug: string; ceHours: number; issuedAt: Date; status: "valid" | "expired" | "revoked" };
export type PeriodTotal = Period & { hours: number; certificates: number };

/** Why a certificate does or does not count toward its period's total (see the rules above). */
export type Counting = "counted" | "path" | "revoked" | "repeat";

/** Each certificate's counting, in the order given, and the totals per period, newest period first. */
export function hoursByPeriod<T extends CountedCertificate>(certs: T[], s: PeriodSetting): { counting: Map<T, Counting>; totals: PeriodTotal[] } {
  const counting = new Map<T, Counting>();
  const totals = new Map<number, PeriodTotal & { hundredths: number }>();
  const seen = new Set<string>();
  for (const c of [...certs].sort((a, b) => a.issuedAt.getTime() - b.issuedAt.getTime())) {
    const p = periodOf(c.issuedAt, s);
    if (c.kind === "path") counting.set(c, "path");
    else if (c.status === "revoked") counting.set(c, "revoked");
    else if (seen.has(`${p.start.getTime()}|${c.subjectSlug}`)) counting.set(c, "repeat");
    else {
      seen.add(`${p.start.getTime()}|${c.subjectSlug}`);
      counting.set(c, "counted");
      const t = totals.get(p.start.getTime()) ?? { ...p, hours: 0, hundredths: 0, certificates: 0 };
      t.hundredths += Math.round(c.ceHours * 100);
      t.certificates += 1;
      totals.set(p.start.getTime(), t);
    }
  }
  const list = [...totals.values()].sort((a, b) => b.start.getTime() - a.start.getTime()).map(({ hundredths, ...t }) => ({ ...t, hours: hundredths / 100 }));
  return { counting, totals: list };
}

export const COUNTING_LABEL: Record<Counting, string> = {
  counted: "counted",
  path: "not counted: learning path (its modules count)",
  revoked: "not counted: revoked",
  repeat: "not counted: same module already counted in this period",
};
