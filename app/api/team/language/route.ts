import { getTranslations } from "next-intl/server";
import { clientIp, json, readJson, route } from "@/lib/api";
import { resolveScope, resolveWriteOrg } from "@/lib/access";
import { orgDefaultLanguage, orgLanguageSchema, setOrgDefaultLanguage } from "@/lib/team";

/** GET /api/team/language[?org=] → the language new invitations start with (null for an admin who names no organization). */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  return json({ language: scope.orgId ? await orgDefaultLanguage(scope.orgId) : null });
});

/** POST /api/team/language { language: "en" | "es", org? } → the organization's default for new invitations (audited). */
export const POST = route("manager", async ({ req, viewer }) => {
  const input = await readJson(req, orgLanguageSchema);
  const org = await resolveWriteOrg(viewer, input.org);
  const { changed } = await setOrgDefaultLanguage(viewer, org.orgId, input.language, clientIp(req));
  const t = await getTranslations("teamApi");
  return json({ ok: true, changed, language: input.language, message: t("defaultLanguageSaved", { language: input.language }) });
});
