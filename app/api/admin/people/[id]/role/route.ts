import { json, readJson, route } from "@/lib/api";
import { assertSameOrigin, requestContext } from "@/lib/admin";
import { changeRole } from "@/lib/admin";
import { changeRoleSchema } from "@/lib/admin";

/** POST /api/admin/people/:id/role { role, reason } → better-auth setRole (audited: user.role). */
export const POST = route<{ id: string }>("admin", async ({ req, viewer, params }) => {
  assertSameOrigin(req);
  const { role, reason } = await readJson(req, changeRoleSchema);
  await changeRole(viewer, params.id, role, reason, requestContext(req));
  return json({ ok: true });
});
