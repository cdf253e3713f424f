import { ApiError, fieldErrorsOf, route } from "@/lib/api";
import { boardCsv } from "@/lib/team";
import { parseBoardQuery } from "@/lib/team";
import { resolveScope } from "@/lib/access";
import { requestLocale } from "@/lib/i18n";

/** GET /api/team/board.csv?(the board's filters) → every matching person, streamed as CSV (headers in the downloader's language). */
export const GET = route("manager", async ({ req, viewer }) => {
  const parsed = parseBoardQuery(new URL(req.url).searchParams);
  if (!parsed.success) throw new ApiError(400, "Some filters are not valid.", fieldErrorsOf(parsed.error));
  return boardCsv(await resolveScope(viewer, parsed.data.org), parsed.data, await requestLocale());
});
