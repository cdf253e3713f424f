/**
 * Riser's languages. Browser-safe (no server imports): the language switch and client components
 * read these too. Server-side resolution is in lib/i18n/locale.ts.
 */
export const LOCALES = ["en", "es"] as const;
export type Locale = (typeof LOCALES)[number];
export const DEFAULT_LOCALE: Locale = "en";

/** The cookie that remembers a choice made before sign-in (and mirrors the account's choice after). */
export const LANG_COOKIE = "riser-lang";
/**
 * Set by proxy.ts from the signed-in person's stored language. The proxy deletes any value a client
 * sends under this name before it sets its own, so the header can be trusted by the pages below it.
 */
export const LOCALE_HEADER = "x-riser-locale";

/** Each language's name in itself, for the switch (never translated). */
export const LANGUAGE_NAMES: Record<Locale, string> = { en: "English", es: "Español" };

export function isLocale(v: unknown): v is Locale {
  return typeof v === "string" && (LOCALES as readonly string[]).includes(v);
}

/** BCP 47 tags for Intl formatting: US English and US Spanish (numbers keep the decimal point). */
export const INTL_TAG: Record<Locale, string> = { en: "en-US", es: "es-US" };

/** Riser's language from a formatting tag ("es-US" → "es"), as next-intl's getLocale()/useLocale() return. */
export function localeOf(tag: string): Locale {
  const primary = tag.slice(0, 2).toLowerCase();
  return isLocale(primary) ? primary : DEFAULT_LOCALE;
}
