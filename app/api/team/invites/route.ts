import { clientIp, json, readJson, route } from "@/lib/api";
import { listInvitations } from "@/lib/team";
import { inviteOne, orgDefaultLanguage } from "@/lib/team";
import { getTranslations } from "next-intl/server";
import { inviteSchema } from "@/lib/team";
import { resolveScope, resolveWriteOrg } from "@/lib/access";

/**
 * POST /api/team/invites { email, name?, role, teamId?, org? (admins) } → 201, and the mail with a
 * single-use link goes out. A member's e-mail → 409 with a plain message, nothing changed; no free
 * seat → 409 with the billing link.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, inviteSchema);
  const org = await resolveWriteOrg(viewer, input.org);
  const language = input.language ?? (await orgDefaultLanguage(org.orgId));
  const r = await inviteOne(viewer, org, { email: input.email, name: input.name ?? null, role: input.role, teamId: input.teamId ?? null, assign: input.assign, language }, clientIp(req));
  const t = await getTranslations("teamApi");
  const message = r.replaced ? t("inviteReplaced", { email: r.email }) : t("inviteSent", { email: r.email });
  return json({ ok: true, id: r.id, email: r.email, replaced: r.replaced > 0, mailed: r.mailed, message }, 201);
});

/** GET /api/team/invites[?org=] → the organization's invitations with their status; admins name ?org=. */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  return json({ invitations: scope.orgId ? await listInvitations(scope.orgId) : [] });
});
