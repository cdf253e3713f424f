"use client";
import Link from "next/link";
import { useTranslations } from "next-intl";
import { useEffect } from "react";
import { checkConnection, claimFor, flushQueue, offlineSupported, refreshStale, registerServiceWorker, signedInUserId } from "@/lib/offline/browser";
import { useOfflineState, useOnline } from "./use-offline";

/**
 * Runs on every page: registers the service worker, forgets what another
 * person kept on this phone, and whenever the connection is there sends queued marks and replaces
 * kept modules whose content changed. Shows a plain notice while offline.
 */
export function OfflineSync({ userId }: { userId: string | null }) {
  const t = useTranslations("offline");
  const online = useOnline();
  const { queue } = useOfflineState();
  useEffect(() => {
    if (!offlineSupported()) return;
    void (async () => {
      await registerServiceWorker();
      // Offline the session cannot be read (null): nothing is claimed or forgotten then.
      if (userId) await claimFor(userId);
      await checkConnection();
    })();
  }, [userId]);

  // Whenever the connection is there: send what waits and replace stale copies. While it is not,
  // look again every 20 s (a phone walking out of a basement fires no event).
  useEffect(() => {
    if (!offlineSupported()) return;
    if (!online) {
      const timer = setInterval(() => void checkConnection(), 20_000);
      return () => clearInterval(timer);
    }
    // Claimed first, for the person the server says is signed in now: marks and kept modules someone
    // else left on this phone are forgotten, never sent under this person's session.
    void (async () => {
      const id = userId ?? (await signedInUserId());
      if (!id) return;
      await claimFor(id);
      await flushQueue();
      await refreshStale();
    })();
  }, [online, userId]);

  if (online && queue.length === 0) return null;
  return (
    <div role="status" className="w-full rounded bg-paper px-3 py-2 text-sm text-ink" data-testid="connection-notice">
      {online ? null : (
        <p>
          {t.rich("noConnection", { strong: (c) => <strong>{c}</strong> })}
        </p>
      )}
      {queue.length ? (
        <p data-testid="queue-notice">
          {t(online ? "queueWaiting" : "queueWaitingOffline", { count: queue.length })} <Link href="/offline">{t("seeWaiting")}</Link>
        </p>
      ) : null}
    </div>
  );
}
