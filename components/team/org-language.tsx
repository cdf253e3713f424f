"use client";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useId, useState } from "react";
import { FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { LANGUAGE_NAMES, LOCALES, type Locale } from "@/lib/i18n/browser";
import { useFieldError } from "./use-field-error";

/** The organization's default language for new invitations (saved on the server, audited). */
export function OrgLanguage({ language, org }: { language: Locale; org: string | null }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const id = useId();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <section aria-labelledby={`${id}-h`} className="mt-10 flex max-w-prose flex-col gap-3 border-t border-line pt-6">
      <h2 id={`${id}-h`} className="text-xl">
        {t("orgLanguage.heading")}
      </h2>
      <p id={`${id}-hint`} className="text-muted">{t("orgLanguage.body")}</p>
      <FormError message={error} />
      <FormNotice message={done} />
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="font-bold">{t("orgLanguage.label")}</label>
        <select
          id={id}
          value={language}
          disabled={busy}
          aria-describedby={`${id}-hint`}
          onChange={async (e) => {
            setBusy(true);
            setError(null);
            setDone(null);
            const res = await postJson<{ message: string }>("/api/team/language", { language: e.target.value, org: org ?? undefined });
            setBusy(false);
            if (!res.ok) return setError(tr(res.fieldErrors?.language?.[0]) ?? tr(res.error) ?? res.error);
            setDone(res.data.message);
            router.refresh();
          }}
          className="min-h-11 max-w-xs rounded border border-ink/40 bg-panel px-2"
        >
          {LOCALES.map((l) => (
            <option key={l} value={l} lang={l}>{LANGUAGE_NAMES[l]}</option>
          ))}
        </select>
      </div>
    </section>
  );
}
