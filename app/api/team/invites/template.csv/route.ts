import { route } from "@/lib/api";
import { csvDownload } from "@/lib/csv";
import { rosterTemplate } from "@/lib/team";
import { resolveScope, teamsInScope } from "@/lib/access";

/** GET /api/team/invites/template.csv → a roster template with the organization's team names. */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  const teams = scope.orgId ? await teamsInScope(scope) : [];
  return csvDownload("riser-roster-template.csv", rosterTemplate(teams.map((t) => t.name)));
});
