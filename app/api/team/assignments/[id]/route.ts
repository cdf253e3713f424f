import { canManageOrganization } from "@/lib/access";
import { ApiError, clientIp, json, route } from "@/lib/api";
import { deleteAssignment } from "@/lib/team";

/** DELETE /api/team/assignments/:id → removes one assignment of the viewer's organization. */
export const DELETE = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const id = Number(params.id);
  if (!Number.isInteger(id) || id <= 0) throw new ApiError(404, "No such assignment.");
  await deleteAssignment(viewer, id, (orgId) => canManageOrganization(viewer, orgId), clientIp(req));
  return json({ ok: true });
});
