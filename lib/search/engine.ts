/**
 * Search over lessons, code cards and glossary terms (plain code: the /api/search route and a
 * browser alike). Each document's fields are indexed with their own weight (title, then the card
 * or lesson headings, then the text); a query is read term by term with the trade's synonyms,
 * typo correction ("did you mean") and completion of the last word as one types; sizes with units
 * are terms of their own ("1 inch" finds "1 in"). Documents whose title matches rank first, then
 * by a BM25F score that rewards covering every term of the question.
 *
 * flexsearch (./fields.ts) holds the per-field indexes: it answers which documents hold a term,
 * in which field and how often (term frequency kept in its resolution slots), and completes the
 * last word. This file is the thin layer on top: reading the query (synonyms from text.ts, typo
 * correction over the indexed word list, "did you mean") and the final ranking (title tiers, BM25F
 * with field weights), which flexsearch's own ranking does not express.
 */
import type { SearchDoc } from "./docs";
import { FIELDS, FieldIndexes, type Field } from "./fields";
import { snippet, type Segment } from "./snippet";
import { editDistance, normalize, stem, stopWords, synonymsOf, typoBudget, type SearchLang } from "./text";

export { stem, tokens, type SearchLang } from "./text";
export { snippet, type Segment } from "./snippet";

export const MAX_RESULTS = 20;
export const MAX_QUERY_LENGTH = 200;

export type SearchHit = { id: string; kind: SearchDoc["kind"]; lang: SearchLang; title: string; href: string; context: string; snippet: Segment[]; titleMatch: boolean };
export type SearchResult = { hits: SearchHit[]; didYouMean: string | null };

/** Field weights (Riser's tuning against tests/unit/search-relevance.test.ts). */
const WEIGHT: Record<Field, number> = { title: 6, headings: 2.5, context: 0.4, text: 1 };
const KIND_WEIGHT: Record<SearchDoc["kind"], number> = { card: 1.1, lesson: 1, term: 0.6 };
const K1 = 1.2;

/** One term of the query and what it may also match, with a weight per variant. */
type Slot = { word: string; variants: Map<string, number>; corrected: string | null };

export class SearchIndex {
  private docs: SearchDoc[];
  private fields: FieldIndexes;
  /** known words (no digits) by length, for typo look-ups */
  private byLength = new Map<number, string[]>();

  private lang: SearchLang;
  private stop: Set<string>;

  /** An index over documents of one language (`lang` picks the stemmer, stop words and synonyms). */
  constructor(docs: SearchDoc[], lang: SearchLang = "en") {
    this.lang = lang;
    this.stop = stopWords(lang);
    this.docs = docs;
    this.fields = new FieldIndexes(docs, lang);
    this.surface = this.buildSurface();
    for (const t of [...this.fields.vocabulary].sort()) {
      if (/\d/.test(t)) continue;
      let list = this.byLength.get(t.length);
      if (!list) this.byLength.set(t.length, (list = []));
      list.push(t);
    }
  }

  private idf(term: string): number {
    const n = this.fields.df(term);
    return Math.log(1 + (this.docs.length - n + 0.5) / (n + 0.5));
  }

  /** Typo correction for a word the corpus does not know: the closest known term, preferring ones used beside the other words. */
  private correct(word: string, others: string[]): string | null {
    const budget = typoBudget(word.length);
    if (!budget || /\d/.test(word)) return null;
    const near = new Set<number>();
    for (const o of others) for (const i of this.fields.hits(o).keys()) near.add(i);
    let best: { t: string; d: number; co: number; df: number } | null = null;
    for (let len = word.length - budget; len <= word.length + budget; len++) {
      for (const t of this.byLength.get(len) ?? []) {
        const d = editDistance(word, t, budget);
        if (d > budget) continue;
        const docs = this.fields.hits(t);
        let co = 0;
        for (const i of docs.keys()) if (near.has(i)) co++;
        const df = docs.size;
        if (!best || d < best.d || (d === best.d && (co > best.co || (co === best.co && df > best.df)))) best = { t, d, co, df };
      }
    }
    return best?.t ?? null;
  }

