/**
 * Keeps a Spanish file and its English twin in step: the same numbers with the same units (as
 * multisets), the same component tags (callout types in order, figures, calculator embeds, glossary
 * references, edition passages), the same headings, table rows and SVG labels, the same list ids and
 * field set, and an `en:` stamp that matches the English bytes. Pure comparisons plus `twinProblems`,
 * which walks a content tree; used by the content build and tests/unit/content-twins.test.ts.
 */
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import matter from "gray-matter";
import YAML from "yaml";
import type { Catalog } from "./load";
import { twinPairs, type TwinPair } from "./load-es";
import { enHash, readStamp } from "./stamp";

/** Unit spellings read as one unit (English and the Spanish a translator might write). */
const UNIT: Record<string, string> = {
  psi: "psi", psig: "psi", gpm: "gpm", "gal/min": "gpm", ft: "ft", feet: "ft", foot: "ft", pies: "ft", pie: "ft",
  in: "in", "in.": "in", inch: "in", inches: "in", pulgada: "in", pulgadas: "in", gal: "gal", gallon: "gal", gallons: "gal", galón: "gal", galones: "gal",
  min: "min", minute: "min", minutes: "min", minuto: "min", minutos: "min", s: "s", second: "s", seconds: "s", segundo: "s", segundos: "s",
  h: "h", hour: "h", hours: "h", hora: "h", horas: "h", "°f": "°F", "°c": "°C", f: "°F", c: "°C", mm: "mm", m: "m", kpa: "kPa", bar: "bar",
  "%": "%", percent: "%", sq: "sq", "ft²": "ft2", ft2: "ft2", "m²": "m2", lb: "lb", lbs: "lb", libras: "lb", libra: "lb",
  day: "d", days: "d", día: "d", días: "d", year: "y", years: "y", año: "y", años: "y", month: "mo", months: "mo", mes: "mo", meses: "mo",
};

/** Words after which a number's "in" is the preposition, not inches ("70.6 in SI units", "12 in Juniper Flats"). */
const IN_AS_WORD = /^\s+(?:the|it|its|both|each|every|all|this|that|these|those|which|one|two|three|four|SI|US|(?!Type\b|Tipo\b)[A-Z][a-z]+)\b/;

/**
 * Every number of a text, with its unit where one follows ("2,500 gal", "1/2 in", "13"). A word glued
 * to a hyphen is not a unit ("13 C-factor"); "1-inch" keeps no unit, as the translators' checker reads it.
 */
export function numbersOf(text: string): string[] {
  const out: string[] = [];
  const re = /(\d+(?:,\d{3})*(?:\.\d+)?(?:\/\d+)?)(?:\s*(°\s?[FC]|%|[A-Za-zíáéóú²./]+)(?![-A-Za-zíáéóú²]))?/g;
  for (const m of text.matchAll(re)) {
    const raw = (m[2] ?? "").toLowerCase().replace(/\s/g, "");
    const u = raw === "in." ? raw : raw.replace(/[.,;:]$/, "");
    let unit = UNIT[u] ?? UNIT[u.replace(/\.$/, "")] ?? "";
    if (unit === "in" && u === "in" && IN_AS_WORD.test(text.slice(m.index! + m[0].length))) unit = "";
    out.push(unit ? `${m[1]} ${unit}` : m[1]!);
  }
  return out;
}

/** What one list has more of than the other, as "x" or "x ×n". */
export function multisetDiff(a: string[], b: string[]): { missing: string[]; extra: string[] } {
  const count = new Map<string, number>();
  for (const x of a) count.set(x, (count.get(x) ?? 0) + 1);
  for (const x of b) count.set(x, (count.get(x) ?? 0) - 1);
  const missing = [...count].filter(([, n]) => n > 0).map(([k, n]) => `${k}${n > 1 ? ` ×${n}` : ""}`);
  const extra = [...count].filter(([, n]) => n < 0).map(([k, n]) => `${k}${n < -1 ? ` ×${-n}` : ""}`);
  return { missing, extra };
}

function diffInto(a: string[], b: string[], label: string, problems: string[]) {
  const { missing, extra } = multisetDiff(a, b);
  if (missing.length) problems.push(`${label}: in English, not in Spanish: ${missing.join(", ")}`);
  if (extra.length) problems.push(`${label}: in Spanish, not in English: ${extra.join(", ")}`);
}

/** Numbers (alone) and numbers with units (where English has a unit) compared as multisets. */
export function compareNumbers(en: string, es: string, label: string): string[] {
  const problems: string[] = [];
  const a = numbersOf(en);
  const b = numbersOf(es);
  diffInto(a.map((x) => x.split(" ")[0]!), b.map((x) => x.split(" ")[0]!), `${label} numbers`, problems);
  diffInto(a.filter((x) => x.includes(" ")), b.filter((x) => x.includes(" ")), `${label} numbers with units`, problems);
  return problems;
}

