import "server-only";
import { localizedCatalog, subjectTitle } from "@/lib/content";
import type { Locale } from "@/lib/i18n/browser";
import type { CertificateKind } from "./status";

/**
 * A certificate's module or path title in `locale`: the stored (English) title for English, else the
 * title of the same slug in that language's content (lib/content). The slug is the same in every
 * language, so the certificate, the PDF and the verification page name one module. Falls back to the
 * stored title when the module or path is no longer in the content.
 */
export function subjectTitleIn(kind: CertificateKind, slug: string, stored: string, locale: Locale): string {
  if (locale === "en") return stored;
  const catalog = localizedCatalog(locale);
  const known = kind === "module" ? catalog.modules.some((m) => m.slug === slug) : catalog.paths.some((p) => p.slug === slug);
  return known ? subjectTitle(kind, slug, locale) : stored;
}
