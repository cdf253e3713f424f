import { clientIp, json, readJson, route } from "@/lib/api";
import { assertSameOrigin } from "@/lib/admin";
import { renameOrganization } from "@/lib/admin";
import { renameOrganizationSchema } from "@/lib/admin";

/** POST /api/admin/organizations/:id { name } → renames it (audited: organization.rename). */
export const POST = route<{ id: string }>("admin", async ({ req, viewer, params }) => {
  assertSameOrigin(req);
  const { name } = await readJson(req, renameOrganizationSchema);
  await renameOrganization(viewer, params.id, name, clientIp(req));
  return json({ ok: true });
});
