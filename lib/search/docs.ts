/** Turns content into plain-text search documents (built once, at build time). */
import type { Catalog } from "@/lib/content";

export type SearchDoc = {
  id: string;
  kind: "lesson" | "card" | "term";
  title: string;
  href: string;
  context: string;
  /** the card's or lesson's own headings (## …), weighted above the text */
  headings?: string;
  text: string;
};

/** "## Heading" lines of an MDX body, as one line of text. */
export function headingsOf(body: string): string {
  return [...body.matchAll(/^#{2,4}\s+(.+)$/gm)].map((m) => m[1]!.replace(/[*_`]/g, "").trim()).join(" · ");
}

/** Strips MDX/markdown to readable text: SVG and JSX tags removed, link text kept. */
export function mdxToText(body: string): string {
  return body
    .replace(/<svg[\s\S]*?<\/svg>/g, " ")
    .replace(/\{\/\*[\s\S]*?\*\/\}/g, " ")
    .replace(/<Calculator[^>]*\/>/g, " ")
    .replace(/<\/?[A-Za-z][^>]*>/g, " ")
    .replace(/!\[[^\]]*\]\([^)]*\)/g, " ")
    .replace(/\[([^\]]+)\]\([^)]*\)/g, "$1")
    .replace(/^#{1,6}\s+/gm, "")
    .replace(/[*_`>|]/g, " ")
    .replace(/\s+/g, " ")
    .trim();
}

export function buildSearchDocs(catalog: Catalog): SearchDoc[] {
  const docs: SearchDoc[] = [];
  for (const m of catalog.modules) {
    for (const l of m.lessons) {
      docs.push({
        id: `lesson:${m.slug}/${l.slug}`,
        kind: "lesson",
        title: l.meta.title,
        href: `/modules/${m.slug}/${l.slug}`,
        context: m.meta.title,
        headings: headingsOf(l.body),
        text: `${l.meta.summary} ${mdxToText(l.body)}`,
      });
    }
  }
  for (const c of catalog.cards) {
    docs.push({ id: `card:${c.slug}`, kind: "card", title: c.meta.title, href: `/reference/${c.slug}`, context: "Code-reference card", headings: headingsOf(c.body), text: `${c.meta.summary} ${mdxToText(c.body)}` });
  }
  for (const t of catalog.glossary) {
    docs.push({ id: `term:${t.id}`, kind: "term", title: t.term, href: `/glossary#${t.id}`, context: "Glossary", text: t.definition });
  }
  return docs;
}
