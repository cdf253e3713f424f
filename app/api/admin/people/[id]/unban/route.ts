import { json, readJson, route } from "@/lib/api";
import { assertSameOrigin, requestContext } from "@/lib/admin";
import { unbanPerson } from "@/lib/admin";
import { unbanSchema } from "@/lib/admin";

/** POST /api/admin/people/:id/unban { reason? } → better-auth unbanUser (audited: user.unban). */
export const POST = route<{ id: string }>("admin", async ({ req, viewer, params }) => {
  assertSameOrigin(req);
  const { reason } = await readJson(req, unbanSchema);
  await unbanPerson(viewer, params.id, reason, requestContext(req));
  return json({ ok: true });
});
