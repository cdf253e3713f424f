import "server-only";
import docs from "./generated/docs.json";
import type { SearchDoc } from "./docs";
import { SearchIndex } from "./engine";

let index: SearchIndex | null = null;
/** The index over the documents built from content at build time (scripts/content-build.ts). */
export function searchIndex(): SearchIndex {
  index ??= new SearchIndex(docs as SearchDoc[]);
  return index;
}
