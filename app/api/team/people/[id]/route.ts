import { getTranslations } from "next-intl/server";
import { clientIp, json, readJson, route } from "@/lib/api";
import { updatePerson } from "@/lib/team";
import { updatePersonSchema } from "@/lib/team";

/** POST /api/team/people/[id] { teamId?, role? } → changes team and/or role (learner, sales, manager). */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const input = await readJson(req, updatePersonSchema);
  const r = await updatePerson(viewer, params.id, input, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, changed: r.changed, message: r.changed ? t("personUpdated", { name: r.person.name }) : t("nothingChanged") });
});
