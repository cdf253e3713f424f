import { clientIp, json, route } from "@/lib/api";
import { revokeInvitation } from "@/lib/team";

/** POST /api/team/invites/[id]/revoke→ the link stops working and the seat is free at once. */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const r = await revokeInvitation(viewer, params.id, clientIp(req));
  return json({ ok: true, message: `The invitation to ${r.email} was revoked; its seat is free.` });
});
