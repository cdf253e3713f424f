/**
 * Finds the figures a learner might act on in lesson and card bodies (numbers with a unit: pressures,
 * flows, densities, lengths, areas, temperatures, percentages, durations, volumes) and classifies how
 * each is sourced, by the words in its own paragraph or table row and in the file's `sources` list.
 * Used by `npm run content:report` and by the content lint (tests/unit/content-lint.test.ts).
 * A heuristic reader, not a proof: it checks that every figure carries a source, a worked-example or
 * arithmetic context, "common practice", or an honest "from memory — verify".
 */

export type Sourcing = "provision" | "named document" | "common practice" | "worked example" | "from memory" | "unsourced";

export interface Figure {
  text: string;
  sourcing: Sourcing;
  context: string;
}

const UNIT =
  String.raw`(?:psi|gpm(?:\/ft²| per (?:square foot|ft²|sq ft))?|ft²|sq ft|square feet|ft|feet|foot|in(?:ch(?:es)?)?|°F|°C|%|percent|minutes?|min|hours?|h|gallons?|gal|seconds?|L\/min|bar)`;
export const FIGURE_RE = new RegExp(String.raw`(?<![\w.])(\d{1,3}(?:,\d{3})+|\d+(?:\.\d+)?|\.\d+)(?:\s*(?:-|–|to)\s*(?:\d+(?:\.\d+)?))?\s?${UNIT}(?![\w])`, "g");

/** a provision: a standard or code with a part, section, table or edition */
const PROVISION_RE =
  /\b(NFPA\s?\d+[A-Z]?|IRC|IPC|IFC|ASTM\s?[A-Z]\d+|ASME\s?B[\d.]+M?|UL\s?\d+|NSF|P\d{4}|R\d{3}(?:\.\d+)*|Table\s+[A-Z]?\d|§)/;
/** a named public document: a titled article, interpretation, summary, data sheet or research report */
const NAMED_DOC_RE =
  /(interpretation|e-Tech Alert|Sprinkler Age|fact sheet|public page|NFPA's|data sheet|maker's|manufacturer's|makers' published|published (?:curve|table|data)|Research Foundation|Plumbing Engineer|design note|physics of water|water-property|Hazen-Williams|flow test formula|NFPA 291)/i;
const COMMON_RE = /common practice|rule of thumb/i;
const EXAMPLE_RE = /\b(invented|example|illustration|for teaching|teaching figure|scenario)\b/i;
const MEMORY_RE = /from memory/i;
/** arithmetic lines: a figure computed in front of the reader from figures sourced elsewhere */
const ARITH_RE = /[=×÷]|\bequals\b|\btimes\b|\bdivided by\b/;

/** strip frontmatter, inline SVG and JSX attributes so that only reader-visible prose is scanned */
export function proseBlocks(body: string): { text: string; inExample: boolean }[] {
  const cleaned = body
    .replace(/<svg[\s\S]*?<\/svg>/g, " ")
    .replace(/<Calculator[^>]*\/>/g, " ")
    .replace(/\{\{[^}]*\}\}/g, " ");
  const out: { text: string; inExample: boolean }[] = [];  let inExample = false;
  let lead = "";
  for (const raw of cleaned.split(/\n\s*\n/)) {
    const starts = /<WorkedExample/.test(raw);
    const ends = /<\/WorkedExample>/.test(raw);
    const block = { text: raw, inExample: inExample || starts };
    // table rows are judged one by one, each with the table's header row
    if (/^\s*\|/m.test(raw)) {
      const rows = raw.split("\n").filter((r) => r.trim().startsWith("|"));      // each row is read with the paragraph that introduces the table, where its source is named
      for (const r of rows) out.push({ text: `${r}\n${lead}`, inExample: block.inExample });
      const rest = raw.split("\n").filter((r) => !r.trim().startsWith("|")).join("\n");
      if (rest.trim()) out.push({ text: rest, inExample: block.inExample });    } else {
      out.push(block);
      lead = raw;
    }
    if (starts) inExample = true;
    if (ends) inExample = false;
  }
  return out;
}

function classify(paragraph: string, figure: string, sources: string[], inExample: boolean): Sourcing {
  const num = figure.match(/[\d.,]+/)?.[0] ?? figure;
  const fromSources = sources.filter((s) => s.includes(num));
  if (MEMORY_RE.test(paragraph)) return "from memory";
  if (PROVISION_RE.test(paragraph) || fromSources.some((s) => PROVISION_RE.test(s) && !MEMORY_RE.test(s))) return "provision";
  if (NAMED_DOC_RE.test(paragraph) || fromSources.some((s) => NAMED_DOC_RE.test(s) && !MEMORY_RE.test(s))) return "named document";
  if (COMMON_RE.test(paragraph) || fromSources.some((s) => COMMON_RE.test(s))) return "common practice";
  if (inExample || EXAMPLE_RE.test(paragraph) || ARITH_RE.test(paragraph)) return "worked example";
  if (fromSources.some((s) => MEMORY_RE.test(s))) return "from memory";
  return "unsourced";
}

export function figuresIn(body: string, sources: string[]): Figure[] {
  const out: Figure[] = [];
  for (const block of proseBlocks(body)) {
    for (const m of block.text.matchAll(FIGURE_RE)) {
      out.push({ text: m[0], sourcing: classify(block.text, m[0], sources, block.inExample), context: block.text.trim().slice(0, 160) });
    }
  }
  return out;
}

/** "from memory" markers in any text: a body, a sources list, a quiz explanation */
export const countMarkers = (text: string): number => (text.match(/from memory/gi) ?? []).length;

/** the numbers a question keys: in its correct option(s), numeric answer or fixed inputs */
export function keyedNumbers(q: {
  type: string;
  options?: { id: string; text: string }[];
  correct?: unknown;
  answer?: number;
  prompt: string;
  fixed?: Record<string, number>;
}): string[] {
  const nums = (t: string) => [...t.matchAll(/(?<![\w.])\d+(?:\.\d+)?(?![\w])/g)].map((m) => m[0]);
  if (q.type === "single") return nums(q.options?.find((o) => o.id === q.correct)?.text ?? "");
  if (q.type === "multiple") {
    const keys = Array.isArray(q.correct) ? (q.correct as string[]) : [];
    return (q.options ?? []).filter((o) => keys.includes(o.id)).flatMap((o) => nums(o.text));
  }
  // a numeric answer worked from figures the prompt gives is computed, not recalled
  if (q.type === "numeric" && typeof q.answer === "number") return nums(q.prompt).length >= 2 ? [] : [String(q.answer)];
  // parametric inputs are shown in the prompt; the learner computes the answer, so nothing is keyed from memory
  return [];
}
