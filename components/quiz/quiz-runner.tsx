"use client";
import Link from "next/link";
import { useTranslations } from "next-intl";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { LiveMessage } from "@/components/ui/live-message";
import { useErrorText } from "@/components/ui/use-error-text";
import { postJson } from "@/lib/fetcher";
import { QuestionField } from "./question-field";
import { QuizResults } from "./quiz-results";
import type { AnswerValue, AttemptView, GradedAttempt, OpenAttempt } from "./types";

/** Time left until the deadline, ticking each second; calls onExpire once when it reaches zero. */
function useCountdown(deadline: string | null, onExpire: () => void) {
  const [left, setLeft] = useState<number | null>(null);
  const expire = useRef(onExpire);
  useEffect(() => {
    expire.current = onExpire;
  }, [onExpire]);
  useEffect(() => {
    if (!deadline) return;
    let fired = false;
    const tick = () => {
      const ms = Math.max(0, new Date(deadline).getTime() - Date.now());
      setLeft(ms);
      if (ms === 0 && !fired) {
        fired = true;
        expire.current();
      }
    };
    tick();
    const t = setInterval(tick, 1000);
    return () => clearInterval(t);
  }, [deadline]);
  return left;
}

const isAnswered = (v: AnswerValue | undefined) => v !== undefined && v !== null && !(Array.isArray(v) && v.length === 0);

