"use client";
import { useTranslations } from "next-intl";
import { useCallback, useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { useErrorText } from "@/components/ui/use-error-text";
import { useOfflineState, useOnline } from "@/components/offline/use-offline";
import { getJson, postJson } from "@/lib/fetcher";
import { flushQueue, offlineSupported, queueMark } from "@/lib/offline/browser";

type Time = { lesson: string; readingSeconds: number | null; deviceReadingSeconds?: number | null };
type Progress = { completed: string[]; readingTimes?: Time[] };

/**
 * The module's progress from the server, read again on `mutate()`, when the tab comes back into
 * view and (below) when the connection returns. A few lines instead of a data-fetching library,
 * which would be the largest script of its own on every lesson page.
 */
function useProgress(key: string) {
  const [data, setData] = useState<Progress | undefined>(undefined);
  const [error, setError] = useState<(Error & { status?: number }) | undefined>(undefined);
  const [isLoading, setLoading] = useState(true);
  const [round, setRound] = useState(0);
  const reload = useCallback(() => setRound((n) => n + 1), []);
  useEffect(() => {
    let live = true;
    getJson<Progress>(key).then(
      (next) => {
        if (!live) return;
        setData(next);
        setError(undefined);
        setLoading(false);
      },
      (err: Error & { status?: number }) => {
        if (!live) return;
        setError(err);
        setLoading(false);
      },
    );
    return () => {
      live = false;
    };
  }, [key, round]);
  useEffect(() => {
    const onVisible = () => document.visibilityState === "visible" && reload();
    document.addEventListener("visibilitychange", onVisible);
    return () => document.removeEventListener("visibilitychange", onVisible);
  }, [reload]);
  return { data, error, isLoading, mutate: reload };
}

/** Seconds this page has been on screen (visible tab) since it loaded: the phone's own measure. */
function useVisibleSeconds(): () => number {
  const total = useRef(0);
  const since = useRef<number | null>(null);
  useEffect(() => {
    const tick = () => {
      if (document.visibilityState === "visible") since.current ??= performance.now();
      else if (since.current !== null) {
        total.current += performance.now() - since.current;
        since.current = null;
      }
    };
    tick();
    document.addEventListener("visibilitychange", tick);
    return () => document.removeEventListener("visibilitychange", tick);
  }, []);
  return () => (total.current + (since.current !== null ? performance.now() - since.current : 0)) / 1000;
}

/**
 * Shows whether this lesson is done for the signed-in person and marks it complete. The server
 * decides whether enough reading time has passed since it first served this lesson to the person.
 * With no connection the mark waits on the phone (lib/offline) with the phone's reading time and
 * is sent when the connection returns.
 *
 * `progressLines[n]` is the module's progress line for n lessons done, worded by the server: building
 * the first message format in the browser costs the phone one long task (its Intl locale data), so
 * the line shown on every lesson load is not formatted here.
 */
export function MarkComplete({ module, lesson, title, total, minutes, progressLines }: { module: string; lesson: string; title: string; total: number; minutes: number; progressLines: string[] }) {
  const t = useTranslations("lesson");
  const errorText = useErrorText();
  const key = `/api/progress?module=${module}`;
  const { data, error, isLoading, mutate } = useProgress(key);
  const online = useOnline();
  const { queue } = useOfflineState();
  const visibleSeconds = useVisibleSeconds();
  const [saving, setSaving] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const queued = queue.find((q) => q.module === module && q.lesson === lesson);
  const done = data?.completed.includes(lesson) ?? false;
  const count = data?.completed.length ?? 0;
  const time = data?.readingTimes?.find((t) => t.lesson === lesson);
  const seconds = time?.readingSeconds ?? null;
  const deviceSeconds = time?.deviceReadingSeconds ?? null;

  // A queued mark that was just sent: show the server's answer (the first read is already under way).
  const firstRun = useRef(true);
  useEffect(() => {
    if (firstRun.current) {
      firstRun.current = false;
      return;
    }
    if (online && !queued) mutate();
  }, [online, queued, mutate]);

  async function mark() {
    setSaving(true);
    setProblem(null);
    if (!online && offlineSupported()) {
      await queueMark(module, lesson, visibleSeconds(), title);
      setSaving(false);
      return;
    }
    const res = await postJson<{ completed: string[] }>("/api/progress", { module, lesson });
    if (!res.ok && res.status === 0 && offlineSupported()) {
      await queueMark(module, lesson, visibleSeconds(), title);
      await flushQueue();
    } else if (!res.ok) setProblem(res.error);
    setSaving(false);
    mutate();
  }

  // Progress that could not load for want of a connection (no HTTP status) still lets a mark be queued.
  const noNetwork = !!error && !(error as { status?: number }).status;
  const showButton = !done && !queued && (data || noNetwork);
  return (
    <div className="rounded border border-line bg-panel p-4" data-testid="lesson-progress">
      {isLoading ? <p className="text-muted">{t("loadingProgress")}</p> : null}
      {error && !noNetwork ? <p role="alert" className="text-caution">{t("progressFailed", { message: errorText(error.message) })}</p> : null}
      <div className="flex flex-wrap items-center gap-4">
        {done ? (
          <p className="font-bold text-pass" role="status">
            {t("lessonComplete")}
            {seconds !== null ? <span className="font-normal text-muted">{` · ${t("readingTime", { minutes: Math.round(seconds / 60) })}`}</span> : null}
            {deviceSeconds !== null ? <span className="font-normal text-muted" data-testid="device-time">{` · ${t("readOffline", { minutes: Math.round(deviceSeconds / 60) })}`}</span> : null}
          </p>
        ) : null}
        {queued ? (
          <p className="font-bold" role="status" data-testid="mark-waiting">
            {online ? t("markedWaiting") : t("markedWaitingOffline")}
            {queued.note ? <span className="block font-normal text-muted">{errorText(queued.note)}</span> : null}
          </p>
        ) : null}
        {showButton ? <Button onClick={mark} disabled={saving}>{saving ? t("saving") : t("markComplete")}</Button> : null}
        {data ? (
          <p className="text-sm text-muted" aria-live="polite" data-testid="module-progress">
            {progressLines[count] ?? t("moduleProgress", { count, total, minutes: Math.ceil(minutes / 2) })}
          </p>
        ) : noNetwork || !online ? (
          <p className="text-sm text-muted">{t("noConnection")}</p>
        ) : null}
      </div>
      {problem ? <p role="alert" className="mt-2 text-caution">{errorText(problem)}</p> : null}
    </div>
  );
}
