/** Snippets: about 160 characters of a text around the first match, with the matches marked. */
import { normalize, stem, type SearchLang } from "./text";

export type Segment = { text: string; hit: boolean };

const escapeRe = (t: string) => t.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/** About 160 characters of text around the first matching word, with the matches marked. */
export function snippet(text: string, terms: string[], width = 160, lang: SearchLang = "en"): Segment[] {
  const words = terms.filter((t) => /^[a-z]/.test(t));
  const wordStart = words.length ? new RegExp(`(^|[^A-Za-z0-9])(${words.map(escapeRe).join("|")})`, "i") : null;
  // accents folded (one code unit each, so offsets stay those of `text`) to find the first match
  const folded = text.normalize("NFD").replace(/[\u0300-\u036f]/g, "");
  const first = wordStart?.exec(folded.length === text.length ? folded : text);
  const at = first ? first.index + first[1]!.length : 0;
  let start = Math.max(0, at - Math.floor(width / 3));
  if (start > 0) start = text.indexOf(" ", start) + 1 || start;
  const end = Math.min(text.length, start + width);
  const slice = text.slice(start, end);
  const matches = (w: string) => {
    const s = stem(normalize(w).trim(), lang);
    return terms.some((t) => s.startsWith(t) || (t.startsWith(s) && s.length >= 3));
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
