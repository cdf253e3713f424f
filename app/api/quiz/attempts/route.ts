import { getLocale } from "next-intl/server";
import { z } from "zod";
import { ApiError, json, readJson, route } from "@/lib/api";
import { inRequestLanguage } from "@/lib/i18n";
import { slug } from "@/lib/content";
import { localeOf } from "@/lib/i18n/browser";
import { listAttempts, listOrganizationAttempts, startAttempt } from "@/lib/quiz";

/** POST /api/quiz/attempts { module } → starts (or resumes) an attempt; questions only, no answers. */
export const POST = inRequestLanguage(route("signed-in", async ({ req, viewer }) => {
  const { module } = await readJson(req, z.object({ module: slug }));
  return json(await startAttempt(viewer, module, localeOf(await getLocale())), 201);
}));

/** GET /api/quiz/attempts?module=&userId= (own or a managed person's) or ?organizationId= (managers). */
export const GET = route("signed-in", async ({ req, viewer }) => {
  const url = new URL(req.url);
  const moduleSlug = url.searchParams.get("module") ?? undefined;
  const organizationId = url.searchParams.get("organizationId");
  if (organizationId) return json({ attempts: await listOrganizationAttempts(viewer, organizationId, moduleSlug) });
  const personId = url.searchParams.get("userId") ?? viewer.id;
  if (personId.length > 36) throw new ApiError(400, "userId is not valid.");
  return json({ attempts: await listAttempts(viewer, personId, moduleSlug) });
});
