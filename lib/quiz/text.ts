/**
 * The text of a question as the viewer reads it. An attempt keeps the English question version it
 * drew (lib/quiz grades on that structure only); for a Spanish viewer its prompt, options and
 * explanation are laid over by question id, so the same attempt reads in either language and grades
 * the same. The Spanish is used only while the drawn version is the current one (same revision and
 * option ids): an older snapshot keeps its own English words rather than a translation of newer text.
 */
import { loadCatalog, questionText, type Catalog, type ContentLocale, type Question } from "@/lib/content";

export function displayQuestion<Q extends Question>(snapshot: Q, locale: ContentLocale, catalog: Catalog = loadCatalog()): Q {
  if (locale === "en") return snapshot;
  const current = catalog.modules.flatMap((m) => m.questions).find((q) => q.id === snapshot.id);
  if (!current || current.type !== snapshot.type || (current.revision ?? 1) !== (snapshot.revision ?? 1)) return snapshot;
  const ids = (q: Question) => ("options" in q ? q.options.map((o) => o.id).sort().join(",") : "");
  if (ids(current) !== ids(snapshot)) return snapshot;
  return questionText(snapshot, locale, catalog);
}
