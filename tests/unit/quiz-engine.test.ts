// Grading rules for every question type, tolerance edges, the seeded draw, and parametric answers
// equal to the calculators' library for the drawn values.
import path from "node:path";
import { describe, expect, it } from "vitest";
import { loadCatalogFrom } from "@/lib/content/load";
import type { Question } from "@/lib/content/schema";
import { sprinklerFlowGpm } from "@/lib/hydraulics";
import { answerProblem, drawAttempt, drawParams, gradeItem, parametricAnswer, prng, publicItem, score } from "@/lib/quiz/engine";

const single: Question = { id: "t-single", type: "single", prompt: "Which one?", options: [{ id: "a", text: "A" }, { id: "b", text: "B" }, { id: "c", text: "C" }], correct: "b", explanation: "Because B is right here.", lesson: "x" };
const multiple: Question = { id: "t-multi", type: "multiple", prompt: "Select all that apply", options: [{ id: "a", text: "A" }, { id: "b", text: "B" }, { id: "c", text: "C" }], correct: ["a", "c"], explanation: "A and C are both right.", lesson: "x" };
const tf: Question = { id: "t-tf", type: "truefalse", prompt: "True or false?", correct: false, explanation: "It is false, for a reason.", lesson: "x" };
const numeric: Question = { id: "t-num", type: "numeric", prompt: "How many gpm?", answer: 12.8, unit: "gpm", tolerance: 0.2, explanation: "12.8 gpm from the formula.", lesson: "x" };
const parametric: Question = {
  id: "t-par", type: "parametric", prompt: "K = {kFactor} at {pressurePsi} psi: flow?", formula: "sprinklerFlowGpm",
  params: { kFactor: { min: 3, max: 5.6, step: 0.1 }, pressurePsi: { min: 7, max: 60, step: 1 } }, fixed: {}, unit: "gpm", tolerancePercent: 2,
  explanation: "Q = K times the square root of P.", lesson: "x",
};
const item = (question: Question, params: Record<string, number> | null = null) => ({ question, params });

describe("grading", () => {
  it("single choice: only the correct option", () => {
    expect(gradeItem(item(single), "b")).toBe(true);
    expect(gradeItem(item(single), "a")).toBe(false);
    expect(gradeItem(item(single), null)).toBe(false);
  });

  it("multiple select is all-or-nothing", () => {
    expect(gradeItem(item(multiple), ["c", "a"])).toBe(true);
    expect(gradeItem(item(multiple), ["a"])).toBe(false); // partial: wrong
    expect(gradeItem(item(multiple), ["a", "b", "c"])).toBe(false); // extra: wrong
    expect(gradeItem(item(multiple), [])).toBe(false);
  });

  it("true/false", () => {
    expect(gradeItem(item(tf), false)).toBe(true);
    expect(gradeItem(item(tf), true)).toBe(false);
    expect(gradeItem(item(tf), "false" as never)).toBe(false);
  });

  it("numeric: inclusive at the tolerance edge, wrong just outside", () => {
    expect(gradeItem(item(numeric), 12.8)).toBe(true);
    expect(gradeItem(item(numeric), 12.6)).toBe(true); // exactly −0.2
    expect(gradeItem(item(numeric), 13.0)).toBe(true); // exactly +0.2
    expect(gradeItem(item(numeric), 12.59)).toBe(false);
    expect(gradeItem(item(numeric), 13.01)).toBe(false);
    expect(gradeItem(item(numeric), Number.NaN)).toBe(false);
  });

  it("parametric: the expected value is the calculator's Q = K√P for the drawn values (NFPA 13D discharge relation)", () => {
    const params = { kFactor: 4.9, pressurePsi: 7 };
    const expected = sprinklerFlowGpm(4.9, 7); // 4.9 × √7 = 12.96 gpm
    expect(expected).toBeCloseTo(4.9 * Math.sqrt(7), 9);
    expect(parametricAnswer(parametric as Extract<Question, { type: "parametric" }>, params)).toBe(expected);
    expect(gradeItem(item(parametric, params), expected)).toBe(true);
    expect(gradeItem(item(parametric, params), expected * 1.02)).toBe(true); // at +2 %
    expect(gradeItem(item(parametric, params), expected * 1.021)).toBe(false);
    expect(gradeItem(item(parametric, params), expected * 0.979)).toBe(false);
  });

  it("scores as a rounded percentage", () => {
    expect(score(8, 10)).toBe(80);
    expect(score(2, 3)).toBe(67);
    expect(score(0, 0)).toBe(0);
  });
});