  private slots(query: string): Slot[] {
    const words = normalize(query)
      .split(/[^a-z0-9_]+/)
      .filter((w) => w && !this.stop.has(w));
    const stems = words.map((w) => stem(w, this.lang));
    const known = stems.filter((s) => this.fields.vocabulary.has(s));
    return words.slice(0, 12).map((word, k) => {
      const s = stems[k]!;
      const variants = new Map<string, number>();
      let corrected: string | null = null;
      if (this.fields.vocabulary.has(s)) variants.set(s, 1);
      else {
        const fix = this.correct(s, known);
        if (fix) {
          variants.set(fix, 0.85);
          corrected = fix;
        }
      }
      for (const syn of synonymsOf(s, this.lang)) if (this.fields.vocabulary.has(syn) && !variants.has(syn)) variants.set(syn, 0.6);
      // The last word may be unfinished (search as you type): complete it.
      if (k === words.length - 1 && s.length >= 3 && !/\d/.test(s)) {
        for (const t of this.fields.complete(s, 12)) if (!variants.has(t)) variants.set(t, 0.5);
      }
      return { word, variants, corrected };
    });
  }

  /** BM25F: per slot the best of its variants (a synonym never counts twice). */
  private score(slots: Slot[]): { i: number; score: number; titleSlots: number; covered: number }[] {
    const acc = new Map<number, { score: number; titleSlots: number; covered: number }>();
    for (const slot of slots) {
      const best = new Map<number, { s: number; title: boolean }>();
      for (const [term, w] of slot.variants) {
        const idf = this.idf(term);
        for (const [i, inFields] of this.fields.hits(term)) {
          let tf = 0;
          for (const f of FIELDS) tf += WEIGHT[f] * (inFields[f] ?? 0);
          const inTitle = inFields.title !== undefined;
          const s = (w * idf * tf) / (K1 + tf);
          const old = best.get(i);
          if (!old || s > old.s) best.set(i, { s, title: inTitle || (old?.title ?? false) });
          else if (inTitle) old.title = true;
        }
      }
      for (const [i, b] of best) {
        const a = acc.get(i) ?? { score: 0, titleSlots: 0, covered: 0 };
        a.score += b.s;
        a.covered++;
        if (b.title) a.titleSlots++;
        acc.set(i, a);
      }
    }
    const n = Math.max(1, slots.length);
    return [...acc].map(([i, a]) => {
      const coverage = a.covered / n;
      const allInTitle = a.titleSlots === n && n > 1 ? 1.3 : 1;
      return { i, score: a.score * (0.4 + 0.6 * coverage * coverage) * allInTitle * KIND_WEIGHT[this.docs[i]!.kind], titleSlots: a.titleSlots, covered: a.covered };
    });
  }

  /** Hits and a corrected query when a word was read as a typo. */
  query(rawQuery: string, limit = MAX_RESULTS): SearchResult {
    const query = rawQuery.slice(0, MAX_QUERY_LENGTH);
    this.fields.begin();
    const slots = this.slots(query);
    if (!slots.length || slots.every((s) => s.variants.size === 0)) return { hits: [], didYouMean: null };
    const n = Math.min(Math.max(1, limit), MAX_RESULTS);
    // Title matches first (more of the question in the title first); a glossary entry defines a
    // word, so it yields to a card or lesson with as many title matches, which answers a question.
    const tier = (r: { i: number; titleSlots: number }) => r.titleSlots - (this.docs[r.i]!.kind === "term" && r.titleSlots > 0 ? 0.5 : 0);
    const ranked = this.score(slots).sort((a, b) => tier(b) - tier(a) || b.score - a.score);
    const terms = [...new Set(slots.flatMap((s) => [...s.variants.keys()]))];
    const hits = ranked.slice(0, n).map(({ i, titleSlots }) => {
      const d = this.docs[i]!;
      return { id: d.id, kind: d.kind, lang: d.lang ?? "en", title: d.title, href: d.href, context: d.context, titleMatch: titleSlots > 0, snippet: snippet(d.text, terms, 160, this.lang) };
    });
    const didYouMean = slots.some((s) => s.corrected) ? slots.map((s) => (s.corrected ? this.display(s.corrected) : s.word)).join(" ") : null;
    return { hits, didYouMean };
  }

  /** Hits only (the older call). */
  search(rawQuery: string, limit = MAX_RESULTS): SearchHit[] {
    return this.query(rawQuery, limit).hits;
  }

  /** A stem as a reader would type it: the shortest word of the corpus with that stem. */
  private display(term: string): string {
    return this.surface.get(term) ?? term;
  }
  private surface = new Map<string, string>();
  private buildSurface(): Map<string, string> {
    const out = new Map<string, string>();
    for (const d of this.docs) {
      for (const w of normalize(`${d.title} ${d.headings ?? ""} ${d.text}`).split(/[^a-z0-9_]+/)) {
        if (!w || this.stop.has(w)) continue;
        const s = stem(w, this.lang);
        const old = out.get(s);
        if (!old || w.length < old.length) out.set(s, w);
      }
    }
    return out;
  }
}
