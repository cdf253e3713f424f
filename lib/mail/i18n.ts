import "server-only";
// use-intl is next-intl's own core (no React): jobs and scripts load this module outside the app
import { createTranslator } from "use-intl/core";
import { INTL_TAG, isLocale, type Locale } from "@/lib/i18n";
import { loadMessages } from "@/lib/i18n";

/**
 * Mail is written in the recipient's language (user.language, or invitation.language for an
 * invitation), outside any request: jobs and after() callbacks have no next-intl request context, so
 * the translator is built from the catalogs directly (messages/<locale>/mail.json).
 */
export function mailLocale(language: string | null | undefined): Locale {
  return isLocale(language) ? language : "en";
}

type Values = Record<string, string | number | Date>;
export type MailT = (key: string, values?: Values) => string;

export function mailTranslator(language: string | null | undefined): MailT {
  return catalogTranslator(language, "mail");
}

/** A translator for one catalog namespace outside a request (mail, PDFs built for a stated language). */
export function catalogTranslator(language: string | null | undefined, namespace: string): MailT {
  const locale = mailLocale(language);
  // the catalogs are read at run time, so keys are plain strings here (the catalog test checks them)
  const t = createTranslator({ locale: INTL_TAG[locale], messages: loadMessages(locale), namespace: namespace as never, timeZone: "UTC" });
  return t as unknown as MailT;
}

const DATE_STYLES = {
  /** "December 1, 2026" / "1 de diciembre de 2026" */
  long: { year: "numeric", month: "long", day: "numeric" },
  /** "Tue, December 1, 2026" / "mar, 1 de diciembre de 2026" */
  weekdayLong: { weekday: "short", month: "long", day: "numeric", year: "numeric" },
} satisfies Record<string, Intl.DateTimeFormatOptions>;

/** A date in a mail, in the recipient's language (UTC, as every date Riser prints). */
export function mailDate(language: string | null | undefined, d: Date, style: keyof typeof DATE_STYLES = "long"): string {
  return new Intl.DateTimeFormat(INTL_TAG[mailLocale(language)], { ...DATE_STYLES[style], timeZone: "UTC" }).format(d);
}

/** "Hello Ana," or "Hello," when there is no name. */
export function greeting(t: MailT, name: string | null | undefined): string {
  return name ? t("helloName", { name }) : t("hello");
}
