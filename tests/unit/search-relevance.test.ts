// Relevance over the real corpus: each job-site question must bring the answering card or lesson
// into the top 3 (tests/unit/search-relevance.fixture.ts). Typos, synonyms and sizes included.
import path from "node:path";
import { describe, expect, it } from "vitest";
import { loadCatalogFrom } from "@/lib/content/load";
import { buildSearchDocs } from "@/lib/search/docs";
import { SearchIndex } from "@/lib/search";
import { editDistance, normalize, tokens } from "@/lib/search/text";
import { RELEVANCE } from "./search-relevance.fixture";

const index = new SearchIndex(buildSearchDocs(loadCatalogFrom(path.resolve("content"))));

describe("search relevance", () => {
  it("has at least 40 questions", () => expect(RELEVANCE.length).toBeGreaterThanOrEqual(40));
  for (const [q, must] of RELEVANCE) {
    it(`“${q}” → ${must.join(", ")}`, () => {
      const top = index.search(q, 3).map((h) => h.id);
      for (const id of must) expect(top, `top 3 for “${q}”: ${top.join(", ")}`).toContain(id);
    });
  }
});

describe("query reading", () => {
  it("offers “did you mean” for a typo and still answers", () => {
    const r = index.query("cpvc cure tme");
    expect(r.didYouMean).toBe("cpvc cure time");
    expect(r.hits.some((h) => /cure/i.test(h.title) || h.snippet.some((s) => s.hit && /cure/i.test(s.text)))).toBe(true);
    expect(index.query("sidewall spacing").didYouMean).toBeNull();
  });
  it("tolerates typos in longer words", () => {
    expect(index.search("antifreze", 3)[0]!.id).toBe("card:antifreeze-systems");
    expect(index.search("hydrostatc test", 3).map((h) => h.id)).toContain("card:acceptance-test-and-hydrostatic-test");
  });
  it("keeps sizes with their unit as one term", () => {
    expect(tokens("1 inch")).toEqual(tokens('1"'));
    expect(tokens("1 in")).toEqual(["1in"]);
    expect(tokens("1-1/4 in")).toEqual(["1_1_4in"]);
    expect(normalize("side wall")).toContain("sidewall");
  });
  it("edit distance counts an adjacent swap as one edit (optimal string alignment)", () => {
    expect(editDistance("tme", "time")).toBe(1);
    expect(editDistance("hangre", "hanger")).toBe(1);
    expect(editDistance("valve", "value")).toBe(1);
    expect(editDistance("pipe", "cpvc", 2)).toBeGreaterThan(2);
  });
});
