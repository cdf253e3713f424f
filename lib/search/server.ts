import "server-only";
import docs from "./generated/docs.json";
import type { SearchDoc } from "./docs";
import { MAX_RESULTS, SearchIndex, type SearchResult } from "./engine";
import type { SearchLang } from "./text";

const indexes = new Map<SearchLang, SearchIndex>();
/** The index of one language over the documents built from content at build time (scripts/content-build.ts). */
export function searchIndex(lang: SearchLang = "en"): SearchIndex {
  let index = indexes.get(lang);
  if (!index) indexes.set(lang, (index = new SearchIndex((docs as SearchDoc[]).filter((d) => (d.lang ?? "en") === lang), lang)));
  return index;
}

/** Which documents a request searches: the reader's language, or both when asked for ("all"). */
export type SearchScope = SearchLang | "all";
export const searchScope = (requested: string | null, reader: SearchLang): SearchScope => (requested === "all" ? "all" : requested === "en" || requested === "es" ? requested : reader);

/** A query in one language, or in both: then each language's hits in turn, title matches first. */
export function searchIn(scope: SearchScope, q: string, limit = MAX_RESULTS): SearchResult {
  if (scope !== "all") return searchIndex(scope).query(q, limit);
  const [a, b] = [searchIndex("en").query(q, limit), searchIndex("es").query(q, limit)];
  const merged = [];
  for (let i = 0; i < Math.max(a.hits.length, b.hits.length); i++) merged.push(...[a.hits[i], b.hits[i]].filter((h) => h !== undefined));
  const hits = merged.map((h, rank) => ({ h, rank })).sort((x, y) => Number(y.h.titleMatch) - Number(x.h.titleMatch) || x.rank - y.rank).map((x) => x.h).slice(0, Math.min(limit, MAX_RESULTS));
  return { hits, didYouMean: a.didYouMean ?? b.didYouMean };
}
