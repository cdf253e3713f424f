"use client";
import Link from "next/link";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { KeepError, keepModule, removeModule } from "@/lib/offline/browser";
import { formatBytes, formatWhen } from "./format";
import { useOfflineState, useOnline } from "./use-offline";

/**
 * "Keep on this phone" on a module page: stores the module's lessons, the cards they link to, the
 * glossary and the calculators so they open with no signal (lib/offline).
 */
export function KeepModule({ module }: { module: string }) {
  const t = useTranslations("offline");
  const { ready, supported, saved } = useOfflineState();
  const online = useOnline();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const kept = saved.find((s) => s.module === module);
  if (!ready) return null;
  if (!supported) return <p className="text-sm text-muted">{t("unsupported")}</p>;

  async function keep() {
    setBusy(true);
    setProblem(null);
    try {
      await keepModule(module);
    } catch (err) {
      if (err instanceof KeepError) {
        const { message, url, status } = err.detail;
        setProblem(err.code === "planFailed" && message ? message : t(`errors.${err.code}`, { url: url ?? "", status: status ?? 0 }));
      } else setProblem(t("errors.other", { message: err instanceof Error ? err.message : String(err) }));
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="keep-h" className="max-w-prose rounded border border-line bg-panel p-4" data-testid="keep-module">
      <h2 id="keep-h" className="text-xl">{t("keepHeading")}</h2>
      {kept ? (
        <p className="mt-2" role="status" data-testid="kept-status">
          {t("keptStatus", { pages: kept.pages, size: formatBytes(kept.bytes), when: formatWhen(kept.savedAt) })}
        </p>
      ) : (
        <p className="mt-2 text-muted">{t("keepLead")}</p>
      )}
      <div className="mt-3 flex flex-wrap gap-3">
        {kept ? (
          <Button variant="secondary" onClick={() => void removeModule(module)} disabled={busy}>{t("removeFromPhone")}</Button>
        ) : (
          <Button onClick={keep} disabled={busy || !online}>{busy ? t("saving") : t("keep")}</Button>
        )}
        <Link href="/offline" className="inline-flex min-h-11 items-center">{t("whatKept")}</Link>
      </div>
      {!online && !kept ? <p className="mt-2 text-sm text-muted">{t("savingNeedsConnection")}</p> : null}
      {problem ? <p role="alert" className="mt-2 text-caution">{problem}</p> : null}
    </section>
  );
}
