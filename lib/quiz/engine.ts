/**
 * The pure core of the quiz: drawing an attempt from a bank with a seed, and grading answers.
 * No database, no React — unit-tested directly.
 *
 * Grading rules (also in the README):
 * - single choice and true/false: right or wrong;
 * - multiple select: all-or-nothing — the chosen set must equal the correct set exactly;
 * - numeric: |answer − expected| ≤ tolerance (absolute, in the stated unit), with a 1e-9 guard for
 *   floating-point edges, so an answer exactly at the tolerance passes;
 * - parametric: the expected value is computed by lib/hydraulics for the values drawn for this
 *   attempt; |answer − expected| ≤ expected × tolerancePercent / 100 (+ the same guard).
 * Score = round(100 × correct / questions); passed = score ≥ the module's pass mark.
 */
import { questionApplies, type Question } from "@/lib/content/browser";
import { formulas } from "./formulas";

/** mulberry32: a small, well-known seeded PRNG — the same seed draws the same attempt. */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function shuffle<T>(items: T[], rand: () => number): T[] {
  const a = [...items];
  for (let i = a.length - 1; i > 0; i--) {
    const j = Math.floor(rand() * (i + 1));
    [a[i], a[j]] = [a[j]!, a[i]!];
  }
  return a;
}

export type DrawnItem = { question: Question; optionOrder: string[] | null; params: Record<string, number> | null };

const decimalsOf = (n: number) => (String(n).split(".")[1] ?? "").length;

/** Draws parametric inputs on their step grid between min and max. */
export function drawParams(q: Extract<Question, { type: "parametric" }>, rand: () => number): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [name, r] of Object.entries(q.params)) {
    const steps = Math.floor((r.max - r.min) / r.step + 1e-9);
    const k = Math.floor(rand() * (steps + 1));
    const places = Math.max(decimalsOf(r.min), decimalsOf(r.step));
    out[name] = Number((r.min + k * r.step).toFixed(places));
  }
  return out;
}

/** Picks `count` questions from the bank in a seeded order, shuffling options and drawing values. */
export function drawAttempt(bank: Question[], count: number, seed: number): DrawnItem[] {
  const rand = prng(seed);
  return shuffle(bank, rand)
    .slice(0, Math.min(count, bank.length))
    .map((question) => ({
      question,
      optionOrder: question.type === "single" || question.type === "multiple" ? shuffle(question.options.map((o) => o.id), rand) : null,
      params: question.type === "parametric" ? drawParams(question, rand) : null,
    }));
}

/**
 * The questions of a bank that hold in `edition` (questions without `editions` hold in all; with no
 * edition chosen only those are kept). Keeps the bank's order, so the seeded draw stays deterministic.
 */
export function editionBank(bank: Question[], edition: number | null): Question[] {
  return bank.filter((q) => questionApplies(q, edition));
}

/** The expected numeric answer of a parametric question for its drawn values. */
export function parametricAnswer(q: Extract<Question, { type: "parametric" }>, params: Record<string, number>): number {
  return formulas[q.formula]({ ...q.fixed, ...params });
}

export function fillPrompt(prompt: string, values: Record<string, number>): string {
  return prompt.replace(/\{(\w+)\}/g, (m, name: string) => (name in values ? String(values[name]) : m));
}

export type Answer = string | string[] | boolean | number | null;

const EPS = 1e-9;

/** Whether an answer is right. Unknown or wrongly typed answers count as wrong (validated earlier). */
export function gradeItem(item: { question: Question; params: Record<string, number> | null }, answer: Answer): boolean {
  const q = item.question;
  switch (q.type) {
    case "single":
      return typeof answer === "string" && answer === q.correct;
    case "multiple": {
      if (!Array.isArray(answer)) return false;
      const chosen = new Set(answer);
      return chosen.size === q.correct.length && q.correct.every((c) => chosen.has(c));
    }
    case "truefalse":
      return typeof answer === "boolean" && answer === q.correct;
    case "numeric":
      return typeof answer === "number" && Number.isFinite(answer) && Math.abs(answer - q.answer) <= q.tolerance + EPS;
    case "parametric": {
      if (typeof answer !== "number" || !Number.isFinite(answer) || !item.params) return false;
      const expected = parametricAnswer(q, item.params);
      return Math.abs(answer - expected) <= Math.abs(expected) * (q.tolerancePercent / 100) + EPS;
    }
  }
}

/** Checks that an answer has the shape its question takes; returns a message when it does not. */
export function answerProblem(item: { question: Question; optionOrder: string[] | null }, answer: Answer): string | null {
  if (answer === null) return null;
  const q = item.question;
  switch (q.type) {
    case "single":
      return typeof answer === "string" && item.optionOrder?.includes(answer) ? null : "unknown option";
    case "multiple":
      return Array.isArray(answer) && answer.every((a) => typeof a === "string" && item.optionOrder?.includes(a)) && new Set(answer).size === answer.length
        ? null
        : "unknown or repeated option";
    case "truefalse":
      return typeof answer === "boolean" ? null : "must be true or false";
    case "numeric":
    case "parametric":
      return typeof answer === "number" && Number.isFinite(answer) && Math.abs(answer) < 1e9 ? null : "must be a number";
  }
}

/** What the browser may see of an item before submit: no correct answer, no explanation. */
export function publicItem(position: number, item: { question: Question; optionOrder: string[] | null; params: Record<string, number> | null }) {
  const q = item.question;
  const base = { position, id: q.id, type: q.type };
  switch (q.type) {
    case "single":
    case "multiple": {
      const text = new Map(q.options.map((o) => [o.id, o.text]));
      return { ...base, prompt: q.prompt, options: (item.optionOrder ?? []).map((id) => ({ id, text: text.get(id) ?? "" })) };
    }
    case "truefalse":
      return { ...base, prompt: q.prompt };
    case "numeric":
      return { ...base, prompt: q.prompt, unit: q.unit };
    case "parametric":
      return { ...base, prompt: fillPrompt(q.prompt, { ...q.fixed, ...(item.params ?? {}) }), unit: q.unit };
  }
}

/** The correct answer in words, for results after submit. */
export function correctAnswerText(item: { question: Question; params: Record<string, number> | null }): string {
  const q = item.question;
  switch (q.type) {
    case "single":
      return q.options.find((o) => o.id === q.correct)?.text ?? "";
    case "multiple":
      return q.options.filter((o) => q.correct.includes(o.id)).map((o) => o.text).join("; ");
    case "truefalse":
      return q.correct ? "True" : "False";
    case "numeric":
      return `${q.answer} ${q.unit} (±${q.tolerance})`;
    case "parametric": {
      const v = parametricAnswer(q, item.params ?? {});
      return `${Number(v.toPrecision(4))} ${q.unit} (±${q.tolerancePercent}%)`;
    }
  }
}

export function score(correct: number, total: number): number {
  return total === 0 ? 0 : Math.round((100 * correct) / total);
}
