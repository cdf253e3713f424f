import { z } from "zod";
import { clientIp, json, readJson, route } from "@/lib/api";
import { resolveScope, resolveWriteOrg } from "@/lib/access";
import { managerTwoFactorRequired, setManagerTwoFactorRequired } from "@/lib/team";

const schema = z.object({ requireManagerTwoFactor: z.boolean({ error: "Say true or false" }), org: z.string().max(36).optional() });

/** GET /api/team/security[?org=] → whether (null for an admin who names no organization) the organization requires two-step sign-in of its managers. */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  return json({ requireManagerTwoFactor: scope.orgId ? await managerTwoFactorRequired(scope.orgId) : null });
});

/** POST /api/team/security { requireManagerTwoFactor, org? } → the rule switched (audited). */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, schema);
  const org = await resolveWriteOrg(viewer, input.org);
  const { changed } = await setManagerTwoFactorRequired(viewer, org.orgId, input.requireManagerTwoFactor, clientIp(req));
  const message = input.requireManagerTwoFactor ? "Managers of this organization now need two-step sign-in." : "Two-step sign-in is no longer required of this organization's managers.";
  return json({ ok: true, changed, requireManagerTwoFactor: input.requireManagerTwoFactor, message });
});
