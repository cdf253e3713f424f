import { clientIp, json, route } from "@/lib/api";
import { removePerson } from "@/lib/team";

/** POST /api/team/people/[id]/remove → the person leaves the organization (seat freed; records and certificates stay). */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const r = await removePerson(viewer, params.id, clientIp(req));
  return json({ ok: true, message: `${r.name} was removed from your organization. Their certificates stay verifiable.` });
});
