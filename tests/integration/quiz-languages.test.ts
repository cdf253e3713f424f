// A quiz taken in Spanish grades exactly as in English, over the real route handlers and MariaDB.
// Reference: the English question bank (content/modules/<m>/quiz.yaml) decides right and wrong; the
// Spanish twin (content/es/modules/<m>/quiz.yaml) only changes the words shown, matched by question id.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { pool } from "@/db/client";
import { freshIp, getJson, postJson, signIn, type Client } from "../helpers/http";
import { answersFor, catalog } from "../helpers/quiz";
import { TEST_PASSWORD, createOrganization, createPeople } from "../helpers/fixtures";

const MODULE = "freeze-protection";
let person: { id: string; email: string };
let client: Client;
// through the Account setting's own route (it also refreshes the signed session copy on this server)
const speak = async (language: "en" | "es") => expect((await postJson(client, "/api/account/language", { language })).status).toBe(200);

type Shown = { id: string; position: number; prompt: string; options?: { id: string; text: string }[] };

beforeAll(async () => {
  const org = await createOrganization("Quiz Languages Fire Co");
  const [p] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag: "lang" });
  person = p!;
  client = await signIn(person.email, TEST_PASSWORD, freshIp());
});
afterAll(() => pool.end());

describe("one attempt, two languages", () => {
  it("shows the Spanish words by question id, the same option ids in the same order, and grades the same", async () => {
    await speak("es");
    const started = await postJson(client, "/api/quiz/attempts", { module: MODULE });
    expect(started.status).toBe(201);
    const id = started.json.id as string;
    const es = started.json.questions as Shown[];
    await speak("en");
    const en = (await getJson<{ questions: Shown[] }>(client, `/api/quiz/attempts/${id}`)).body.questions;

    const bank = new Map(catalog.modules.find((m) => m.slug === MODULE)!.questions.map((q) => [q.id, q]));
    expect(es.map((q) => q.id)).toEqual(en.map((q) => q.id));
    for (const [i, q] of es.entries()) {
      expect(q.options?.map((o) => o.id)).toEqual(en[i]!.options?.map((o) => o.id));
      const spanish = catalog.es.questions[q.id]!;
      if (bank.get(q.id)!.type !== "parametric") {
        expect(q.prompt).toBe(spanish.prompt);
        expect(en[i]!.prompt).toBe(bank.get(q.id)!.prompt);
      }
      for (const o of q.options ?? []) expect(o.text).toBe(spanish.options!.find((x) => x.id === o.id)!.text);
    }

    // every third answer wrong, by the English key; submitted while reading Spanish
    const answers = await answersFor(id, (i) => i % 3 !== 0);
    await speak("es");
    const graded = await postJson(client, `/api/quiz/attempts/${id}/submit`, { answers });
    expect(graded.status).toBe(200);
    const right = answers.filter((_, i) => i % 3 !== 0).length;
    expect(graded.json.correctCount).toBe(right);
    expect(graded.json.score).toBe(Math.round((100 * right) / answers.length));
    const feedbackEs = graded.json.feedback as { id: string; correct: boolean; explanation: string }[];
    expect(feedbackEs.map((f) => f.explanation)).toEqual(feedbackEs.map((f) => catalog.es.questions[f.id]!.explanation));

    // the same attempt read in English: the same marks and score, English explanations
    await speak("en");
    const inEnglish = (await getJson<{ score: number; correctCount: number; feedback: { id: string; correct: boolean; explanation: string }[] }>(client, `/api/quiz/attempts/${id}`)).body;
    expect([inEnglish.score, inEnglish.correctCount]).toEqual([graded.json.score, graded.json.correctCount]);
    expect(inEnglish.feedback.map((f) => f.correct)).toEqual(feedbackEs.map((f) => f.correct));
    expect(inEnglish.feedback.map((f) => f.explanation)).toEqual(inEnglish.feedback.map((f) => bank.get(f.id)!.explanation));
  });
});
