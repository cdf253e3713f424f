import { getTranslations } from "next-intl/server";
import { clientIp, json, readJson, route } from "@/lib/api";
import { createTeamSchema } from "@/lib/team";
import { resolveScope, resolveWriteOrg } from "@/lib/access";
import { createTeam, listTeams } from "@/lib/team";

/** GET /api/team/teams[?org=] → the organization's teams (archived ones too) with head counts; admins name ?org=. */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  return json({ teams: scope.orgId ? await listTeams(scope.orgId) : [] });
});

/** POST /api/team/teams { name, org? } → 201; a name already used in the organization → 409. */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, createTeamSchema);
  const org = await resolveWriteOrg(viewer, input.org);
  const created = await createTeam(viewer, org.orgId, input.name, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, team: created, message: t("teamCreated", { name: created.name }) }, 201);
});
