"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { QuestionField } from "@/components/quiz/question-field";
import type { AnswerValue, PublicQuestion } from "@/components/quiz/types";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";

type Refresher = {
  module: string;
  title: string;
  lessons: { slug: string; title: string; href: string; whatChanged: string }[];
  questionChanges: string[];
  questions: PublicQuestion[];
  passMark: number;
};

/** One module's refresher on the home page: what changed (highlighted), the lessons to re-read, a short quiz. */
export function RefresherCard({ r }: { r: Refresher }) {
  const t = useTranslations("learn");
  const router = useRouter();
  const [answers, setAnswers] = useState<Record<number, AnswerValue>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <li className="rounded border border-copper bg-panel p-4" data-testid="refresher">
      <h3 className="text-lg">{r.title}</h3>
      <ul className="mt-2 flex flex-col gap-2">
        {r.lessons.map((l) => (
          <li key={l.slug}>
            <Link href={l.href} className="font-bold">
              {l.title}
            </Link>
            : <mark className="bg-copper-light px-1">{l.whatChanged}</mark>
          </li>
        ))}
        {r.questionChanges.map((c) => (
          <li key={c}>
            <mark className="bg-copper-light px-1">{c}</mark>
          </li>
        ))}
      </ul>
      <form
        className="mt-4 flex flex-col gap-4"
        onSubmit={async (e) => {
          e.preventDefault();
          setBusy(true);
          setProblem(null);
          const res = await postJson<{ passed: boolean; message: string }>("/api/refreshers", {
            module: r.module,
            answers: r.questions.map((q) => ({ position: q.position, answer: answers[q.position] ?? null })),
          });
          setBusy(false);
          if (!res.ok) return setProblem(res.error);
          if (!res.data.passed) return setProblem(res.data.message);
          setDone(res.data.message);
          router.refresh();
        }}
      >
        {r.questions.map((q) => (
          <QuestionField key={q.position} q={q} value={answers[q.position] ?? null} onChange={(v) => setAnswers((a) => ({ ...a, [q.position]: v }))} />
        ))}
        <FormError message={problem} />
        <FormNotice message={done} />
        <Button type="submit" disabled={busy}>
          {busy ? t("checking") : r.questions.length ? t("submitRefresher", { passMark: r.passMark }) : t("reread")}
        </Button>
      </form>
    </li>
  );
}
