/**
 * A new manager's first steps, in order: create teams → invite people → assign work → watch the
 * board. Plain data (tested without a database); lib/team/first-day.ts reads the counts.
 */
export type FirstDayCounts = { teams: number; invited: number; members: number; assignments: number };
export type Step = { key: string; title: string; text: string; href: string; action: string; done: boolean };

export function firstDaySteps(c: FirstDayCounts): Step[] {
  return [
    { key: "teams", title: "Create your teams", text: "Crews, a sales office, a design office: the groups you invite people into and filter the board by.", href: "/team/teams", action: "Create teams", done: c.teams > 0 },
    { key: "invite", title: "Invite your people", text: "One by one, or a whole roster from a CSV file. Each person gets a single-use link.", href: "/team/invite", action: "Invite people", done: c.invited > 0 || c.members > 1 },
    { key: "assign", title: "Assign work", text: "A module or a learning path with a due date, to people or whole teams, even before they accept their invitation.", href: "/team/assign", action: "Assign work", done: c.assignments > 0 },
    { key: "board", title: "Watch the board", text: "Who passed what, what is overdue, which sign-offs wait for your review and which certificates run out soon.", href: "/team", action: "Open the board", done: c.assignments > 0 && c.members > 1 },
  ];
}

/** The checklist shows for a manager until people have joined and work is assigned. */
export function showFirstDay(role: string, c: FirstDayCounts): boolean {
  return role === "manager" && !firstDaySteps(c).every((s) => s.done);
}
