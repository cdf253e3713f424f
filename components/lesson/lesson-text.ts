import "server-only";
import { getFormatter, getLocale, getTranslations } from "next-intl/server";
import { EDITIONS } from "@/lib/content/browser";
import { localeOf } from "@/lib/i18n/browser";
import { ENGLISH_EDITION_TEXT, type EditionText } from "./edition";

/** The edition labels of lesson and card pages in the request's language (English keeps lib/content's wording). */
export async function editionText(): Promise<EditionText> {
  if (localeOf(await getLocale()) === "en") return ENGLISH_EDITION_TEXT;
  const [t, format] = await Promise.all([getTranslations("lesson"), getFormatter()]);
  const years = (editions: readonly number[]) => {
    if (editions.length === 0) return t("noEdition");
    const idx = editions.map((e) => (EDITIONS as readonly number[]).indexOf(e));
    const contiguous = idx.every((v, i) => i === 0 || v === idx[i - 1]! + 1);
    if (contiguous && editions.length > 2) return t("editionRange", { first: String(editions[0]), last: String(editions.at(-1)) });
    return format.list(editions.map(String), { type: "conjunction" });
  };
  return {
    label: (editions) => `NFPA 13D ${years(editions)}`,
    notStated: t("editionsNotStated"),
    other: (label) => t("otherEdition", { label }),
    yours: (label) => t("yourEdition", { label }),
  };
}
