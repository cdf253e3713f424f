import { json, readJson, route } from "@/lib/api";
import { assertSameOrigin, requestContext } from "@/lib/admin";
import { moveOrganization } from "@/lib/admin";
import { moveOrganizationSchema } from "@/lib/admin";

/** POST /api/admin/people/:id/organization { organizationId, reason? } → moves the person (audited: user.move). */
export const POST = route<{ id: string }>("admin", async ({ req, viewer, params }) => {
  assertSameOrigin(req);
  const { organizationId, reason } = await readJson(req, moveOrganizationSchema);
  await moveOrganization(viewer, params.id, organizationId, reason, requestContext(req));
  return json({ ok: true });
});