const TAG = /<(Term|Callout|Calculator|Editions|Edition|Figure|WorkedExample|svg)\b([^>]*)>/g;
/** The component tags of an MDX body with their translated attributes blanked: the rest must be identical. */
export function componentTags(body: string): string[] {
  return [...body.matchAll(TAG)].map((m) => {
    const attrs = m[2]!.replace(/\s(title|caption|aria-label)="[^"]*"/g, ` $1="…"`);
    return `<${m[1]}${attrs.replace(/\s+/g, " ").trimEnd()}>`;
  });
}
const attrOf = (tag: string, name: string) => new RegExp(`\\s${name}="([^"]*)"`).exec(tag)?.[1] ?? "";
export const calloutTypes = (body: string) => componentTags(body).filter((t) => t.startsWith("<Callout")).map((t) => attrOf(t, "type"));
export const termIds = (body: string) => componentTags(body).filter((t) => t.startsWith("<Term")).map((t) => attrOf(t, "id"));
export const calculators = (body: string) => componentTags(body).filter((t) => t.startsWith("<Calculator"));
export const editionTagsOf = (body: string) => componentTags(body).filter((t) => /^<Editions?\b/.test(t));
export const figureCount = (body: string) => componentTags(body).filter((t) => t.startsWith("<Figure")).length;
export const headingLevels = (body: string) => [...body.matchAll(/^(#{1,6}) /gm)].map((m) => m[1]!.length);
const tableRows = (body: string) => body.split("\n").filter((l) => l.trim().startsWith("|")).length;
const svgLabels = (body: string) => (body.match(/<text\b/g) ?? []).length;

/** A body's text for the number comparison: tags dropped except their translated attributes. */
function mdxText(body: string): string {
  return body.replace(/<(?!\/)[a-zA-Z][^>]*>/g, (t) => ` ${[...t.matchAll(/(title|caption|aria-label)="([^"]*)"/g)].map((m) => m[2]).join(" ")} `);
}

/** Problems between two MDX bodies (lesson or card), without the file name. */
export function compareBodies(en: string, es: string): string[] {
  const p: string[] = [];
  const ct = [calloutTypes(en), calloutTypes(es)];
  if (ct[0]!.join(",") !== ct[1]!.join(",")) p.push(`callout types: English ${ct[0]!.join(", ") || "(none)"} vs Spanish ${ct[1]!.join(", ") || "(none)"}`);
  const fc = [figureCount(en), figureCount(es)];
  if (fc[0] !== fc[1]) p.push(`figures: English ${fc[0]} vs Spanish ${fc[1]}`);
  diffInto(calculators(en), calculators(es), "calculator embeds", p);
  diffInto(termIds(en), termIds(es), "glossary references (Term ids)", p);
  diffInto(editionTagsOf(en), editionTagsOf(es), "edition tags", p);
  const te = componentTags(en);
  const ts = componentTags(es);
  if (te.join("\n") !== ts.join("\n")) {
    const before = p.length;
    diffInto(te, ts, "component tags", p);
    if (p.length === before) p.push("component tags: same tags but in a different order");
  }
  p.push(...compareNumbers(mdxText(en), mdxText(es), "body"));
  const hl = [headingLevels(en).join(","), headingLevels(es).join(",")];
  if (hl[0] !== hl[1]) p.push(`headings: English levels ${hl[0] || "(none)"} vs Spanish ${hl[1] || "(none)"}`);
  if (tableRows(en) !== tableRows(es)) p.push(`table rows: English ${tableRows(en)} vs Spanish ${tableRows(es)}`);
  if (svgLabels(en) !== svgLabels(es)) p.push(`svg <text> labels: English ${svgLabels(en)} vs Spanish ${svgLabels(es)}`);
  return p;
}

type Data = Record<string, unknown>;
const flatText = (v: unknown): string => [v].flat().filter((x) => x !== undefined && x !== null).map(String).join("\n");

/** Problems between an English and a Spanish MDX file (frontmatter text and body). */
export function compareMdx(en: { data: Data; content: string }, es: { data: Data; content: string }): string[] {
  const p: string[] = [];
  for (const k of ["title", "summary", "objectives", "sources", "edition", "changed"]) {
    const e = en.data[k];
    const s = es.data[k];
    if (e === undefined && s === undefined) continue;
    if (e === undefined || s === undefined) {
      p.push(`frontmatter: "${k}" ${e === undefined ? "is not in English" : "is missing"}`);
      continue;
    }
    if (Array.isArray(e) && (!Array.isArray(s) || s.length !== e.length)) p.push(`frontmatter: "${k}" must have ${e.length} items`);
    p.push(...compareNumbers(flatText(e), flatText(s), `frontmatter ${k}`));
  }
  p.push(...compareBodies(en.content, es.content));
  return p;
}

const LISTS = { questions: "id", skills: "id", terms: "id", paths: "slug" } as const;
const FIELDS: Record<keyof typeof LISTS, string[]> = {
  questions: ["prompt", "explanation", "options", "changed"],
  skills: ["title", "observe", "evidence"],
  terms: ["term", "definition"],
  paths: ["title", "summary"],
};

/** Problems between an English and a Spanish YAML file (module, quiz, skills, glossary, paths). */
export function compareYaml(en: Data, es: Data): string[] {
  const p: string[] = [];
  // module.yaml also has a `paths:` list (of slugs): it is the file with `lessons:`
  const list = Array.isArray(en.lessons) ? undefined : (Object.keys(LISTS) as (keyof typeof LISTS)[]).find((k) => Array.isArray(en[k]));
  if (!list) {
    for (const k of ["title", "summary"]) {
      if (typeof es[k] !== "string") p.push(`"${k}" missing`);
      else p.push(...compareNumbers(String(en[k] ?? ""), es[k] as string, k));
    }
    return p;
  }
  const key = LISTS[list];
  const ea = en[list] as Data[];
  const sa = Array.isArray(es[list]) ? (es[list] as Data[]) : [];
  const ids = (xs: Data[]) => xs.map((x) => String(x[key])).join(", ");
  if (ids(ea) !== ids(sa)) p.push(`${list}: ids/order differ. English: ${ids(ea)}; Spanish: ${ids(sa)}`);
  for (const s of sa) {
    const e = ea.find((x) => x[key] === s[key]);
    if (!e) continue;
    const id = String(s[key]);
    for (const k of FIELDS[list]) {
      if ((e[k] === undefined) !== (s[k] === undefined)) p.push(`${id}: "${k}" ${e[k] === undefined ? "is not in English" : "is missing"}`);
    }
    const eo = (e.options as Data[] | undefined) ?? [];
    const so = (s.options as Data[] | undefined) ?? [];
    if (eo.map((o) => o.id).join(",") !== so.map((o) => o.id).join(",")) p.push(`${id}: option ids/order differ`);
    if (Array.isArray(e.observe) && (!Array.isArray(s.observe) || s.observe.length !== e.observe.length)) p.push(`${id}: observe must have ${e.observe.length} items`);
    // A glossary entry's English term is shown beside the Spanish one: only the definitions compare.
    const text = (x: Data) => (list === "terms" ? flatText(x.definition) : [x.prompt, x.explanation, x.title, x.summary, x.evidence, x.changed, ...((x.observe as unknown[]) ?? []), ...((x.options as Data[]) ?? []).map((o) => o.text)].filter(Boolean).join("\n"));
    p.push(...compareNumbers(text(e), text(s), id));
  }
  return p;
}

/** The stamp problem of one pair, or null (given both files' bytes). */
export function stampProblem(pair: TwinPair, enBytes: Buffer | string, esText: string, shown: (rel: string) => string): string | null {
  const stamp = readStamp(esText, pair.kind);
  const fix = `npm run content:stamp -- ${shown(pair.es)}`;
  if (!stamp) return `${shown(pair.es)}: field "en": missing: after checking the translation, run ${fix}`;
  if (stamp !== enHash(enBytes)) return `${shown(pair.es)}: field "en": the English changed since the Spanish was written: update ${shown(pair.es)} to match ${shown(pair.en)}, then run ${fix}`;
  return null;
}

/**
 * Every twin problem under `root` for the English `catalog`: stale or missing stamps and the
 * comparisons above, each naming the Spanish file. A missing Spanish file is reported by the loader.
 */
export function twinProblems(root: string, catalog: Pick<Catalog, "modules" | "cards">): string[] {
  const shown = (rel: string) => path.join(path.basename(root), rel);
  const problems: string[] = [];
  for (const pair of twinPairs(catalog)) {
    const esFile = path.join(root, pair.es);
    if (!existsSync(esFile)) continue;
    const enBytes = readFileSync(path.join(root, pair.en));
    const esText = readFileSync(esFile, "utf8");
    const stale = stampProblem(pair, enBytes, esText, shown);
    if (stale) problems.push(stale);
    let found: string[];
    try {
      if (pair.kind === "mdx") {
        const e = matter(enBytes.toString("utf8"));
        const s = matter(esText);
        found = compareMdx({ data: e.data, content: e.content }, { data: s.data, content: s.content });
      } else {
        found = compareYaml((YAML.parse(enBytes.toString("utf8")) ?? {}) as Data, (YAML.parse(esText) ?? {}) as Data);
      }
    } catch (err) {
      found = [`does not parse: ${(err as Error).message.split("\n")[0]}`];
    }
    for (const f of found) problems.push(`${shown(pair.es)}: ${f}`);
  }
  return problems;
}
