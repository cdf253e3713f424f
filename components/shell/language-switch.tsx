"use client";
import { useRouter } from "next/navigation";
import { useLocale, useTranslations } from "next-intl";
import { useState, useTransition } from "react";
import { LANGUAGE_NAMES, LOCALES, localeOf, type Locale } from "@/lib/i18n/browser";
import { postJson } from "@/lib/fetcher";

/**
 * English / Español, always visible in the header. Before sign-in the choice lives in a cookie; for
 * a signed-in person it is stored in the account too (/api/account/language).
 */
export function LanguageSwitch() {
  const t = useTranslations("shell");
  const current = localeOf(useLocale());
  const router = useRouter();
  const [pending, start] = useTransition();
  const [failed, setFailed] = useState(false);
  async function choose(language: Locale) {
    if (language === current) return;
    setFailed(false);
    const r = await postJson("/api/account/language", { language });
    if (!r.ok) return setFailed(true);
    start(() => router.refresh());
  }
  return (
    <div role="group" aria-label={t("language")} className="flex items-center gap-1 text-sm" data-testid="language-switch">
      {LOCALES.map((l) => (
        <button
          key={l}
          type="button"
          lang={l}
          aria-pressed={l === current}
          disabled={pending}
          onClick={() => choose(l)}
          className="min-h-6 rounded border border-paper/40 px-2 py-0.5 text-paper aria-pressed:bg-paper aria-pressed:text-ink"
        >
          {LANGUAGE_NAMES[l]}
        </button>
      ))}
      {failed ? <span role="alert" className="text-paper">{t("languageFailed")}</span> : null}
    </div>
  );
}
