/**
 * Text rules shared by indexing and queries (plain code, runs in Node and in a browser):
 * tokens with sizes and units kept as one term ("1 inch", "1 in", 1" → "1in"; "1-1/4 in" →
 * "1_1_4in"), a light English stemmer and the Snowball Spanish stemmer, the trade's synonyms, and
 * edit distance for typos. Accents are folded before stemming on both sides (content and query), so
 * "valvula" finds "válvula" and "rociadores" finds "rociador".
 */
import { stemmer as spanishStemmer } from "@orama/stemmers/spanish";

/** The language of a search document and of the index that holds it. */
export type SearchLang = "en" | "es";

export const STOP = new Set(["a", "an", "and", "are", "as", "at", "be", "by", "can", "for", "from", "i", "in", "is", "it", "my", "of", "on", "or", "the", "to", "with", "what", "how", "do", "does", "should", "which", "when", "where", "much", "many", "far", "need", "we", "you"]);
/** Spanish words too common to search by (accents folded). */
export const STOP_ES = new Set(["a", "al", "como", "con", "cual", "cuando", "de", "del", "donde", "el", "en", "es", "esta", "este", "hay", "la", "las", "le", "lo", "los", "mas", "o", "para", "pero", "por", "que", "se", "si", "sin", "son", "su", "sus", "tu", "un", "una", "uno", "y", "ya"]);
export const stopWords = (lang: SearchLang = "en") => (lang === "es" ? STOP_ES : STOP);

const SUFFIXES = ["ations", "ation", "ings", "ing", "ions", "ion", "ers", "er", "ied", "ies", "ed", "es", "ate", "s", "e"];

/** Reduces a word (lower case, accents folded) to its stem; the same rule runs on content and queries. */
export function stem(word: string, lang: SearchLang = "en"): string {
  if (/\d/.test(word)) return word;
  if (lang === "es") return word.length > 3 ? fold(spanishStemmer(word)) : word;
  let w = word;
  for (const s of SUFFIXES) {
    if (w.length - s.length >= 4 && w.endsWith(s)) {
      w = w.slice(0, -s.length);
      break;
    }
  }
  return w;
}

const UNITS: [RegExp, string][] = [
  [/^(?:"|″|''|inch|inches|in)$/, "in"],
  [/^(?:'|′|ft|feet|foot)$/, "ft"],
  [/^psi$/, "psi"],
  [/^gpm$/, "gpm"],
];
const SIZE_UNIT = /(\d+(?:[\s-]\d+\/\d+|\/\d+|\.\d+)?)\s*("|″|''|′|'|inches|inch|in|feet|foot|ft|psi|gpm)(?![a-z])/g;

const fold = (t: string) => t.normalize("NFKD").replace(/[\u0300-\u036f]/g, "");

/** Lower case, accents off, sizes with their unit joined into one term, "side wall" → "sidewall". */
export function normalize(text: string): string {
  return text
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/\bside[\s-]+wall/g, "sidewall")
    .replace(/\bk[\s-]+factor/g, "kfactor")
    .replace(SIZE_UNIT, (_m, n: string, u: string) => {
      const unit = UNITS.find(([re]) => re.test(u))?.[1] ?? u;
      return ` ${n.replace(/[\s/.-]+/g, "_")}${unit} `;
    });
}

/** Words of a text as index terms (stop words dropped, stems). */
export function tokens(text: string, lang: SearchLang = "en"): string[] {
  const stop = stopWords(lang);
  return normalize(text)
    .split(/[^a-z0-9_]+/)
    .filter((t) => t && !stop.has(t))
    .map((t) => stem(t, lang));
}

/** Groups of words a person on site uses for the same thing (stems). */
const GROUPS: string[][] = [
  ["hang", "hanger", "support", "strap", "clamp"],
  ["head", "sprinkl"],
  ["riser", "supply", "suppl"],
  ["spac", "distanc", "apart", "spacing"],
  ["cure", "cured", "curing", "set", "dry"],
  ["backflow", "rpz", "dcva"],
  ["prevent", "protect"],
  ["antifreez", "glycol", "glycerin"],
  ["pendent", "pendant"],
  ["obstruction", "obstruct", "obstacle", "blockage"],
  ["hydrostatic", "hydro"],
  ["shutoff", "valve"],
  ["escutcheon", "cover", "plate", "trim"],
  ["freez", "frozen", "froze"],
  ["pex", "tubing"],
  ["alarm", "bell", "switch"],
  ["paint", "painted", "overspray", "overspr"],
  ["operat", "oper", "activ", "activat", "goes", "trip", "fus"],
  ["attic", "crawlspace"],
  ["meter", "tap"],
  ["size", "sizing", "siz"],
  ["glue", "cement", "solvent"],
  ["calc", "calculation", "hydraulic"],
  ["omit", "omitted", "exempt", "skip"],
  ["permit", "submittal"],
  ["homebuyer", "buyer", "homeowner"],
];
const SYNONYMS = new Map<string, string[]>();
for (const g of GROUPS) for (const w of g) SYNONYMS.set(w, [...new Set([...(SYNONYMS.get(w) ?? []), ...g.filter((x) => x !== w)])]);

/** The same for Spanish (stems of accent-folded words), including the English words crews use on site. */
const GROUPS_ES: string[][] = [
  ["colgador", "soport", "abrazader"],
  ["rociador", "sprinkler"],
  ["anticongel", "glicol", "glicerin"],
  ["contraflu", "antirretorn", "backflow"],
  ["pegament", "cement", "solvent"],
  ["obstruccion", "obstacul"],
  ["permis", "submittal"],
];
const SYNONYMS_ES = new Map<string, string[]>();
for (const g of GROUPS_ES) for (const w of g) SYNONYMS_ES.set(w, [...new Set([...(SYNONYMS_ES.get(w) ?? []), ...g.filter((x) => x !== w)])]);

export function synonymsOf(term: string, lang: SearchLang = "en"): string[] {
  return (lang === "es" ? SYNONYMS_ES : SYNONYMS).get(term) ?? [];
}

/** Optimal string alignment distance (Damerau–Levenshtein with adjacent swaps), stopping past `max`. */
const rows = [new Int32Array(64), new Int32Array(64), new Int32Array(64)];
export function editDistance(a: string, b: string, max = 2): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (b.length >= 63) return max + 1;
  let [prev2, prev, cur] = rows as [Int32Array, Int32Array, Int32Array];
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    let rowMin = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      let v = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) v = Math.min(v, prev2[j - 2]! + 1);
      cur[j] = v;
      if (v < rowMin) rowMin = v;
    }
    if (rowMin > max) return max + 1;
    [prev2, prev, cur] = [prev, cur, prev2];
  }
  return prev[b.length]!;
}

/** How many edits a word of this length may carry and still be read as a typo. */
export const typoBudget = (len: number) => (len >= 8 ? 2 : len >= 3 ? 1 : 0);
