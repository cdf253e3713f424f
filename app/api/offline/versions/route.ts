import { json, route } from "@/lib/api";
import { contentLocale } from "@/lib/content";
import { requestLocale } from "@/lib/i18n";
import { moduleVersions } from "@/lib/offline";

/**
 * GET /api/offline/versions → { modules: { slug: version } } in the reader's language: a phone
 * replaces kept copies whose version differs (changed content, a new build, or a change of language).
 */
export const GET = route("signed-in", async () => json({ modules: moduleVersions(contentLocale(await requestLocale())) }));
