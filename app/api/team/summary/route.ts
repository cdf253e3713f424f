import { json, route } from "@/lib/api";
import { completionsPerWeek, teamTotals } from "@/lib/team";
import { resolveScope } from "@/lib/access";

/** GET /api/team/summary[?org=] → totals per team and module completions per week (the board's charts). */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  const [teams, weeks] = await Promise.all([teamTotals(scope), completionsPerWeek(scope)]);
  return json({ teams, weeks });
});
