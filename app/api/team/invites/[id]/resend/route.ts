import { getTranslations } from "next-intl/server";
import { clientIp, json, route } from "@/lib/api";
import { resendInvitation } from "@/lib/team";

/** POST /api/team/invites/[id]/resend→ a fresh link for an open or expired invitation. */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const r = await resendInvitation(viewer, params.id, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, mailed: r.mailed, message: t("resent", { email: r.email }) });
});
