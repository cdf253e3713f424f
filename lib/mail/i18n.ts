import "server-only";
import { catalogTranslator, INTL_TAG, storedLocale, type CatalogT } from "@/lib/i18n";

/**
 * Mail is written in the recipient's language (user.language, or invitation.language for an
 * invitation) from messages/<locale>/mail.json, outside any request.
 */
export const mailLocale = storedLocale;
export type MailT = CatalogT;

export function mailTranslator(language: string | null | undefined): MailT {
  return catalogTranslator(language, "mail");
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
