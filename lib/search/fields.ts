/**
 * The flexsearch side of search: one flexsearch `Index` per document field (title, headings,
 * context, text) and a forward-tokenized flexsearch `Index` over the vocabulary for completing the
 * last word as one types.
 *
 * Documents are added already tokenized by the project's own rules (lib/search/text.ts: sizes with
 * units as one term, stems, stop words); the flexsearch encoder only splits on the spaces between
 * those terms, so a query term reaches flexsearch exactly as indexed.
 *
 * Term frequency is not something a flexsearch result carries, so each field index gets a custom
 * `score`: flexsearch calls it once per (document, term) with the document's whole token list, and
 * it returns the resolution slot. We use the slot to store the BM25 length-normalized term
 * frequency of that field, x = tf / (1 − b + b·len/avgLen), quantized as q = x / (1 + x) over
 * RESOLUTION slots (slot 0 = most). Looking a term up with `resolve: false` gives flexsearch's
 * Resolver, whose `result` lists documents by slot: the documents holding the term in that field
 * (their count across fields is the document frequency) with x read back from the slot.
 */
import { Index } from "flexsearch";
import type { SearchDoc } from "./docs";
import { tokens, type SearchLang } from "./text";

export const FIELDS = ["title", "headings", "context", "text"] as const;
export type Field = (typeof FIELDS)[number];

const B = 0.75;
const RESOLUTION = 256;
const splitTerms = (s: string) => s.split(" ").filter(Boolean);

const toSlot = (x: number) => Math.min(RESOLUTION - 1, Math.max(1, Math.round((1 - x / (1 + x)) * (RESOLUTION - 1))));
const fromSlot = (slot: number) => {
  const q = 1 - slot / (RESOLUTION - 1);
  return q / (1 - q);
};

/** Per document, the normalized term frequency of a term in each field where it occurs. */
export type TermHits = Map<number, Partial<Record<Field, number>>>;

export class FieldIndexes {
  private byField = {} as Record<Field, Index>;
  private completer = new Index({ tokenize: "forward", encode: splitTerms, resolution: 1 });
  private limit: number;
  /** the vocabulary in the order it was added to the completer (completer id → term) */
  private words: string[] = [];
  /** every indexed term (the word list for typo look-ups and "is this word known") */
  readonly vocabulary = new Set<string>();
  private memo = new Map<string, TermHits>();

  constructor(docs: SearchDoc[], lang: SearchLang = "en") {
    this.limit = Math.max(1, docs.length);
    const terms = docs.map((d) => FIELDS.map((f) => tokens(d[f] ?? "", lang)));
    FIELDS.forEach((f, k) => {
      const avg = Math.max(1, terms.reduce((sum, t) => sum + t[k]!.length, 0) / this.limit);
      const score = (content: string[], term: string) => {
        let n = 0;
        for (const t of content) if (t === term) n++;
        return toSlot(n / (1 - B + (B * content.length) / avg));
      };
      const index = new Index({ tokenize: "strict", encode: splitTerms, resolution: RESOLUTION, score });
      terms.forEach((t, i) => {
        if (t[k]!.length) index.add(i, t[k]!.join(" "));
        for (const term of t[k]!) this.vocabulary.add(term);
      });
      this.byField[f] = index;
    });
    // Sorted, so that completions come back in a stable (alphabetical) order.
    this.words = [...this.vocabulary].sort();
    this.words.forEach((term, i) => this.completer.add(i, term));
  }

  /** Documents holding `term`, with its normalized frequency per field (looked up in flexsearch). */
  hits(term: string): TermHits {
    const cached = this.memo.get(term);
    if (cached) return cached;
    const out: TermHits = new Map();
    if (this.vocabulary.has(term)) {
      for (const f of FIELDS) {
        const slots = this.byField[f].search(term, { limit: this.limit, resolve: false }).result;
        slots.forEach((ids, slot) => {
          for (const id of ids ?? []) {
            const i = Number(id);
            const entry = out.get(i) ?? {};
            entry[f] = fromSlot(slot);
            out.set(i, entry);
          }
        });
      }
    }
    this.memo.set(term, out);
    return out;
  }

  /** Starts a new query: look-ups are remembered for one query only. */
  begin(): void {
    this.memo.clear();
  }

  /** How many documents hold `term` in any field. */
  df(term: string): number {
    return this.hits(term).size;
  }

  /** Known terms starting with `prefix` (flexsearch forward tokenization), at most `max`. */
  complete(prefix: string, max: number): string[] {
    return this.completer
      .search(prefix, { limit: max })
      .map((id) => Number(id))
      .sort((a, b) => a - b)
      .map((i) => this.words[i]!);
  }
}
