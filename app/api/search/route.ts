import { json, route } from "@/lib/api";
import { MAX_QUERY_LENGTH, MAX_RESULTS } from "@/lib/search/browser";
import { searchIndex } from "@/lib/search";

/** GET /api/search?q=…&limit=… → at most 20 hits, title matches first, and a "did you mean" for typos. */
export const GET = route("signed-in", async ({ req }) => {
  const url = new URL(req.url);
  const q = (url.searchParams.get("q") ?? "").slice(0, MAX_QUERY_LENGTH);
  const limit = Math.min(MAX_RESULTS, Math.max(1, Number(url.searchParams.get("limit")) || 10));
  const { hits, didYouMean } = q.trim() ? searchIndex().query(q, limit) : { hits: [], didYouMean: null };
  return json({ query: q, count: hits.length, hits, didYouMean });
});
