import { clientIp, json, readJson, route } from "@/lib/api";
import { acceptInvite } from "@/lib/team";
import { acceptInviteSchema } from "@/lib/team";

/**
 * POST /api/invite/accept { token, name, password, confirm } → 201 { email }: the account exists in
 * the inviting organization with a verified e-mail, so the person can sign in at once. A used,
 * replaced or expired link → 410 with the reason.
 */
export const POST = route("public", async ({ req }) => {
  const input = await readJson(req, acceptInviteSchema);
  const result = await acceptInvite(input, req.headers, clientIp(req));
  return json({ ok: true, email: result.email }, 201);
});
