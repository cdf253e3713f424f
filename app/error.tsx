"use client";
import { useTranslations } from "next-intl";

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  const t = useTranslations("system");
  return (
    <div className="max-w-prose" role="alert">
      <h1 className="text-3xl">{t("errorTitle")}</h1>
      <p className="mt-3">{t("errorBody")}</p>
      <button type="button" onClick={reset} className="mt-4 rounded border border-ink/40 bg-panel px-4 py-2 font-bold">
        {t("tryAgain")}
      </button>
    </div>
  );
}
