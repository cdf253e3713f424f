import { useTranslations } from "next-intl";
import { errorKeyOf } from "@/lib/i18n/browser";

/**
 * Shows an English message from a shared schema or the API in the reader's language (the "errors"
 * catalog; lib/i18n/error-text.ts). Unknown text and empty values pass through. Works in client
 * components and in non-async server components (next-intl's useTranslations).
 */
export function useErrorText(): <T extends string | null | undefined>(text: T) => T {
  const t = useTranslations("errors");
  return <T extends string | null | undefined>(text: T): T => {
    if (!text) return text;
    const found = errorKeyOf(text);
    return (found ? t(found.key as never, found.values as never) : text) as T;
  };
}
