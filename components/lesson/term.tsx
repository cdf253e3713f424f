import { glossaryTerm, type ContentLocale } from "@/lib/content";
import { TermPopover } from "./term-popover";

/** <Term id="k-factor">K-factor</Term> in MDX: links a word to its glossary definition (English). */
export function Term({ id, children }: { id: string; children?: React.ReactNode }) {
  const t = glossaryTerm(id, "en");
  if (!t) throw new Error(`Glossary term "${id}" is not in content/glossary.yaml`);
  return <TermPopover term={t.term} definition={t.definition}>{children ?? t.term}</TermPopover>;
}

/**
 * The Term component for a lesson in `locale`: in Spanish the popover gives the Spanish term and
 * definition and also the English term, the word heard from inspectors and on drawings
 * (`englishLabel` formats it from the page's message catalog).
 */
export function termFor(locale: ContentLocale, englishLabel: (term: string) => string) {
  if (locale === "en") return Term;
  return function LocalizedTerm({ id, children }: { id: string; children?: React.ReactNode }) {
    const t = glossaryTerm(id, locale);
    if (!t) throw new Error(`Glossary term "${id}" is not in content/glossary.yaml`);
    return <TermPopover term={t.term} definition={t.definition} english={englishLabel(t.english)}>{children ?? t.term}</TermPopover>;
  };
}
