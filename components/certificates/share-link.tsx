"use client";
import { useTranslations } from "next-intl";
import { useId, useState } from "react";

/** The public verification link of one certificate, with a copy button. */
export function ShareLink({ url, serial }: { url: string; serial: string }) {
  const t = useTranslations("certificates");
  const id = useId();
  const [copied, setCopied] = useState<"yes" | "no" | null>(null);

  async function copy() {
    try {
      await navigator.clipboard.writeText(url);
      setCopied("yes");
    } catch {
      setCopied("no");
    }
  }

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-bold">
        {t("shareFor", { serial })}
      </label>
      <div className="flex flex-wrap gap-2">
        <input
          id={id}
          readOnly
          value={url}
          onFocus={(e) => e.currentTarget.select()}
          className="min-h-11 min-w-0 flex-1 rounded border border-ink/40 bg-paper px-3 py-2 font-mono text-sm"
          data-testid="share-link"
        />
        <button type="button" onClick={copy} className="min-h-11 rounded border border-ink/40 bg-panel px-4 font-bold hover:bg-paper">
          {t("copy")}
        </button>
      </div>
      <p className="min-h-5 text-sm text-muted" aria-live="polite">
        {copied === "yes" ? t("copied") : copied === "no" ? t("copyBlocked") : ""}
      </p>
    </div>
  );
}
