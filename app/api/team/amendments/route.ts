import { clientIp, json, readJson, route } from "@/lib/api";
import { resolveWriteOrg } from "@/lib/access";
import { amendmentSchema, saveAmendment } from "@/lib/editions";

/** POST /api/team/amendments { topic, body, org? } → the organization's local rule on that topic (replaces an earlier one). */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, amendmentSchema);
  const org = await resolveWriteOrg(viewer, input.org);
  await saveAmendment(viewer, org.orgId, input, clientIp(req));
  return json({ ok: true, message: "Local rule saved." });
});
