"use client";
import Link from "next/link";
import { useSyncExternalStore } from "react";
import { Button } from "@/components/ui/button";
import { OFFLINE_PAGE, removeModule } from "@/lib/offline/browser";
import { formatBytes, formatWhen } from "./format";
import { useOfflineState, useOnline } from "./use-offline";

/** Areas that never work offline, in the words the notice uses. */
const NEEDS_CONNECTION = [
  "Quizzes — every answer is graded on the server",
  "Certificates and their verification",
  "The team board, assignments and invitations",
  "Practical sign-offs and photo uploads",
  "Search, account settings and billing",
];

const noSubscription = () => () => undefined;

/**
 * The /offline page, also served by the service worker in place of any page opened with no
 * connection that is not kept on the phone (then it says so first).
 */
export function OfflineOverview() {
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
          <h1 className="text-2xl">This page needs a connection</h1>
          <p className="mt-2">
            <code className="font-mono text-sm">{missed}</code> is not kept on this phone{online ? " and could not be reached" : ", and there is no connection right now"}.
            It will open as soon as the phone is back online.
          </p>
        </section>
      ) : (
        <h1 className="text-3xl">Kept on this phone</h1>
      )}
      <section aria-labelledby="kept-h">
        <h2 id="kept-h" className="text-xl">Modules you can open with no signal</h2>
        {!ready ? <p className="text-muted">Reading this phone&apos;s storage…</p> : null}
        {ready && !supported ? <p>This browser cannot keep pages for use without a connection.</p> : null}
        {ready && supported && saved.length === 0 ? (
          <p className="mt-2 text-muted">Nothing yet. Open a module while you have a signal and choose “Keep on this phone”.</p>
        ) : null}
        {saved.length ? (
          <>
            <ul className="mt-3 flex flex-col gap-2" data-testid="kept-list">
              {saved.map((s) => (
                <li key={s.module} className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel p-3">
                  <div className="flex-1">
                    <Link href={`/modules/${s.module}`} className="font-bold">{s.title}</Link>
                    <p className="text-sm text-muted">{s.pages} pages · {formatBytes(s.bytes)} · saved {formatWhen(s.savedAt)}</p>
                  </div>
                  <Button variant="secondary" onClick={() => void removeModule(s.module)} aria-label={`Remove ${s.title} from this phone`}>Remove</Button>
                </li>
              ))}
            </ul>
            <p className="mt-2 text-sm text-muted">Together {formatBytes(total)}. Each kept module includes the glossary and the field calculators (<Link href="/tools">calculators</Link>).</p>
          </>
        ) : null}
      </section>
      <section aria-labelledby="queue-h">
        <h2 id="queue-h" className="text-xl">Waiting to be sent</h2>
        {queue.length === 0 ? (
          <p className="mt-2 text-muted">No lesson marks are waiting.</p>
        ) : (
          <ul className="mt-2 list-disc pl-6" data-testid="queue-list">
            {queue.map((q) => (
              <li key={`${q.module}/${q.lesson}`}>
                {q.module} / {q.lesson} — marked {formatWhen(q.markedAt)}, {Math.round(q.readingSeconds / 60)} min read on this phone
                {q.note ? <span className="block text-sm text-muted">Server: {q.note}</span> : null}
              </li>
            ))}
          </ul>
        )}
        <p className="mt-2 text-sm text-muted">Marks are sent as soon as there is a connection. A lesson counts once Riser&apos;s own reading-time rule is met; the time your phone reports is kept beside it, marked as the phone&apos;s.</p>
      </section>
      <section aria-labelledby="online-h">
        <h2 id="online-h" className="text-xl">Always needs a connection</h2>
        <ul className="mt-2 list-disc pl-6">
          {NEEDS_CONNECTION.map((n) => <li key={n}>{n}</li>)}
        </ul>
      </section>
    </div>
  );
}
