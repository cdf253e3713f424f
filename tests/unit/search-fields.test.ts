// The flexsearch layer of search: per-field look-ups carry the normalized term frequency in
// flexsearch's resolution slots, the document frequency counts documents across fields, and the
// forward-tokenized vocabulary completes a prefix.
import { describe, expect, it } from "vitest";
import type { SearchDoc } from "@/lib/search/docs";
import { FieldIndexes } from "@/lib/search/fields";
import { tokens } from "@/lib/search/text";

const doc = (id: string, title: string, text: string, headings?: string): SearchDoc => ({ id, kind: "card", title, href: `/x/${id}`, context: "Test", headings, text });
const docs = [
  doc("a", "Hanger spacing", "Pipe pipe pipe support every few feet along the pipe run."),
  doc("b", "Valve tags", "One pipe reaches the valve."),
  doc("c", "Trim", "Escutcheon over the head.", "Pipe"),
];
const fx = new FieldIndexes(docs);

describe("flexsearch field indexes", () => {
  it("finds a term in each field where it occurs and counts documents once", () => {
    const hits = fx.hits("pipe");
    expect([...hits.keys()].sort()).toEqual([0, 1, 2]);
    expect(hits.get(2)!.headings).toBeGreaterThan(0);
    expect(hits.get(2)!.text).toBeUndefined();
    expect(fx.df("pipe")).toBe(3);
    expect(fx.df("valv")).toBe(1); // "valve" stems to "valv"
    expect(fx.df("nowhere")).toBe(0);
  });

  it("keeps the BM25 length-normalized term frequency of each field (within the slot rounding)", () => {
    // BM25 with b = 0.75: x = tf / (1 − b + b·len/avgLen) (Robertson & Zaragoza, "The Probabilistic
    // Relevance Framework: BM25 and Beyond", 2009, eq. for the BM25F per-field normalization).
    const lens = docs.map((d) => tokens(d.text).length);
    const avg = lens.reduce((a, b) => a + b, 0) / lens.length;
    const x = (tf: number, len: number) => tf / (1 - 0.75 + (0.75 * len) / avg);
    const hits = fx.hits("pipe");
    expect(tokens(docs[0]!.text).filter((t) => t === "pipe")).toHaveLength(4);
    expect(Math.abs(hits.get(0)!.text! / x(4, lens[0]!) - 1)).toBeLessThan(0.05);
    expect(Math.abs(hits.get(1)!.text! / x(1, lens[1]!) - 1)).toBeLessThan(0.05);
    expect(hits.get(0)!.text!).toBeGreaterThan(hits.get(1)!.text!);
  });

  it("completes a prefix from the indexed words, in alphabetical order", () => {
    expect(fx.complete("spac", 12)).toEqual(["spac"]);
    expect(fx.complete("es", 12)).toEqual(["escutcheon"]);
    expect(fx.complete("zz", 12)).toEqual([]);
    expect(fx.vocabulary.has("hang")).toBe(true);
  });
});
