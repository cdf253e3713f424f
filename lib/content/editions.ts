/**
 * NFPA 13D editions in content: which passages (<Edition only="2013 2016"> or from/to) and which
 * quiz questions (`editions: [2019, 2022]`; absent = every edition) apply to an edition. Pure: the
 * lesson pages, the quiz draw, the content checks and the unit tests share it.
 */
import { z } from "zod";

export const EDITIONS = [2013, 2016, 2019, 2022, 2025] as const;
export type EditionYear = (typeof EDITIONS)[number];

export const editionYear = z.coerce
  .number({ message: "Choose an NFPA 13D edition" })
  .int()
  .refine((n): n is EditionYear => (EDITIONS as readonly number[]).includes(n), { message: `Choose an NFPA 13D edition: ${EDITIONS.join(", ")}` });

export const isEdition = (n: unknown): n is EditionYear => typeof n === "number" && (EDITIONS as readonly number[]).includes(n);

/** The props an <Edition> passage takes: `only` (space- or comma-separated years) or `from`/`to` (inclusive). */
export type EditionSpec = { only?: string | number; from?: string | number; to?: string | number };

/**
 * The editions a passage applies to, or a problem in words. `only` cannot be combined with
 * from/to; every year named must be a known edition; from must not be after to.
 */
export function editionsOf(spec: EditionSpec): { editions: EditionYear[] } | { problem: string } {
  const has = (v: unknown) => v !== undefined && v !== null && String(v).trim() !== "";
  if (has(spec.only) && (has(spec.from) || has(spec.to))) return { problem: "use either only or from/to, not both" };
  if (has(spec.only)) {
    const years = String(spec.only).split(/[\s,]+/).filter(Boolean).map(Number);
    const bad = years.filter((y) => !isEdition(y));
    if (bad.length || !years.length) return { problem: `unknown edition in only="${spec.only}" (editions: ${EDITIONS.join(", ")})` };
    return { editions: EDITIONS.filter((e) => years.includes(e)) };
  }
  if (!has(spec.from) && !has(spec.to)) return { problem: "name the editions with only, from or to" };
  const from = has(spec.from) ? Number(spec.from) : EDITIONS[0];
  const to = has(spec.to) ? Number(spec.to) : EDITIONS[EDITIONS.length - 1]!;
  if (!isEdition(from) || !isEdition(to)) return { problem: `unknown edition in from/to (editions: ${EDITIONS.join(", ")})` };
  if (from > to) return { problem: `from="${from}" is after to="${to}"` };
  return { editions: EDITIONS.filter((e) => e >= from && e <= to) };
}

/** "2013 and 2016", "2019 to 2025", "2022": how a passage's editions are named to the reader. */
export function editionLabel(editions: readonly EditionYear[]): string {
  if (editions.length === 0) return "no edition";
  if (editions.length === 1) return `${editions[0]}`;
  const idx = editions.map((e) => EDITIONS.indexOf(e));
  const contiguous = idx.every((v, i) => i === 0 || v === idx[i - 1]! + 1);
  if (contiguous && editions.length > 2) return `${editions[0]} to ${editions[editions.length - 1]}`;
  return `${editions.slice(0, -1).join(", ")} and ${editions[editions.length - 1]}`;
}

/**
 * Whether a question belongs in a quiz for `edition`: a question without `editions` applies to
 * every edition; with no edition chosen (the organization set none) only such questions are drawn,
 * so nobody is graded on one edition's rule as if it were all editions'.
 */
export function questionApplies(q: { editions?: readonly number[] }, edition: number | null): boolean {
  if (!q.editions || q.editions.length === 0) return true;
  return edition !== null && q.editions.includes(edition);
}

/** Every <Edition …> opening tag in an MDX body with its attributes (for the content checks). */
export function editionTags(body: string): { spec: EditionSpec; raw: string }[] {
  const out: { spec: EditionSpec; raw: string }[] = [];
  for (const m of body.matchAll(/<Edition\b([^>]*)>/g)) {
    const spec: EditionSpec = {};
    for (const a of m[1]!.matchAll(/\b(only|from|to)\s*=\s*(?:"([^"]*)"|\{(\d+)\})/g)) spec[a[1] as keyof EditionSpec] = a[2] ?? a[3];
    out.push({ spec, raw: m[0] });
  }
  return out;
}