describe("drawing an attempt", () => {
  it("is reproducible from its seed and differs between seeds", () => {
    const bank = [single, multiple, tf, numeric, parametric];
    const a = drawAttempt(bank, 4, 1234);
    const b = drawAttempt(bank, 4, 1234);
    expect(a).toEqual(b);
    expect(a).toHaveLength(4);
    const orders = new Set(Array.from({ length: 20 }, (_, s) => drawAttempt(bank, 5, s).map((d) => d.question.id).join()));
    expect(orders.size).toBeGreaterThan(1);
  });

  it("draws parametric values on the step grid within range", () => {
    const rand = prng(7);
    for (let i = 0; i < 500; i++) {
      const p = drawParams(parametric as Extract<Question, { type: "parametric" }>, rand);
      expect(p.kFactor).toBeGreaterThanOrEqual(3);
      expect(p.kFactor).toBeLessThanOrEqual(5.6);
      expect(Math.abs(p.kFactor! * 10 - Math.round(p.kFactor! * 10))).toBeLessThan(1e-9);
      expect(Number.isInteger(p.pressurePsi)).toBe(true);
    }
  });

  it("never puts the answer or explanation in what the browser sees before submit", () => {
    for (const d of drawAttempt([single, multiple, tf, numeric, parametric], 5, 99)) {
      const view = JSON.stringify(publicItem(1, d));
      expect(view).not.toMatch(/"correct"|"answer"|"explanation"|"tolerance/);
    }
  });

  it("rejects answers that do not fit the question", () => {
    const d = drawAttempt([single, multiple], 2, 5);
    const s = d.find((x) => x.question.type === "single")!;
    const m = d.find((x) => x.question.type === "multiple")!;
    expect(answerProblem(s, "z")).toMatch(/unknown/);
    expect(answerProblem(m, ["a", "a"])).toMatch(/repeated/);
    expect(answerProblem(item(numeric) as never, "12" as never)).toMatch(/number/);
    expect(answerProblem(s, "a")).toBeNull();
  });
});

describe("the real question banks", () => {
  const catalog = loadCatalogFrom(path.resolve("content"));
  it("have at least 12 questions per module and 108 in all, with 15+ numeric/parametric in hydraulics, coverage and freeze", () => {
    const all = catalog.modules.flatMap((m) => m.questions);
    expect(all.length).toBeGreaterThanOrEqual(108);
    for (const m of catalog.modules) expect(m.questions.length, m.slug).toBeGreaterThanOrEqual(12);
    const numericish = catalog.modules
      .filter((m) => ["hydraulics-and-permits", "sprinklers-and-coverage", "freeze-protection"].includes(m.slug))
      .flatMap((m) => m.questions)
      .filter((q) => q.type === "numeric" || q.type === "parametric");
    expect(numericish.length).toBeGreaterThanOrEqual(15);
    const types = new Set(all.map((q) => q.type));
    expect([...types].sort()).toEqual(["multiple", "numeric", "parametric", "single", "truefalse"]);
  });

  it("give every parametric question a finite, positive answer across many draws", () => {
    const rand = prng(42);
    for (const q of catalog.modules.flatMap((m) => m.questions)) {
      if (q.type !== "parametric") continue;
      for (let i = 0; i < 50; i++) {
        const v = parametricAnswer(q, drawParams(q, rand));
        expect(Number.isFinite(v), q.id).toBe(true);
        expect(v, q.id).toBeGreaterThan(0);
      }
    }
  });
});
