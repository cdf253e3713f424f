import { getLocale } from "next-intl/server";
import { json, route } from "@/lib/api";
import { localeOf } from "@/lib/i18n/browser";
import { MAX_QUERY_LENGTH, MAX_RESULTS, searchScope } from "@/lib/search/browser";
import { searchIn } from "@/lib/search";

/**
 * GET /api/search?q=…&limit=…&lang=… → at most 20 hits, title matches first, and a "did you mean" for
 * typos. Results are in the reader's language; `lang=all` searches English and Spanish, `lang=en|es` one.
 */
export const GET = route("signed-in", async ({ req }) => {
  const url = new URL(req.url);
  const q = (url.searchParams.get("q") ?? "").slice(0, MAX_QUERY_LENGTH);
  const limit = Math.min(MAX_RESULTS, Math.max(1, Number(url.searchParams.get("limit")) || 10));
  const scope = searchScope(url.searchParams.get("lang"), localeOf(await getLocale()));
  const { hits, didYouMean } = q.trim() ? searchIn(scope, q, limit) : { hits: [], didYouMean: null };
  return json({ query: q, lang: scope, count: hits.length, hits, didYouMean });
});
