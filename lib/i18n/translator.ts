import "server-only";
// use-intl is next-intl's own core (no React): jobs, scripts and PDFs load this module outside a request
import { createTranslator } from "use-intl/core";
import { INTL_TAG, isLocale, type Locale } from "./config";
import { loadMessages } from "./messages";

/** Riser's language from a stored value ("en" when it is missing or unknown). */
export function storedLocale(language: string | null | undefined): Locale {
  return isLocale(language) ? language : "en";
}

type Values = Record<string, string | number | Date>;
export type CatalogT = (key: string, values?: Values) => string;

/**
 * A translator for one catalog namespace outside a request (mail in the recipient's language, a PDF
 * built for a stated language): jobs and after() callbacks have no next-intl request context.
 */
export function catalogTranslator(language: string | null | undefined, namespace: string): CatalogT {
  const locale = storedLocale(language);
  // the catalogs are read at run time, so keys are plain strings here (the catalog test checks them)
  const t = createTranslator({ locale: INTL_TAG[locale], messages: loadMessages(locale), namespace: namespace as never, timeZone: "UTC" });
  return t as unknown as CatalogT;
}
