import "server-only";
import docs from "./generated/docs.json";
import type { SearchDoc } from "./docs";
import { MAX_RESULTS, SearchIndex, type SearchResult } from "./engine";
import { mergeLanguages, type SearchScope } from "./scope";
import type { SearchLang } from "./text";

const indexes = new Map<SearchLang, SearchIndex>();
/** The index of one language over the documents built from content at build time (scripts/content-build.ts). */
export function searchIndex(lang: SearchLang = "en"): SearchIndex {
  let index = indexes.get(lang);
  if (!index) indexes.set(lang, (index = new SearchIndex((docs as SearchDoc[]).filter((d) => (d.lang ?? "en") === lang), lang)));
  return index;
}

/** A query in one language, or in both ("all"). */
export function searchIn(scope: SearchScope, q: string, limit = MAX_RESULTS): SearchResult {
  if (scope !== "all") return searchIndex(scope).query(q, limit);
  return mergeLanguages(searchIndex("en").query(q, limit), searchIndex("es").query(q, limit), limit);
}
