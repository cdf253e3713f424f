"use client";
import Link from "next/link";
import { useTranslations } from "next-intl";
import { useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";
import { useErrorText } from "@/components/ui/use-error-text";
import type { GradedAttempt } from "./types";

export function QuizResults({ result, onRetry }: { result: GradedAttempt; onRetry: () => void }) {
  const t = useTranslations("quiz");
  const errorText = useErrorText();
  const heading = useRef<HTMLHeadingElement>(null);
  // The submit button is gone once the grade shows: the focus moves to the result it announces.
  useEffect(() => heading.current?.focus(), []);
  const review = [...new Map(result.feedback.filter((f) => !f.correct).map((f) => [f.lesson.href, f.lesson])).values()];
  return (
    <section aria-labelledby="result-h" className="flex flex-col gap-4" data-testid="quiz-result">
      <div className={`rounded border-l-4 p-4 ${result.passed ? "border-pass bg-pass-light" : "border-caution bg-caution-light"}`}>
        <h2 id="result-h" ref={heading} tabIndex={-1} className="text-2xl">{t(result.passed ? "passedScore" : "notPassedScore", { score: result.score })}</h2>
        <p className="mt-1">
          {t("correctOf", { correct: result.correctCount, total: result.total, passMark: result.passMark })}
          {result.lateGraded ? ` ${t("lateGraded")}` : ""}
        </p>
      </div>
      {result.completionPending ? (
        <p role="status" className="rounded border border-line bg-panel p-3 text-sm">{errorText(result.completionPending)}</p>
      ) : null}
      {!result.answersRevealed && result.correctCount < result.total ? (
        <p className="text-sm text-muted" data-testid="answers-hidden">
          {t("answersHidden")}
        </p>
      ) : null}
      {review.length ? (
        <div className="rounded border border-line bg-panel p-4">
          <h3 className="text-lg">{t("whatToReview")}</h3>
          <ul className="mt-2 list-disc pl-6">{review.map((l) => <li key={l.href}><Link href={l.href}>{l.title}</Link></li>)}</ul>
        </div>
      ) : null}
      <ol className="flex flex-col gap-3">
        {result.feedback.map((f, i) => (
          <li key={f.position} className={`rounded border p-4 ${f.correct ? "border-pass/50 bg-panel" : "border-caution/50 bg-panel"}`}>
            <p className="font-mono text-sm text-muted">{t("question", { n: i + 1 })} · <span className={f.correct ? "text-pass" : "text-caution"}>{f.correct ? t("correct") : t("wrong")}</span></p>
            <p className="mt-1 font-bold">{f.prompt}</p>
            <p className="mt-2 text-sm">{t("yourAnswer", { answer: f.yourAnswer })}</p>
            {!f.correct && f.correctAnswer !== null ? <p className="text-sm">{t("correctAnswer", { answer: f.correctAnswer })}</p> : null}
            <p className="mt-2">{f.explanation}</p>
            <p className="mt-1 text-sm">{t.rich("fromLesson", { title: f.lesson.title, link: (c) => <Link href={f.lesson.href}>{c}</Link> })}</p>
          </li>
        ))}
      </ol>
      {!result.passed ? <div><Button variant="secondary" onClick={onRetry}>{t("backToQuiz")}</Button></div> : null}
    </section>
  );
}
