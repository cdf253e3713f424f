"use client";
/**
 * Shown when the root layout itself fails: it replaces the whole document, so it brings its own
 * <html> and <body> and plain styles (the app's stylesheet may be what failed).
 */
import { palette } from "@/lib/theme/browser";

export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ margin: 0, fontFamily: "system-ui, sans-serif", background: palette.paper, color: palette.ink, lineHeight: 1.5 }}>
        <main style={{ maxWidth: "40rem", margin: "3rem auto", padding: "0 1rem" }} role="alert">
          <h1 style={{ fontSize: "1.75rem" }}>Riser could not load</h1>
          <p>Something went wrong on our side. Nothing you saved is lost. Try again in a moment.</p>
          {error.digest ? (
            <p style={{ color: palette.muted, fontSize: "0.875rem" }}>
              Reference for support: <code>{error.digest}</code>
            </p>
          ) : null}
          <button type="button" onClick={reset} style={{ minHeight: "2.75rem", padding: "0.5rem 1rem", fontWeight: 700, border: `1px solid ${palette.ink}`, background: palette.panel, borderRadius: 4 }}>
            Try again
          </button>
        </main>
      </body>
    </html>
  );
}
