/** Reads an attempt's drawn items from the database and works out the right answers from content. */
import path from "node:path";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { questionVersion, quizAttemptItem } from "@/db/schema";
import { loadCatalogFrom } from "@/lib/content/load";
import type { Question } from "@/lib/content/schema";
import { parametricAnswer, type Answer } from "@/lib/quiz/engine";

export const catalog = loadCatalogFrom(path.resolve("content"));

export async function itemsOf(attemptId: string) {
  const rows = await db
    .select({ position: quizAttemptItem.position, params: quizAttemptItem.params, optionOrder: quizAttemptItem.optionOrder, body: questionVersion.body })
    .from(quizAttemptItem)
    .innerJoin(questionVersion, eq(questionVersion.id, quizAttemptItem.questionVersionId))
    .where(eq(quizAttemptItem.attemptId, attemptId))
    .orderBy(asc(quizAttemptItem.position));
  return rows.map((r) => ({ ...r, body: r.body as Question }));
}

export function rightAnswer(q: Question, params: Record<string, number> | null): Answer {
  switch (q.type) {
    case "single":
      return q.correct;
    case "multiple":
      return q.correct;
    case "truefalse":
      return q.correct;
    case "numeric":
      return q.answer;
    case "parametric":
      return parametricAnswer(q, params ?? {});
  }
}

export function wrongAnswer(q: Question): Answer {
  switch (q.type) {
    case "single":
      return q.options.find((o) => o.id !== q.correct)!.id;
    case "multiple":
      return [q.options.find((o) => !q.correct.includes(o.id))?.id ?? "a"];
    case "truefalse":
      return !q.correct;
    case "numeric":
      return q.answer + q.tolerance * 10 + 100;
    case "parametric":
      return 987654;
  }
}

export async function answersFor(attemptId: string, right: (i: number) => boolean = () => true) {
  const items = await itemsOf(attemptId);
  return items.map((it, i) => ({ position: it.position, answer: right(i) ? rightAnswer(it.body, it.params) : wrongAnswer(it.body) }));
}
