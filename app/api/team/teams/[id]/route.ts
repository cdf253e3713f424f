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
  const messages: string[] = [];
  if (input.name !== undefined) {
    const r = await renameTeam(viewer, params.id, input.name, ip);
    messages.push(`Team renamed to “${r.name}”.`);
  }
  if (input.archived !== undefined) {
    const r = await setTeamArchived(viewer, params.id, input.archived, ip);
    messages.push(input.archived ? `Team “${r.name}” archived: its people keep their records.` : `Team “${r.name}” restored.`);
  }
  return json({ ok: true, message: messages.join(" ") });
});
