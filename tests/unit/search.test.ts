// Search over the real corpus: known terms, title matches first, word forms, hostile queries.
import path from "node:path";
import { describe, expect, it } from "vitest";
import { loadCatalogFrom } from "@/lib/content/load";
import { buildSearchDocs } from "@/lib/search/docs";
import { MAX_RESULTS, SearchIndex, stem } from "@/lib/search";

const docs = buildSearchDocs(loadCatalogFrom(path.resolve("content")));
const index = new SearchIndex(docs);

describe("search", () => {
  it("finds known trade terms", () => {
    for (const q of ["antifreeze", "K-factor", "solvent cement", "flow switch", "rough-in"]) {
      expect(index.search(q).length, q).toBeGreaterThan(0);
    }
  });

  it("ranks a title match first", () => {
    const hits = index.search("antifreeze");
    expect(hits[0]!.titleMatch).toBe(true);
    expect(hits[0]!.title.toLowerCase()).toContain("antifreeze");
    const firstBodyOnly = hits.findIndex((h) => !h.titleMatch);
    const lastTitle = hits.map((h) => h.titleMatch).lastIndexOf(true);
    if (firstBodyOnly >= 0) expect(lastTitle).toBeLessThan(firstBodyOnly);
  });

  it("matches word forms: insulate ↔ insulation, sidewalls ↔ sidewall", () => {
    expect(stem("insulate")).toBe(stem("insulation"));
    expect(stem("sidewalls")).toBe(stem("sidewall"));
    const insul = index.search("insulate");
    expect(insul.some((h) => h.snippet.some((s) => s.hit && /insulation/i.test(s.text)))).toBe(true);
    expect(index.search("sidewalls").some((h) => /sidewall/i.test(h.title))).toBe(true);
  });

  it("marks the match in the snippet", () => {
    const hit = index.search("cure time")[0]!;
    expect(hit.snippet.some((s) => s.hit)).toBe(true);
    expect(hit.snippet.map((s) => s.text).join("").length).toBeLessThan(220);
  });

  it("handles an empty query, a 500-character query and punctuation without error", () => {
    expect(index.search("")).toEqual([]);
    expect(index.search("   ")).toEqual([]);
    expect(() => index.search("sprinkler ".repeat(50))).not.toThrow();
    expect(index.search("x".repeat(500))).toEqual([]);
    expect(() => index.search(`"(K-factor)!?" <script> ' OR 1=1 --`)).not.toThrow();
    expect(index.search(`(K-factor)!?`).length).toBeGreaterThan(0);
  });

  it("bounds the number of results", () => {
    expect(index.search("sprinkler", 500).length).toBeLessThanOrEqual(MAX_RESULTS);
  });
});
