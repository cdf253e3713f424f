import { json, readJson, route } from "@/lib/api";
import { assertSameOrigin, requestContext } from "@/lib/admin";
import { banPerson } from "@/lib/admin";
import { banSchema } from "@/lib/admin";

/** POST /api/admin/people/:id/ban { reason, days? } → better-auth banUser, which ends their sessions (audited: user.ban). */
export const POST = route<{ id: string }>("admin", async ({ req, viewer, params }) => {
  assertSameOrigin(req);
  const { reason, days } = await readJson(req, banSchema);
  await banPerson(viewer, params.id, reason, days, requestContext(req));
  return json({ ok: true });
});
