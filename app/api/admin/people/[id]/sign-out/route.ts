import { json, readJson, route } from "@/lib/api";
import { assertSameOrigin, requestContext } from "@/lib/admin";
import { signOutPerson } from "@/lib/admin";
import { signOutSchema } from "@/lib/admin";

/** POST /api/admin/people/:id/sign-out { reason? } → better-auth revokeUserSessions (audited: user.sign-out). */
export const POST = route<{ id: string }>("admin", async ({ req, viewer, params }) => {
  assertSameOrigin(req);
  const { reason } = await readJson(req, signOutSchema);
  return json(await signOutPerson(viewer, params.id, reason, requestContext(req)));
});
