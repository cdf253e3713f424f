import { getTranslations } from "next-intl/server";
import { clientIp, json, route } from "@/lib/api";
import { revokeInvitation } from "@/lib/team";

/** POST /api/team/invites/[id]/revoke→ the link stops working and the seat is free at once. */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const r = await revokeInvitation(viewer, params.id, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, message: t("revoked", { email: r.email }) });
});
