"use client";
import { useTranslations } from "next-intl";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import { LANGUAGE_NAMES, LOCALES, type Locale } from "@/lib/i18n/browser";
import { postJson } from "@/lib/fetcher";

/**
 * The account's language (English / Español): pages, e-mails and certificates follow it. Saved with
 * POST /api/account/language, which stores it in the account and sets the switch's cookie.
 */
export function LanguageForm({ current }: { current: Locale }) {
  const t = useTranslations("account");
  const router = useRouter();
  const [choice, setChoice] = useState<Locale>(current);
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [pending, start] = useTransition();

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setProblem(null);
    setSaved(false);
    const res = await postJson("/api/account/language", { language: choice });
    if (!res.ok) return setProblem(res.error);
    setSaved(true);
    start(() => router.refresh());
  }

  return (
    <form onSubmit={save} className="flex max-w-md flex-col gap-3" data-testid="language-form">
      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">{t("languageLegend")}</legend>
        {LOCALES.map((l) => (
          <label key={l} className="flex min-h-11 items-center gap-2">
            <input type="radio" name="language" value={l} checked={choice === l} onChange={() => setChoice(l)} className="size-5" />
            <span lang={l}>{LANGUAGE_NAMES[l]}</span>
            {l === current ? <span className="text-sm text-muted">{t("languageCurrent")}</span> : null}
          </label>
        ))}
      </fieldset>
      <FormError message={problem} />
      {saved && !pending ? <FormNotice message={t("languageSaved")} /> : null}
      <Button type="submit" variant="secondary" disabled={pending || choice === current} className="self-start">
        {t("languageSave")}
      </Button>
    </form>
  );
}
