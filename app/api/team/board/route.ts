import { ApiError, fieldErrorsOf, json, route } from "@/lib/api";
import { getLocale } from "next-intl/server";
import { localeOf } from "@/lib/i18n/browser";
import { boardPage } from "@/lib/team";
import { withCellExtras } from "@/lib/team";
import { parseBoardQuery } from "@/lib/team";
import { resolveScope } from "@/lib/access";

/**
 * GET /api/team/board?page=&pageSize=&team=&status=&module=&dueBefore=&sort=&dir=&q=[&org= admins]
 * → one page of people × modules with each cell's status,
 * its waiting sign-offs and its certificate serial. Managers: their organization only.
 */
export const GET = route("manager", async ({ req, viewer }) => {
  const parsed = parseBoardQuery(new URL(req.url).searchParams);
  if (!parsed.success) throw new ApiError(400, "Some filters are not valid.", fieldErrorsOf(parsed.error));
  const scope = await resolveScope(viewer, parsed.data.org);
  const page = await boardPage(scope, parsed.data, new Date(), localeOf(await getLocale()));
  return json({ ...page, rows: await withCellExtras(page.rows) });
});
