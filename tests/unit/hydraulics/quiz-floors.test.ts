// Parametric quiz questions are keyed by lib/quiz/formulas.ts through lib/hydraulics. Nothing they key
// may fall below an NFPA 13D floor (CODE_FLOORS: 7 psi at a sprinkler — NFPA 13D 2022/2025, from memory,
// verify the section; 0.05 gpm/ft² — NFPA 13D 2025 Section 10.2). Many draws are sampled with
// fast-check, both from every bank's own parameter grid and from wide random ranges.
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parse } from "yaml";
import { quizBank, type Question } from "../../../lib/content/schema";
import { CODE_FLOORS, sprinklerPressurePsi } from "../../../lib/hydraulics";
import { drawParams, parametricAnswer } from "../../../lib/quiz/engine";
import { computeFormula } from "../../../lib/quiz/formulas";

type Parametric = Extract<Question, { type: "parametric" }>;

const modulesDir = path.resolve(__dirname, "../../../content/modules");
const parametric: { module: string; q: Parametric }[] = readdirSync(modulesDir).flatMap((module) => {
  let text: string;
  try {
    text = readFileSync(path.join(modulesDir, module, "quiz.yaml"), "utf8");
  } catch {
    return [];
  }
  const bank = quizBank.parse(parse(text));
  return bank.questions.filter((q): q is Parametric => q.type === "parametric").map((q) => ({ module, q }));
});

/** a seeded random source for the engine's own draw, from fast-check's integers */
const rand = (seed: number) => {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
};

describe("the quiz banks' parametric questions never key a value below an NFPA 13D floor", () => {
  const pressureAtSprinkler = parametric.filter(({ q }) => q.formula === "sprinklerPressurePsi" || q.formula === "sprinklerFlowGpm");
  it("the banks hold sprinkler questions to check", () => {
    expect(pressureAtSprinkler.length).toBeGreaterThan(0);
  });
  it.each(pressureAtSprinkler.map(({ module, q }) => [module, q.id, q] as const))("%s %s: every draw keeps the sprinkler at 7 psi or more", (_m, _id, q) => {
    fc.assert(
      fc.property(fc.integer(), (seed) => {
        const params = { ...q.fixed, ...drawParams(q, rand(seed)) };
        const answer = parametricAnswer(q, params);
        if (q.formula === "sprinklerPressurePsi") {
          expect(answer).toBeGreaterThanOrEqual(CODE_FLOORS.minPressurePsi);
        } else {
          // a flow question states the pressure at the sprinkler: it must not be below the floor
          expect(params.pressurePsi).toBeGreaterThanOrEqual(CODE_FLOORS.minPressurePsi);
          expect(answer).toBeGreaterThanOrEqual(params.kFactor! * Math.sqrt(CODE_FLOORS.minPressurePsi) - 1e-9);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("the formulas themselves apply the floor for any inputs (property)", () => {
  it("sprinklerPressurePsi keys (Q/K)², or 7 psi where that is lower", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 30, noNaN: true }), fc.double({ min: 1, max: 60, noNaN: true }), (k, q) => {
        const keyed = computeFormula("sprinklerPressurePsi", { kFactor: k, flowGpm: q });
        expect(keyed).toBeGreaterThanOrEqual(CODE_FLOORS.minPressurePsi);
        expect(keyed).toBeCloseTo(Math.max(CODE_FLOORS.minPressurePsi, sprinklerPressurePsi(k, q)), 9);
      }),
      { numRuns: 1000 },
    );
  });
});
