"use client";
import Link from "next/link";
import { useTranslations } from "next-intl";
import { useSyncExternalStore } from "react";
import { Button } from "@/components/ui/button";
import { OFFLINE_PAGE, removeModule } from "@/lib/offline/browser";
import { formatBytes, formatWhen } from "./format";
import { useOfflineState, useOnline } from "./use-offline";

/** Areas that never work offline (catalog keys under offline.needs). */
const NEEDS_CONNECTION = ["quizzes", "certificates", "team", "signOffs", "search"] as const;

const noSubscription = () => () => undefined;

/**
 * The /offline page, also served by the service worker in place of any page opened with no
 * connection that is not kept on the phone (then it says so first).
 */
export function OfflineOverview() {
  const t = useTranslations("offline");
  const { ready, supported, saved, queue } = useOfflineState();
  const online = useOnline();
  // The worker serves this page in place of one that needs a connection: the address bar still shows that one.
  const path = useSyncExternalStore(noSubscription, () => window.location.pathname, () => OFFLINE_PAGE);
  const missed = path === OFFLINE_PAGE ? null : path;
  const total = saved.reduce((n, s) => n + s.bytes, 0);

  return (
    <div className="flex max-w-prose flex-col gap-6">
      {missed ? (
        <section role="alert" className="rounded border border-caution bg-caution-light p-4" data-testid="needs-connection">
          <h1 className="text-2xl">{t("needsConnection")}</h1>
          <p className="mt-2">
            {t.rich(online ? "notKeptUnreachable" : "notKeptOffline", { path: missed, code: (c) => <code className="font-mono text-sm">{c}</code> })}
          </p>
        </section>
      ) : (
        <h1 className="text-3xl">{t("title")}</h1>
      )}
      <section aria-labelledby="kept-h">
        <h2 id="kept-h" className="text-xl">{t("keptHeading")}</h2>
        {!ready ? <p className="text-muted">{t("reading")}</p> : null}
        {ready && !supported ? <p>{t("unsupported")}</p> : null}
        {ready && supported && saved.length === 0 ? (
          <p className="mt-2 text-muted">{t("nothingYet")}</p>
        ) : null}
        {saved.length ? (
          <>
            <ul className="mt-3 flex flex-col gap-2" data-testid="kept-list">
              {saved.map((s) => (
                <li key={s.module} className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel p-3">
                  <div className="flex-1">
                    <Link href={`/modules/${s.module}`} className="font-bold">{s.title}</Link>
                    <p className="text-sm text-muted">{t("keptLine", { pages: s.pages, size: formatBytes(s.bytes), when: formatWhen(s.savedAt) })}</p>
                  </div>
                  <Button variant="secondary" onClick={() => void removeModule(s.module)} aria-label={t("removeLabel", { title: s.title })}>{t("remove")}</Button>
                </li>
              ))}
            </ul>
            <p className="mt-2 text-sm text-muted">{t.rich("together", { size: formatBytes(total), link: (c) => <Link href="/tools">{c}</Link> })}</p>
          </>
        ) : null}
      </section>
      <section aria-labelledby="queue-h">
        <h2 id="queue-h" className="text-xl">{t("waiting")}</h2>
        {queue.length === 0 ? (
          <p className="mt-2 text-muted">{t("noneWaiting")}</p>
        ) : (
          <ul className="mt-2 list-disc pl-6" data-testid="queue-list">
            {queue.map((q) => (
              <li key={`${q.module}/${q.lesson}`}>
                {q.title ?? `${q.module} / ${q.lesson}`} — {t("markedLine", { when: formatWhen(q.markedAt), minutes: Math.round(q.readingSeconds / 60) })}
                {q.note ? <span className="block text-sm text-muted">{t("server", { note: q.note })}</span> : null}
              </li>
            ))}
          </ul>
        )}
        <p className="mt-2 text-sm text-muted">{t("marksNote")}</p>
      </section>
      <section aria-labelledby="online-h">
        <h2 id="online-h" className="text-xl">{t("alwaysOnline")}</h2>
        <ul className="mt-2 list-disc pl-6">
          {NEEDS_CONNECTION.map((n) => <li key={n}>{t(`needs.${n}`)}</li>)}
        </ul>
      </section>
    </div>
  );
}
