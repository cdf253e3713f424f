/**
 * Messages that arrive as English text (zod schema messages shared by the browser and the server,
 * the API's `{ error, fieldErrors }`) shown in the reader's language: the English text is looked up in
 * messages/en/errors.json and replaced by the same key of the reader's catalog. A message with simple
 * `{name}` arguments matches with those parts taken over ("…opens at {when}."). Text that is not in
 * the catalog is shown as it came. Browser-safe (no server imports).
 */
import en from "@/messages/en/errors.json";

type Pattern = { key: string; re: RegExp; args: string[] };

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

function compile(): { exact: Map<string, string>; patterns: Pattern[] } {
  const exact = new Map<string, string>();
  const patterns: Pattern[] = [];
  for (const [key, text] of Object.entries(en as Record<string, string>)) {
    const args = [...text.matchAll(/\{(\w+)\}/g)].map((m) => m[1]!);
    if (args.length === 0) {
      exact.set(text.replace(/''/g, "'"), key);
      continue;
    }
    const source = text.replace(/''/g, "'").split(/\{\w+\}/).map(escape).join("(.+?)");
    patterns.push({ key, re: new RegExp(`^${source}$`), args });
  }
  return { exact, patterns };
}

let table: ReturnType<typeof compile> | null = null;

/** The catalog key (in the "errors" namespace) and arguments of an English message, if it is one of Riser's. */
export function errorKeyOf(text: string): { key: string; values: Record<string, string> } | null {
  table ??= compile();
  const hit = table.exact.get(text);
  if (hit) return { key: hit, values: {} };
  for (const p of table.patterns) {
    const m = p.re.exec(text);
    if (m) return { key: p.key, values: Object.fromEntries(p.args.map((a, i) => [a, m[i + 1]!])) };
  }
  return null;
}
