// lib/dates and lib/expiring. Reference values: the Gregorian calendar (2028 is a leap year: divisible
// by 4 and not a century, ISO 8601 calendar dates), a day of 86 400 s (SI; UTC has no daylight saving),
// and the en-US / en-GB date orders as the Unicode CLDR data in Node's Intl prints them.
import { describe, expect, it } from "vitest";
import { DAY_MS, addDays, addMonthsUtc, daysSince, daysUntil, isoDay, isoMinute, longDate, monthDay, receiptDate, receiptDateTime, shortDate, startOfIsoDay, utcStamp, weekdayLongDate, weekdayShortDate } from "@/lib/dates";
import { EXPIRING_DAYS, expiringHorizon, isExpiring } from "@/lib/expiring";

const at = (s: string) => new Date(s);

describe("day arithmetic", () => {
  it("a day is 86 400 000 ms and addDays crosses months, years and leap days", () => {
    expect(DAY_MS).toBe(24 * 60 * 60 * 1000);
    expect(addDays(at("2028-02-28T12:00:00Z"), 1).toISOString()).toBe("2028-02-29T12:00:00.000Z");
    expect(addDays(at("2026-12-31T23:30:00Z"), 1).toISOString()).toBe("2027-01-01T23:30:00.000Z");
    expect(addDays(at("2026-03-01T00:00:00Z"), -1).toISOString()).toBe("2026-02-28T00:00:00.000Z");
  });

  it("daysUntil rounds up and daysSince rounds down, never below zero", () => {
    const now = at("2026-12-01T08:00:00Z");
    expect(daysUntil(at("2026-12-02T07:00:00Z"), now)).toBe(1);
    expect(daysUntil(at("2026-12-31T08:00:00Z"), now)).toBe(30);
    expect(daysUntil(at("2026-11-30T08:00:00Z"), now)).toBe(-1);
    expect(daysSince(at("2026-11-29T09:00:00Z"), now)).toBe(1);
    expect(daysSince(at("2026-12-02T00:00:00Z"), now)).toBe(0);
  });

  it("addMonthsUtc clamps to the month's last day", () => {
    expect(addMonthsUtc(at("2026-01-31T10:00:00Z"), 1).toISOString()).toBe("2026-02-28T10:00:00.000Z");
    expect(addMonthsUtc(at("2028-01-31T10:00:00Z"), 1).toISOString()).toBe("2028-02-29T10:00:00.000Z");
    expect(addMonthsUtc(at("2026-11-15T00:00:00Z"), 24).toISOString()).toBe("2028-11-15T00:00:00.000Z");
  });
});

describe("formatters print UTC", () => {
  const d = at("2026-12-01T23:30:00Z"); // still December 1 in UTC, already December 2 east of it
  it("ISO forms", () => {
    expect(isoDay(d)).toBe("2026-12-01");
    expect(isoDay("2026-12-01T23:30:00.000Z")).toBe("2026-12-01");
    expect(isoDay(null)).toBe("");
    expect(isoDay(undefined, "—")).toBe("—");
    expect(isoMinute(d)).toBe("2026-12-01 23:30");
    expect(utcStamp(d)).toBe("2026-12-01 23:30 UTC");
    expect(startOfIsoDay("2026-12-01").toISOString()).toBe("2026-12-01T00:00:00.000Z");
  });
  it("words (December 1, 2026 was a Tuesday)", () => {
    expect(longDate(d)).toBe("December 1, 2026");
    expect(shortDate(d)).toBe("Dec 1, 2026");
    expect(monthDay(d)).toBe("Dec 1");
    expect(weekdayShortDate(d)).toBe("Tue, Dec 1, 2026");
    expect(weekdayLongDate(d)).toBe("Tue, December 1, 2026");
    expect(receiptDate(d)).toBe("1 Dec 2026");
    expect(receiptDateTime(d)).toBe("1 Dec 2026, 23:30");
  });
});

describe("the expiring rule", () => {
  const now = at("2026-12-01T00:00:00Z");
  it("is a 30-day window (Riser's own choice, the same as the expiry reminder)", () => {
    expect(EXPIRING_DAYS).toBe(30);
    expect(expiringHorizon(now).toISOString()).toBe("2026-12-31T00:00:00.000Z");
  });
  it("counts a still-valid end within the window, the window's last instant included", () => {
    expect(isExpiring(at("2026-12-01T00:00:01Z"), now)).toBe(true);
    expect(isExpiring(at("2026-12-31T00:00:00Z"), now)).toBe(true);
    expect(isExpiring(at("2026-12-31T00:00:01Z"), now)).toBe(false);
  });
  it("does not call an ended standing expiring (it is expired)", () => {
    expect(isExpiring(now, now)).toBe(false);
    expect(isExpiring(at("2026-11-01T00:00:00Z"), now)).toBe(false);
  });
});
