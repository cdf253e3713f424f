"use client";
/**
 * Shown when the root layout itself fails: it replaces the whole document, so it brings its own
 * <html> and <body> and plain styles (the app's stylesheet may be what failed). The layout's message
 * provider is gone with it: the text comes straight from the catalogs, in the browser's language.
 */
import { useSyncExternalStore } from "react";
import { palette } from "@/lib/theme/browser";
import { INTL_TAG, type Locale } from "@/lib/i18n/browser";
import { negotiateLocale } from "@/lib/i18n/browser";
import en from "@/messages/en/system.json";
import es from "@/messages/es/system.json";

const TEXT: Record<Locale, typeof en> = { en, es };

export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const locale = useSyncExternalStore<Locale>(
    () => () => {},
    () => negotiateLocale(navigator.languages.join(",")),
    () => "en",
  );
  const t = TEXT[locale];
  return (
    <html lang={INTL_TAG[locale]}>
      <body style={{ margin: 0, fontFamily: "system-ui, sans-serif", background: palette.paper, color: palette.ink, lineHeight: 1.5 }}>
        <main style={{ maxWidth: "40rem", margin: "3rem auto", padding: "0 1rem" }} role="alert">
          <h1 style={{ fontSize: "1.75rem" }}>{t.globalTitle}</h1>
          <p>{t.globalBody}</p>
          {error.digest ? (
            <p style={{ color: palette.muted, fontSize: "0.875rem" }}>
              {t.reference} <code>{error.digest}</code>
            </p>
          ) : null}
          <button type="button" onClick={reset} style={{ minHeight: "2.75rem", padding: "0.5rem 1rem", fontWeight: 700, border: `1px solid ${palette.ink}`, background: palette.panel, borderRadius: 4 }}>
            {t.tryAgain}
          </button>
        </main>
      </body>
    </html>
  );
}
