"use client";
import { useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { getJson, postJson } from "@/lib/fetcher";

type Progress = { completed: string[]; readingTimes?: { lesson: string; readingSeconds: number | null }[] };

/**
 * Shows whether this lesson is done for the signed-in person and marks it complete. The server
 * decides whether enough reading time has passed since it first served this lesson to the person.
 */
export function MarkComplete({ module, lesson, total, minutes }: { module: string; lesson: string; total: number; minutes: number }) {
  const key = `/api/progress?module=${module}`;
  const { data, error, isLoading, mutate } = useSWR<Progress>(key, getJson);
  const [saving, setSaving] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const done = data?.completed.includes(lesson) ?? false;
  const count = data?.completed.length ?? 0;
  const seconds = data?.readingTimes?.find((t) => t.lesson === lesson)?.readingSeconds ?? null;

  async function mark() {
    setSaving(true);
    setProblem(null);
    const res = await postJson<{ completed: string[] }>("/api/progress", { module, lesson });
    setSaving(false);
    if (!res.ok) return setProblem(res.error);
    await mutate();
  }

  return (
    <div className="rounded border border-line bg-panel p-4" data-testid="lesson-progress">
      {isLoading ? <p className="text-muted">Loading your progress…</p> : null}
      {error ? <p role="alert" className="text-caution">Your progress could not load: {error.message}</p> : null}
      {data ? (
        <div className="flex flex-wrap items-center gap-4">
          {done ? (
            <p className="font-bold text-pass" role="status">
              ✓ Lesson complete{seconds !== null ? <span className="font-normal text-muted"> · reading time {Math.round(seconds / 60)} min</span> : null}
            </p>
          ) : (
            <Button onClick={mark} disabled={saving}>{saving ? "Saving…" : "Mark this lesson complete"}</Button>
          )}
          <p className="text-sm text-muted" aria-live="polite" data-testid="module-progress">
            {count} of {total} lessons in this module done · counts after {Math.ceil(minutes / 2)} min of reading
          </p>
        </div>
      ) : null}
      {problem ? <p role="alert" className="mt-2 text-caution">{problem}</p> : null}
    </div>
  );
}
