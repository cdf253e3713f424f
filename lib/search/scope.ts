/** Which language(s) a search covers: the reader's by default, both when the request asks (`lang=all`). */
import { MAX_RESULTS, type SearchResult } from "./engine";
import type { SearchLang } from "./text";

export type SearchScope = SearchLang | "all";

/** The scope of a request: `lang=all` both languages, `lang=en|es` that one, anything else the reader's language. */
export const searchScope = (requested: string | null, reader: SearchLang): SearchScope => (requested === "all" ? "all" : requested === "en" || requested === "es" ? requested : reader);

/** Two languages' results as one list: each language's hits in turn, title matches first. */
export function mergeLanguages(a: SearchResult, b: SearchResult, limit = MAX_RESULTS): SearchResult {
  const merged = [];
  for (let i = 0; i < Math.max(a.hits.length, b.hits.length); i++) merged.push(...[a.hits[i], b.hits[i]].filter((h) => h !== undefined));
  const hits = merged
    .map((h, rank) => ({ h, rank }))
    .sort((x, y) => Number(y.h.titleMatch) - Number(x.h.titleMatch) || x.rank - y.rank)
    .map((x) => x.h)
    .slice(0, Math.min(limit, MAX_RESULTS));
  return { hits, didYouMean: a.didYouMean ?? b.didYouMean };
}
