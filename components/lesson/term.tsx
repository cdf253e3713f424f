import { loadCatalog } from "@/lib/content";
import { TermPopover } from "./term-popover";

/** <Term id="k-factor">K-factor</Term> in MDX: links a word to its glossary definition. */
export function Term({ id, children }: { id: string; children?: React.ReactNode }) {
  const t = loadCatalog().glossary.find((g) => g.id === id);
  if (!t) throw new Error(`Glossary term "${id}" is not in content/glossary.yaml`);
  return <TermPopover term={t.term} definition={t.definition}>{children ?? t.term}</TermPopover>;
}
