"use client";
/**
 * The loading and error states of route segments (the loading.tsx and error.tsx files use these).
 *
 * A loading.tsx streams its segment, and a redirect, 403 or 404 decided inside a streamed page can
 * then no longer change the HTTP status (Next.js sends a 200 with a client-side redirect instead).
 * So loading.tsx only sits where the access check happens above it, in a layout (admin). Elsewhere
 * a page checks access first and may wrap its slow part in <Suspense fallback={<LoadingState />}>.
 */
import Link from "next/link";
import { useEffect } from "react";
import { useTranslations } from "next-intl";

export function LoadingState({ what }: { what?: string }) {
  const t = useTranslations("shell");
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-3" data-testid="route-loading">
      <p className="text-muted">{what ? t("loadingWhat", { what }) : t("loading")}</p>
      <div aria-hidden="true" className="flex animate-pulse flex-col gap-3">
        <div className="h-8 w-2/3 rounded bg-line/60" />
        <div className="h-4 w-full rounded bg-line/40" />
        <div className="h-4 w-5/6 rounded bg-line/40" />
        <div className="h-32 w-full rounded border border-line bg-panel" />
      </div>
    </div>
  );
}

/**
 * A failed page: says so plainly, keeps the way back, and offers a retry. The error's message is
 * not shown (a production server error carries only a digest); the digest helps match server logs.
 */
export function ErrorState({ error, reset, area, home }: { error: Error & { digest?: string }; reset: () => void; area: string; home: { href: string; label: string } }) {
  const t = useTranslations("shell");
  useEffect(() => {
    console.error(`[${area}]`, error);
  }, [area, error]);
  return (
    <div className="max-w-prose" role="alert">
      <h1 className="text-3xl">{t("errorTitle")}</h1>
      <p className="mt-3">{t("errorBody", { area })}</p>
      {error.digest ? <p className="mt-2 text-sm text-muted">{t("errorReference")} <span className="font-mono">{error.digest}</span></p> : null}
      <div className="mt-4 flex flex-wrap gap-3">
        <button type="button" onClick={reset} className="min-h-11 rounded border border-ink/40 bg-panel px-4 py-2 font-bold">
          {t("tryAgain")}
        </button>
        <Link href={home.href} className="inline-flex min-h-11 items-center">
          {home.label}
        </Link>
      </div>
    </div>
  );
}
