// Board charts: every week labelled, and room for the "100%" tick at the right edge.
import { describe, expect, it } from "vitest";
import { halfLabelWidth, PERCENT_AXIS, PERCENT_CHART_MARGIN, WEEK_AXIS } from "@/lib/team/chart";

describe("board chart axes", () => {
  it("labels every week (no label dropped as crowded)", () => {
    expect(WEEK_AXIS.interval).toBe(0);
  });
  it("leaves the right margin the last percent label needs", () => {
    expect(PERCENT_AXIS.ticks.at(-1)).toBe(100);
    expect(PERCENT_CHART_MARGIN.right).toBeGreaterThanOrEqual(halfLabelWidth("100%", PERCENT_AXIS.fontSize));
    expect(PERCENT_CHART_MARGIN.right).toBeGreaterThan(16); // the old margin clipped it
  });
});
