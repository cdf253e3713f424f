import { getTranslations } from "next-intl/server";
import { clientIp, json, readJson, route } from "@/lib/api";
import { createAssignments } from "@/lib/team";
import { assignSchema } from "@/lib/team";
import { resolveWriteOrg } from "@/lib/access";

/**
 * POST /api/team/assignments { kind, slug, userIds, teamIds, dueAt: "YYYY-MM-DD", org? } → 201.
 * Team assignments reach everyone in the team, including people who join it later.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, assignSchema);
  const org = await resolveWriteOrg(viewer, input.org);
  const r = await createAssignments(viewer, org, input, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, ...r, message: t("assigned", { count: r.assigned, due: r.dueAt.slice(0, 10) }) }, 201);
});
