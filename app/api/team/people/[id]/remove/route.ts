import { getTranslations } from "next-intl/server";
import { clientIp, json, route } from "@/lib/api";
import { removePerson } from "@/lib/team";

/** POST /api/team/people/[id]/remove → the person leaves the organization (seat freed; records and certificates stay). */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const r = await removePerson(viewer, params.id, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, message: t("personRemoved", { name: r.name }) });
});
