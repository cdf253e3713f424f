// A quiz in either language grades the same. Reference: the English question bank (content/modules/*/quiz.yaml),
// whose keys decide right and wrong; the Spanish text (content/es/…/quiz.yaml) only changes what is shown.
// A learner's answers are option ids, true/false or numbers, as the quiz API takes them.
import path from "node:path";
import { describe, expect, it } from "vitest";
import { displayQuestion, loadCatalogFrom, type Question } from "@/lib/content";
import { drawAttempt, gradeItem, parametricAnswer, publicItem, score, type Answer, type DrawnItem } from "@/lib/quiz/engine";

const catalog = loadCatalogFrom(path.resolve("content"));

/** The key of the English bank for right answers; a different option / value for wrong ones. */
function answerFor(item: DrawnItem, right: boolean): Answer {
  const q = item.question;
  switch (q.type) {
    case "single":
      return right ? q.correct : q.options.find((o) => o.id !== q.correct)!.id;
    case "multiple":
      return right ? q.correct : q.options.filter((o) => !q.correct.includes(o.id)).map((o) => o.id).slice(0, 1);
    case "truefalse":
      return right ? q.correct : !q.correct;
    case "numeric":
      return right ? q.answer : q.answer + 10 * (q.tolerance + 1);
    case "parametric": {
      const v = parametricAnswer(q, item.params ?? {});
      return right ? v : v * 2 + 1;
    }
  }
}

describe("grading is the same in English and Spanish", () => {
  for (const mod of catalog.modules) {
    it(`${mod.slug}: the same answers give the same marks and score, while the Spanish text is shown`, () => {
      const items = drawAttempt(mod.questions, Math.min(mod.meta.quiz.questionsPerAttempt, mod.questions.length), 20261202);
      const answers = items.map((it, i) => answerFor(it, i % 3 !== 0));
      const marks = (locale: "en" | "es") => items.map((it, i) => gradeItem({ question: displayQuestion(it.question, locale, catalog), params: it.params }, answers[i]!));
      const en = marks("en");
      const es = marks("es");
      expect(es).toEqual(en);
      expect(score(es.filter(Boolean).length, es.length)).toBe(score(en.filter(Boolean).length, en.length));
      // the expected marks follow from the English key: every third answer was made wrong
      expect(en).toEqual(items.map((_, i) => i % 3 !== 0));
      // and what a Spanish viewer sees is the Spanish text, with the same option ids in the same drawn order
      for (const it of items) {
        const shown = publicItem(1, { ...it, question: displayQuestion(it.question, "es", catalog) });
        const english = publicItem(1, it);
        expect(shown.prompt).not.toBe("");
        if ("options" in shown && "options" in english) expect(shown.options.map((o) => o.id)).toEqual(english.options.map((o) => o.id));
        const es = catalog.es.questions[it.question.id];
        if (es && it.question.type !== "parametric") expect(shown.prompt).toBe(es.prompt);
      }
    });
  }

  it("an attempt drawn from an older revision keeps its own English words (no translation of newer text)", () => {
    const q = catalog.modules[0]!.questions[0]!;
    const older: Question = { ...q, revision: (q.revision ?? 1) + 1, prompt: "An older wording of this question?" };
    expect(displayQuestion(older, "es", catalog).prompt).toBe("An older wording of this question?");
    expect(displayQuestion(q, "es", catalog).prompt).toBe(catalog.es.questions[q.id]!.prompt);
  });
});
