import { getTranslations } from "next-intl/server";
import { clientIp, json, readJson, route } from "@/lib/api";
import { updateTeamSchema } from "@/lib/team";
import { renameTeam, setTeamArchived } from "@/lib/team";

/**
 * POST /api/team/teams/[id] { name?, archived? } → rename and/or archive (true) or restore (false).
 * Unknown team → 404; another organization's → 403.
 */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const input = await readJson(req, updateTeamSchema);
  const ip = clientIp(req);
  const t = await getTranslations("teamApi");
  const messages: string[] = [];
  if (input.name !== undefined) {
    const r = await renameTeam(viewer, params.id, input.name, ip);
    messages.push(t("teamRenamed", { name: r.name }));
  }
  if (input.archived !== undefined) {
    const r = await setTeamArchived(viewer, params.id, input.archived, ip);
    messages.push(input.archived ? t("teamArchived", { name: r.name }) : t("teamRestored", { name: r.name }));
  }
  return json({ ok: true, message: messages.join(" ") });
});
