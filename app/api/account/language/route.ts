import { json, readJson, route } from "@/lib/api";
import { languageCookie, saveLanguage } from "@/lib/account";
import { languageChoice } from "@/lib/i18n";

/**
 * POST /api/account/language { language: "en" | "es" } → remembers the choice in a cookie and, for a
 * signed-in person, in their account (pages, e-mails and certificates follow it).
 */
export const POST = route("public", async ({ req, viewer }) => {
  const { language } = await readJson(req, languageChoice);
  if (viewer) await saveLanguage(viewer.id, language);
  return json({ ok: true, language }, { headers: { "Set-Cookie": languageCookie(language) } });
});
