import { clientIp, json, route } from "@/lib/api";
import { resolveWriteOrg } from "@/lib/access";
import { cardTopic } from "@/lib/content";
import { DomainError } from "@/lib/errors";
import { removeAmendment } from "@/lib/editions";

/** DELETE /api/team/amendments/[topic][?org=] → the local rule removed; unknown topic or none on it → 404. */
export const DELETE = route<{ topic: string }>("manager", async ({ req, viewer, params }) => {
  if (!cardTopic.safeParse(params.topic).success) throw new DomainError("not-found", "No such topic.");
  const org = await resolveWriteOrg(viewer, new URL(req.url).searchParams.get("org"));
  await removeAmendment(viewer, org.orgId, params.topic, clientIp(req));
  return json({ ok: true, message: "Local rule removed." });
});
