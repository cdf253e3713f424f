import type { createFormatter } from "next-intl";
import { CALENDAR_YEARS, type PeriodSetting } from "@/lib/credentials/browser";

type T = (key: "calendarYears" | "licencePeriods", values?: Record<string, string | number | Date>) => string;
type Format = Pick<ReturnType<typeof createFormatter>, "dateTime">;

/**
 * How an organization's reporting period reads, in the reader's language ("certificates" catalog):
 * calendar years, or licence periods of n months from a month, with the setting's first period as an example.
 */
export function describePeriod(s: PeriodSetting, t: T, format: Format): string {
  if (s.startMonth === CALENDAR_YEARS.startMonth && s.lengthMonths === CALENDAR_YEARS.lengthMonths) return t("calendarYears");
  const start = new Date(Date.UTC(s.startYear, s.startMonth - 1, 1));
  const last = new Date(Date.UTC(s.startYear, s.startMonth - 1 + s.lengthMonths - 1, 1));
  const month = (d: Date) => format.dateTime(d, { month: "short", year: "numeric", timeZone: "UTC" });
  return t("licencePeriods", {
    months: s.lengthMonths,
    startMonth: format.dateTime(new Date(Date.UTC(2000, s.startMonth - 1, 1)), { month: "short", timeZone: "UTC" }),
    example: `${month(start)} – ${month(last)}`,
  });
}
