/**
 * Full-text search over lessons, cards and glossary terms with flexsearch. Works in Node (the
 * /api/search route) and in a browser alike. Title matches rank before body matches; a light
 * English stemmer makes "insulate" find "insulation" and "sidewalls" find "sidewall"; forward
 * tokenizing gives results as you type.
 */
import { Index } from "flexsearch";
import type { SearchDoc } from "./docs";

export const MAX_RESULTS = 20;
export const MAX_QUERY_LENGTH = 200;

const STOP = new Set(["a", "an", "and", "are", "as", "at", "be", "by", "for", "from", "in", "is", "it", "of", "on", "or", "the", "to", "with", "what", "how", "do", "does"]);
const SUFFIXES = ["ations", "ation", "ings", "ing", "ions", "ion", "ers", "er", "ied", "ies", "ed", "es", "ate", "s", "e"];

/** Reduces an English word to a rough stem; the same rule runs on content and queries. */
export function stem(word: string): string {
  let w = word;
  for (const s of SUFFIXES) {
    if (w.length - s.length >= 4 && w.endsWith(s)) {
      w = w.slice(0, -s.length);
      break;
    }
  }
  return w;
}

export function tokens(text: string): string[] {
  return text
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .split(/[^a-z0-9]+/)
    .filter((t) => t && !STOP.has(t))
    .map(stem);
}

export type Segment = { text: string; hit: boolean };
export type SearchHit = { id: string; kind: SearchDoc["kind"]; title: string; href: string; context: string; snippet: Segment[]; titleMatch: boolean };

export class SearchIndex {
  private titles = new Index({ tokenize: "forward", encode: tokens, resolution: 9 });
  private bodies = new Index({ tokenize: "forward", encode: tokens, resolution: 9, context: false });
  private docs: SearchDoc[];

  constructor(docs: SearchDoc[]) {
    this.docs = docs;
    docs.forEach((d, i) => {
      this.titles.add(i, d.title);
      this.bodies.add(i, `${d.context} ${d.text}`);
    });
  }

  search(rawQuery: string, limit = MAX_RESULTS): SearchHit[] {
    const query = rawQuery.slice(0, MAX_QUERY_LENGTH);
    const terms = tokens(query);
    if (!terms.length) return [];
    const q = terms.join(" ");
    const n = Math.min(Math.max(1, limit), MAX_RESULTS);
    const inTitle = this.titles.search(q, { limit: n }) as number[];
    const inBody = this.bodies.search(q, { limit: n * 2 }) as number[];
    const seen = new Set<number>();
    const order: { i: number; titleMatch: boolean }[] = [];
    for (const [ids, titleMatch] of [[inTitle, true], [inBody, false]] as const) {
      for (const i of ids) {
        if (seen.has(i)) continue;
        seen.add(i);
        order.push({ i, titleMatch });
      }
    }
    return order.slice(0, n).map(({ i, titleMatch }) => {
      const d = this.docs[i]!;
      return { id: d.id, kind: d.kind, title: d.title, href: d.href, context: d.context, titleMatch, snippet: snippet(d.text, terms) };
    });
  }
}

const escapeRe = (t: string) => t.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** About 160 characters of text around the first matching word, with the matches marked. */
export function snippet(text: string, terms: string[], width = 160): Segment[] {
  // A word matches when it starts with a query stem (prefix search), so only the window is scanned.
  const wordStart = new RegExp(`(^|[^A-Za-z0-9])(${terms.map(escapeRe).join("|")})`, "i");
  const first = wordStart.exec(text);
  const at = first ? first.index + first[1]!.length : 0;
  let start = Math.max(0, at - Math.floor(width / 3));
  if (start > 0) start = text.indexOf(" ", start) + 1 || start;
  const end = Math.min(text.length, start + width);
  const slice = text.slice(start, end);
  const matches = (w: string) => {
    const s = tokens(w)[0];
    return !!s && terms.some((t) => s.startsWith(t) || t.startsWith(s));
  };
  const out: Segment[] = [];
  let last = 0;
  for (const m of slice.matchAll(/[A-Za-z0-9\u00C0-\u024F]+/g)) {
    if (!matches(m[0])) continue;
    if (m.index! > last) out.push({ text: slice.slice(last, m.index), hit: false });
    out.push({ text: m[0], hit: true });
    last = m.index! + m[0].length;
  }
  if (last < slice.length) out.push({ text: slice.slice(last), hit: false });
  if (start > 0) out.unshift({ text: "… ", hit: false });
  if (end < text.length) out.push({ text: " …", hit: false });
  return out;
}
