import { getRequestConfig } from "next-intl/server";
import { FORMATS, INTL_TAG } from "@/lib/i18n/browser";
import { requestLocale } from "@/lib/i18n";
import { loadMessages } from "@/lib/i18n";

// next-intl's per-request configuration (no locale in the URL: the language comes from the account,
// the switch's cookie or the browser; lib/i18n/locale.ts).
export default getRequestConfig(async () => {
  const locale = await requestLocale();
  return {
    // the formatting locale is US English or US Spanish ("es-US": 1,234.5 and "2 dic 2026"), the
    // figures in lessons and cards are written that way in both languages
    locale: INTL_TAG[locale],
    messages: loadMessages(locale),
    timeZone: "UTC",
    formats: FORMATS,
    // an unknown key shows its name instead of breaking the page; tests/unit/i18n-catalogs.test.ts
    // and the lint catch missing keys before they ship
    onError: () => undefined,
    getMessageFallback: ({ namespace, key }) => [namespace, key].filter(Boolean).join("."),
  };
});
