import "server-only";
import { readFileSync } from "node:fs";
import path from "node:path";
import YAML from "yaml";
import type { Locale } from "@/lib/i18n/config";
import type { CertificateKind } from "./status";

const cache = new Map<string, string | null>();

function readTitle(kind: CertificateKind, slug: string, locale: Locale): string | null {
  const root = process.env.RISER_CONTENT_DIR ?? path.join(process.cwd(), "content");
  try {
    if (kind === "module") {
      const doc = YAML.parse(readFileSync(path.join(root, locale, "modules", slug, "module.yaml"), "utf8")) as { title?: unknown };
      return typeof doc?.title === "string" ? doc.title : null;
    }
    const doc = YAML.parse(readFileSync(path.join(root, locale, "paths.yaml"), "utf8")) as { paths?: { slug?: unknown; title?: unknown }[] };
    const hit = doc?.paths?.find((p) => p.slug === slug);
    return typeof hit?.title === "string" ? hit.title : null;
  } catch {
    return null;
  }
}

/**
 * A certificate's module or path title in `locale`: the stored (English) title for English, else the
 * title of the same slug in content/<locale>/ (the translated module.yaml or paths.yaml). The slug is
 * the same in every language, so the certificate, the PDF and the verification page name one module.
 * Falls back to the stored title when the translation is missing.
 */
export function subjectTitleIn(kind: CertificateKind, slug: string, stored: string, locale: Locale): string {
  if (locale === "en" || !/^[a-z0-9-]+$/.test(slug)) return stored;
  const key = `${locale}:${kind}:${slug}`;
  if (!cache.has(key)) cache.set(key, readTitle(kind, slug, locale));
  return cache.get(key) ?? stored;
}
