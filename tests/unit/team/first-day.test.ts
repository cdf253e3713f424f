// A new manager's checklist: create teams → invite people → assign work → watch the board.
import { describe, expect, it } from "vitest";
import { firstDaySteps, showFirstDay } from "@/lib/team/first-day-steps";

describe("first-day checklist", () => {
  it("lists the four steps in order, none done for a brand-new organization", () => {
    const steps = firstDaySteps({ teams: 0, invited: 0, members: 1, assignments: 0 });
    expect(steps.map((s) => s.href)).toEqual(["/team/teams", "/team/invite", "/team/assign", "/team"]);
    expect(steps.every((s) => !s.done)).toBe(true);
    expect(showFirstDay("manager", { teams: 0, invited: 0, members: 1, assignments: 0 })).toBe(true);
  });
  it("ticks steps off and goes away once people joined and work is assigned; never for learners", () => {
    expect(firstDaySteps({ teams: 2, invited: 3, members: 1, assignments: 0 }).map((s) => s.done)).toEqual([true, true, false, false]);
    expect(showFirstDay("manager", { teams: 2, invited: 3, members: 4, assignments: 1 })).toBe(false);
    expect(showFirstDay("learner", { teams: 0, invited: 0, members: 1, assignments: 0 })).toBe(false);
  });
});
