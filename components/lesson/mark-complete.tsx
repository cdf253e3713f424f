"use client";
import { useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { getJson, postJson } from "@/lib/fetcher";

/** Shows whether this lesson is done for the signed-in person and marks it complete. */
export function MarkComplete({ module, lesson, total }: { module: string; lesson: string; total: number }) {
  const key = `/api/progress?module=${module}`;
  const { data, error, isLoading, mutate } = useSWR<{ completed: string[] }>(key, getJson);
  const [saving, setSaving] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const done = data?.completed.includes(lesson) ?? false;
  const count = data?.completed.length ?? 0;

  async function mark() {
    setSaving(true);
    setProblem(null);
    const res = await postJson<{ completed: string[] }>("/api/progress", { module, lesson });
    setSaving(false);
    if (!res.ok) return setProblem(res.error);
    await mutate({ completed: res.data.completed }, { revalidate: false });
  }

  return (
    <div className="rounded border border-line bg-panel p-4" data-testid="lesson-progress">
      {isLoading ? <p className="text-muted">Loading your progress…</p> : null}
      {error ? <p role="alert" className="text-caution">Your progress could not load: {error.message}</p> : null}
      {data ? (
        <div className="flex flex-wrap items-center gap-4">
          {done ? (
            <p className="font-bold text-pass" role="status">✓ Lesson complete</p>
          ) : (
            <Button onClick={mark} disabled={saving}>{saving ? "Saving…" : "Mark this lesson complete"}</Button>
          )}
          <p className="text-sm text-muted" aria-live="polite" data-testid="module-progress">
            {count} of {total} lessons in this module done
          </p>
        </div>
      ) : null}
      {problem ? <p role="alert" className="mt-2 text-caution">{problem}</p> : null}
    </div>
  );
}
