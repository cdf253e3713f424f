import { clientIp, json, readJson, route } from "@/lib/api";
import { resolveScope, resolveWriteOrg } from "@/lib/access";
import { createJurisdiction, jurisdictionSchema, listAmendments, listJurisdictions } from "@/lib/editions";

/** GET /api/team/jurisdictions[?org=] → the organization's jurisdictions (default first) and its local rules. */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  if (!scope.orgId) return json({ jurisdictions: [], amendments: [] });
  return json({ jurisdictions: await listJurisdictions(scope.orgId), amendments: await listAmendments(scope.orgId) });
});

/** POST /api/team/jurisdictions { name, state, edition, ircP2904, isDefault?, org? } → 201; unknown edition → 400. */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, jurisdictionSchema);
  const org = await resolveWriteOrg(viewer, input.org);
  const created = await createJurisdiction(viewer, org.orgId, input, clientIp(req));
  return json({ ok: true, id: created.id, message: `${input.name}, ${input.state} saved: NFPA 13D ${input.edition}.` }, 201);
});
