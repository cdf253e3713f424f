import { getTranslations } from "next-intl/server";
import { clientIp, json, readJson, route } from "@/lib/api";
import { addInvitationWork } from "@/lib/team";
import { inviteAssignSchema } from "@/lib/team";

/**
 * POST /api/team/invites/[id]/assign { items: [{ kind, slug, dueAt }] } → the open invitation
 * carries this work; it is assigned when the person accepts. Unknown → 404, another organization's → 403.
 */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const input = await readJson(req, inviteAssignSchema);
  const r = await addInvitationWork(viewer, params.id, input.items, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, message: t("inviteWorkSaved", { email: r.email }) });
});
