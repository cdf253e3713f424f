// ISO 8601 week numbers used as reminder periods. Reference values from the ISO 8601 rule (week 1
// holds the year's first Thursday; weeks start on Monday), e.g. 2021-01-03 is in 2020-W53 and
// 2026-12-31 (a Thursday) is in 2026-W53.
import { describe, expect, it } from "vitest";
import { isoWeek } from "@/lib/team/period";

describe("isoWeek", () => {
  it("matches ISO 8601 at year boundaries", () => {
    expect(isoWeek(new Date("2021-01-03T12:00:00Z"))).toBe("2020-W53");
    expect(isoWeek(new Date("2021-01-04T00:00:00Z"))).toBe("2021-W01");
    expect(isoWeek(new Date("2024-12-30T09:00:00Z"))).toBe("2025-W01");
    expect(isoWeek(new Date("2026-12-31T23:00:00Z"))).toBe("2026-W53");
    expect(isoWeek(new Date("2027-01-04T00:00:00Z"))).toBe("2027-W01");
    expect(isoWeek(new Date("2026-06-15T00:00:00Z"))).toBe("2026-W25");
  });
});