export function QuizRunner({ module, canStart, blockedReason, startLabel }: { module: string; canStart: boolean; blockedReason: string | null; startLabel?: string }) {
  const t = useTranslations("quiz");
  const errorText = useErrorText();
  const router = useRouter();
  const [attempt, setAttempt] = useState<AttemptView | null>(null);
  const [answers, setAnswers] = useState<Record<string, AnswerValue>>({});
  const [current, setCurrent] = useState(0);
  const [problem, setProblem] = useState<string | null>(null);
  const [saveState, setSaveState] = useState<"idle" | "saving" | "saved" | "offline">("idle");
  const [busy, setBusy] = useState(false);
  const pending = useRef<Map<number, AnswerValue>>(new Map());
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const dialog = useRef<HTMLDialogElement>(null);
  const open = attempt?.status === "open" ? (attempt as OpenAttempt) : null;
  const submitRef = useRef<() => void>(() => {});
  const left = useCountdown(open?.deadlineAt ?? null, () => submitRef.current());

  const flush = useCallback(async () => {
    if (!open || pending.current.size === 0) return true;
    const batch = [...pending.current.entries()].map(([position, answer]) => ({ position, answer }));
    pending.current.clear();
    setSaveState("saving");
    const res = await postJson(`/api/quiz/attempts/${open.id}/answers`, { answers: batch }, "PUT");
    if (!res.ok) {
      if (res.status === 0) {
        for (const b of batch) if (!pending.current.has(b.position)) pending.current.set(b.position, b.answer);
        setSaveState("offline");
        return false;
      }
      setProblem(res.error);
      if (res.status === 409) router.refresh();
      return false;
    }
    setSaveState("saved");
    return true;
  }, [open, router]);

  function answer(position: number, value: AnswerValue) {
    setAnswers((a) => ({ ...a, [position]: value }));
    pending.current.set(position, value);
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(flush, 400);
  }

  async function start() {
    setBusy(true);
    setProblem(null);
    const res = await postJson<AttemptView>("/api/quiz/attempts", { module });
    setBusy(false);
    if (!res.ok) return setProblem(res.error);
    setAttempt(res.data);
    if (res.data.status === "open") setAnswers(res.data.answers);
    setCurrent(0);
  }

  const submit = useCallback(async () => {
    if (!open) return;
    dialog.current?.close();
    setBusy(true);
    await flush();
    const res = await postJson<GradedAttempt>(`/api/quiz/attempts/${open.id}/submit`, {});
    setBusy(false);
    if (!res.ok) {
      setProblem(res.error);
      if (res.status === 409) {
        const again = await fetch(`/api/quiz/attempts/${open.id}`).then((r) => r.json());
        setAttempt(again);
      }
      return;
    }
    setAttempt(res.data);
    router.refresh();
    window.scrollTo({ top: 0 });
  }, [open, flush, router]);

  useEffect(() => {
    submitRef.current = () => void submit();
  }, [submit]);

  useEffect(() => {
    const retry = () => saveState === "offline" && void flush();
    window.addEventListener("online", retry);
    return () => window.removeEventListener("online", retry);
  }, [saveState, flush]);

  if (attempt?.status === "graded") return <QuizResults result={attempt} onRetry={() => setAttempt(null)} />;

  if (!open) {
    return (
      <div className="flex flex-col gap-3">
        {problem ? <p role="alert" className="rounded border border-caution bg-caution-light p-3 text-caution">{errorText(problem)}</p> : null}
        {blockedReason ? <p className="rounded border border-line bg-panel p-3">{blockedReason}</p> : null}
        <div>
          <Button onClick={start} disabled={busy || !canStart}>{busy ? t("preparing") : (startLabel ?? t("start"))}</Button>
        </div>
      </div>
    );
  }

  const total = open.questions.length;
  const answered = open.questions.filter((q) => isAnswered(answers[q.position])).length;
  const mins = left !== null ? Math.floor(left / 60000) : null;
  const saveText = saveState === "saving" ? t("saving") : saveState === "saved" ? t("saved") : saveState === "offline" ? t("offline") : "";
  const secs = left !== null ? Math.floor((left % 60000) / 1000) : null;

  return (
    <div className="flex flex-col gap-4">
      <div data-sticky-bar="top" className="sticky top-0 z-10 flex flex-wrap items-center gap-4 rounded border border-line bg-panel p-3">
        <p data-testid="quiz-progress">{t("answeredOf", { answered, total })}</p>
        <div className="h-2 min-w-24 flex-1 rounded bg-line" role="progressbar" aria-label={t("questionsAnswered")} aria-valuemin={0} aria-valuemax={total} aria-valuenow={answered}>
          <div className="h-2 rounded bg-water" style={{ width: `${(answered / total) * 100}%` }} />
        </div>
        {left !== null ? (
          <p className={`font-mono ${left < 120000 ? "font-bold text-caution" : ""}`} role="timer" aria-label={t("timeLeftLabel")}>
            {t("timeLeft", { time: `${String(mins).padStart(2, "0")}:${String(secs).padStart(2, "0")}` })}
          </p>
        ) : null}
        <p className="text-sm text-muted">{saveText}</p>
        <LiveMessage message={saveState === "saving" ? "" : saveText} delay={1000} testId="quiz-save-announcement" />
      </div>
      {problem ? <p role="alert" className="rounded border border-caution bg-caution-light p-3 text-caution">{errorText(problem)}</p> : null}
      <ol className="flex flex-col gap-4">
        {open.questions.map((q, i) => (
          <li key={q.position} className={`${i === current ? "block" : "hidden"} rounded border border-line bg-panel p-4 md:block`} aria-label={t("questionOf", { n: i + 1, total })}>
            <p className="mb-2 font-mono text-sm text-muted">{t("questionOf", { n: i + 1, total })}</p>
            <QuestionField q={q} value={answers[q.position] ?? null} onChange={(v) => answer(q.position, v)} />
          </li>
        ))}
      </ol>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div className="flex gap-2 md:hidden">
          <Button variant="secondary" onClick={() => setCurrent((c) => Math.max(0, c - 1))} disabled={current === 0}>{t("previous")}</Button>
          <Button variant="secondary" onClick={() => setCurrent((c) => Math.min(total - 1, c + 1))} disabled={current === total - 1}>{t("next")}</Button>
        </div>
        <Button onClick={() => dialog.current?.showModal()} disabled={busy}>{t("submitAnswers")}</Button>
      </div>
      <dialog ref={dialog} aria-labelledby="confirm-title" className="max-w-md rounded border border-ink/30 p-5 backdrop:bg-ink/50">
        <h2 id="confirm-title" className="text-xl">{t("confirmTitle")}</h2>
        <p className="mt-2">
          {t("confirmAnswered", { answered, total })}
          {answered < total ? ` ${t("confirmUnanswered", { count: total - answered })}` : ""} {t("confirmFinal")}
        </p>
        <div className="mt-4 flex gap-3">
          <Button onClick={submit}>{t("submitNow")}</Button>
          <Button variant="secondary" onClick={() => dialog.current?.close()}>{t("keepWorking")}</Button>
        </div>
      </dialog>
      <p className="text-sm text-muted">{t.rich("backToModule", { link: (c) => <Link href={`/modules/${module}`}>{c}</Link> })}</p>
    </div>
  );
}
