/**
 * The `en:` stamp that ties a Spanish file to the English bytes it was translated from: the first 16
 * hex digits of the SHA-256 of the English twin. Written by `npm run content:stamp`; the content build
 * fails when it no longer matches (the English changed since the Spanish was written).
 */
import { createHash } from "node:crypto";

export const enHash = (english: string | Buffer) => createHash("sha256").update(english).digest("hex").slice(0, 16);

const FRONTMATTER = /^---\r?\n([\s\S]*?)\r?\n---(\r?\n|$)/;

/** The stamp written in a Spanish file (MDX frontmatter or a top-level YAML key), or null. */
export function readStamp(text: string, kind: "mdx" | "yaml"): string | null {
  const scope = kind === "mdx" ? (FRONTMATTER.exec(text)?.[1] ?? "") : text;
  const m = /^en:\s*["']?([0-9a-fA-F]+)["']?\s*$/m.exec(scope);
  return m ? m[1]!.toLowerCase() : null;
}

/**
 * The Spanish file with its `en:` field set to `hash`: an existing top-level `en:` line is replaced in
 * place; otherwise one line is added (last line of MDX frontmatter; first line of YAML, after leading
 * comments and a `---` marker). Nothing else in the file changes.
 */
export function writeStamp(text: string, hash: string, kind: "mdx" | "yaml"): string {
  const line = `en: ${hash}`;
  if (kind === "mdx") {
    const m = FRONTMATTER.exec(text);
    if (!m) {
      const nl = text.includes("\r\n") ? "\r\n" : "\n";
      return `---${nl}${line}${nl}---${nl}${text}`;
    }
    const nl = m[0].includes("\r\n") ? "\r\n" : "\n";
    const fm = m[1]!;
    const next = /^en:.*$/m.test(fm) ? fm.replace(/^en:.*$/m, line) : `${fm}${nl}${line}`;
    return `---${nl}${next}${nl}---${m[2]}${text.slice(m[0].length)}`;
  }
  if (/^en:.*$/m.test(text)) return text.replace(/^en:.*$/m, line);
  const nl = text.includes("\r\n") ? "\r\n" : "\n";
  const lines = text.split(/\r?\n/);
  let at = 0;
  while (at < lines.length && (/^\s*#/.test(lines[at]!) || /^---\s*$/.test(lines[at]!) || /^%/.test(lines[at]!))) at++;
  lines.splice(at, 0, line);
  return lines.join(nl);
}
