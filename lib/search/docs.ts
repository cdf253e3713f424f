/** Turns content into plain-text search documents (built once, at build time). */
import type { Catalog } from "@/lib/content";
import type { SearchLang } from "./text";

export type SearchDoc = {
  id: string;
  kind: "lesson" | "card" | "term";
  /** the document's language; each language has its own index (absent = English) */
  lang?: SearchLang;
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

/** The context words of cards and glossary entries, per language. */
const CONTEXT: Record<SearchLang, { card: string; term: string }> = {
  en: { card: "Code-reference card", term: "Glossary" },
  es: { card: "Ficha de referencia del código", term: "Glosario" },
};

/**
 * Search documents of a catalog already in `lang` (lib/content localizeCatalog). A Spanish glossary
 * entry also holds its English term (the word heard on site), so either word finds it.
 */
export function buildSearchDocs(catalog: Catalog, lang: SearchLang = "en"): SearchDoc[] {
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
    docs.push({ id: `card:${c.slug}`, kind: "card", title: c.meta.title, href: `/reference/${c.slug}`, context: CONTEXT[lang].card, headings: headingsOf(c.body), text: `${c.meta.summary} ${mdxToText(c.body)}` });
  }
  for (const t of catalog.glossary) {
    docs.push({ id: `term:${t.id}`, kind: "term", title: t.term, href: `/glossary#${t.id}`, context: CONTEXT[lang].term, text: t.english && t.english !== t.term ? `${t.definition} (${t.english})` : t.definition });
  }
  return lang === "en" ? docs : docs.map((d) => ({ ...d, id: `${lang}:${d.id}`, lang }));
}
