// The attempt lifecycle over real route handlers and MariaDB: no answers leak before submit,
// grading happens once under concurrency, tampering is refused, completion is recorded.
import { and, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { catalogLesson, catalogModule, lessonProgress, moduleCompletion, quizAttempt } from "@/db/schema";
import { APP, fetchFrom, freshIp, postJson, signIn, type Client } from "../helpers/http";

const clientWithCookie = (cookie: string): Client => {
  const ip = freshIp();
  return { cookie, ip, fetch: (p, init = {}) => fetchFrom(ip, `${APP}${p}`, { redirect: "manual", ...init, headers: { origin: APP, cookie, ...(init.headers as Record<string, string> | undefined) } }) };
};
import { answersFor, catalog, itemsOf } from "../helpers/quiz";
import { TEST_PASSWORD, createOrganization, createPeople, sessionCookieFor, readAndComplete } from "../helpers/fixtures";

const MODULE = "hydraulics-and-permits";
let org: { id: string; teamId: string };
const signInNew = async (tag: string) => {
  const [p] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag });
  return { ...p!, client: await signIn(p!.email, TEST_PASSWORD, freshIp()) };
};

beforeAll(async () => {
  org = await createOrganization("Quiz Test Fire Co");
});
afterAll(() => pool.end());

async function start(client: Client, module = MODULE) {
  const res = await postJson(client, "/api/quiz/attempts", { module });
  return res;
}

describe("starting an attempt", () => {
  it("returns the questions without any correct answer or explanation", async () => {
    const { client } = await signInNew("leak");
    const res = await start(client);
    expect(res.status).toBe(201);
    const questions = res.json.questions as Record<string, unknown>[];
    expect(questions).toHaveLength(catalog.modules.find((m) => m.slug === MODULE)!.meta.quiz.questionsPerAttempt);
    const text = res.text;
    expect(text).not.toMatch(/"correct"|"answer"\s*:|"explanation"|"tolerance|"formula"|"lesson"/);
    for (const q of questions) expect(Object.keys(q).sort()).toEqual(expect.arrayContaining(["id", "position", "prompt", "type"]));
    // Parametric prompts carry their drawn values, never placeholders.
    expect(text).not.toMatch(/\{[a-zA-Z]+\}/);
  });

  it("resumes the open attempt instead of starting a second one, with saved answers", async () => {
    const { client } = await signInNew("resume");
    const a = await start(client);
    const first = (a.json.questions as { position: number; type: string }[])[0]!;
    const items = await itemsOf(a.json.id as string);
    const answer = items[0]!.body.type === "truefalse" ? true : items[0]!.body.type === "single" ? items[0]!.optionOrder![0] : items[0]!.body.type === "multiple" ? [items[0]!.optionOrder![0]] : 1;
    const save = await postJson(client, `/api/quiz/attempts/${a.json.id}/answers`, { answers: [{ position: first.position, answer }] }, "PUT");
    expect(save.status).toBe(200);
    const b = await start(client);
    expect(b.json.id).toBe(a.json.id);
    expect((b.json.answers as Record<string, unknown>)[String(first.position)]).toEqual(answer);
  });
});

describe("submitting", () => {
  it("20 concurrent submits of one attempt give one grading and 20 identical responses", async () => {
    const { client } = await signInNew("conc");
    const a = await start(client);
    const id = a.json.id as string;
    const answers = await answersFor(id, (i) => i % 2 === 0);
    expect((await postJson(client, `/api/quiz/attempts/${id}/answers`, { answers }, "PUT")).status).toBe(200);
    const results = await Promise.all(Array.from({ length: 20 }, () => postJson(client, `/api/quiz/attempts/${id}/submit`, {})));
    expect(results.map((r) => r.status)).toEqual(Array(20).fill(200));
    expect(new Set(results.map((r) => r.text)).size).toBe(1);
    const rows = await db.select().from(quizAttempt).where(eq(quizAttempt.id, id));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.status).toBe("graded");
    const expectedScore = Math.round((100 * Math.ceil(answers.length / 2)) / answers.length);
    expect(rows[0]!.score).toBe(expectedScore);
    expect(results[0]!.json.score).toBe(expectedScore);
    // feedback now carries explanations and the lesson they come from
    const fb = results[0]!.json.feedback as { explanation: string; lesson: { href: string } }[];
    expect(fb[0]!.explanation.length).toBeGreaterThan(10);
    expect(fb[0]!.lesson.href).toMatch(new RegExp(`^/modules/${MODULE}/`));
  });

  it("200 learners submitting at once lose no attempt", async () => {
    const people = await createPeople(200, { organizationId: org.id, teamId: org.teamId, tag: "crowd" });
    const clients: Client[] = [];
    for (const p of people) clients.push(clientWithCookie(await sessionCookieFor(p.id)));
    const attempts = await Promise.all(clients.map((c) => start(c, "how-systems-work")));
    expect(attempts.every((a) => a.status === 201)).toBe(true);
    const submits = await Promise.all(clients.map((c, i) => postJson(c, `/api/quiz/attempts/${attempts[i]!.json.id}/submit`, {})));
    expect(submits.map((s) => s.status).filter((s) => s !== 200)).toEqual([]);
    const [row] = await db
      .select({ n: sql<number>`count(*)` })
      .from(quizAttempt)
      .where(and(eq(quizAttempt.organizationId, org.id), eq(quizAttempt.moduleSlug, "how-systems-work"), eq(quizAttempt.status, "graded")));
    expect(Number(row!.n)).toBe(200);
  }, 180_000);
});

describe("tampered input", () => {
  it("refuses unknown option ids, questions not in the attempt, and another person's attempt", async () => {
    const me = await signInNew("tamper");
    const other = await signInNew("victim");
    const a = await start(me.client);
    const id = a.json.id as string;
    const items = await itemsOf(id);
    const choice = items.find((i) => i.body.type === "single" || i.body.type === "multiple");
    if (choice) {
      const bad = await postJson(me.client, `/api/quiz/attempts/${id}/answers`, { answers: [{ position: choice.position, answer: choice.body.type === "multiple" ? ["z"] : "z" }] }, "PUT");
      expect(bad.status).toBe(400);
      expect(JSON.stringify(bad.json.fieldErrors)).toMatch(/unknown/);
    }
    const notInAttempt = await postJson(me.client, `/api/quiz/attempts/${id}/answers`, { answers: [{ position: 99, answer: true }] }, "PUT");
    expect(notInAttempt.status).toBe(400);
    expect(JSON.stringify(notInAttempt.json.fieldErrors)).toMatch(/not part of the attempt/);
    const wrongShape = await postJson(me.client, `/api/quiz/attempts/${id}/answers`, { answers: "all correct" }, "PUT");
    expect(wrongShape.status).toBe(400);
    // nothing was stored by the refused saves
    expect((await itemsOf(id)).every((i) => i)).toBe(true);
    const stored = await db.execute(sql`select count(*) as n from quiz_attempt_item where attempt_id = ${id} and answer is not null`);
    expect(Number((stored[0] as unknown as { n: number }[])[0]!.n)).toBe(0);

    expect((await postJson(other.client, `/api/quiz/attempts/${id}/answers`, { answers: [] }, "PUT")).status).toBe(403);
    expect((await postJson(other.client, `/api/quiz/attempts/${id}/submit`, {})).status).toBe(403);
    expect((await other.client.fetch(`/api/quiz/attempts/${id}`)).status).toBe(403);
  });

  it("grades an attempt past its time limit with what was saved and refuses later answers (409)", async () => {
    const { client } = await signInNew("late");
    const a = await start(client, "freeze-protection"); // has a time limit
    const id = a.json.id as string;
    expect(a.json.deadlineAt).toBeTruthy();
    const answers = await answersFor(id);
    await postJson(client, `/api/quiz/attempts/${id}/answers`, { answers: answers.slice(0, 2) }, "PUT");
    await db.update(quizAttempt).set({ deadlineAt: new Date(Date.now() - 60_000) }).where(eq(quizAttempt.id, id));
    const late = await postJson(client, `/api/quiz/attempts/${id}/submit`, { answers });
    expect(late.status).toBe(409);
    expect(late.json.error).toMatch(/Time is up/);
    const view = await (await client.fetch(`/api/quiz/attempts/${id}`)).json();
    expect(view.status).toBe("graded");
    expect(view.lateGraded).toBe(true);
    expect(view.correctCount).toBeLessThanOrEqual(2);
    const again = await postJson(client, `/api/quiz/attempts/${id}/answers`, { answers }, "PUT");
    expect(again.status).toBe(409);
  });

  it("enforces the wait between attempts with a clear message", async () => {
    const { client } = await signInNew("wait");
    const a = await start(client, "working-with-trades");
    await postJson(client, `/api/quiz/attempts/${a.json.id}/submit`, {});
    const b = await start(client, "working-with-trades");
    expect(b.status).toBe(409);
    expect(b.json.error).toMatch(/minute/);
  });
});

describe("completion", () => {
  it("all lessons done and the quiz passed completes the module once", async () => {
    const me = await signInNew("complete");
    const mod = catalog.modules.find((m) => m.slug === "talking-with-homebuyers")!;
    const a = await start(me.client, mod.slug);
    const id = a.json.id as string;
    const res = await postJson(me.client, `/api/quiz/attempts/${id}/submit`, { answers: await answersFor(id) });
    expect(res.status).toBe(200);
    expect(res.json.passed).toBe(true);
    expect(res.json.score).toBe(100);
    // passed, but lessons not done: no completion yet
    expect(await db.select().from(moduleCompletion).where(eq(moduleCompletion.userId, me.id))).toHaveLength(0);
    await readAndComplete(me.client, me.id, mod.slug, mod.lessons.map((l) => l.slug));
    const rows = await db.select().from(moduleCompletion).where(eq(moduleCompletion.userId, me.id));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.attemptId).toBe(id);
    // a repeated lesson mark does not complete twice
    await postJson(me.client, "/api/progress", { module: mod.slug, lesson: mod.lessons[0]!.slug });
    expect(await db.select().from(moduleCompletion).where(eq(moduleCompletion.userId, me.id))).toHaveLength(1);
    const lessonRows = await db
      .select()
      .from(lessonProgress)
      .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
      .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
      .where(and(eq(lessonProgress.userId, me.id), eq(catalogModule.slug, mod.slug)));
    expect(lessonRows).toHaveLength(mod.lessons.length);
  });

  it("lets a learner list their own attempts, a manager their organization's, and nobody else", async () => {
    const me = await signInNew("lister");
    await start(me.client, "pipe-and-joining");
    const own = await (await me.client.fetch("/api/quiz/attempts")).json();
    expect(own.attempts.length).toBe(1);
    const outsider = await signIn("hollis@larkhaven.example");
    expect((await outsider.fetch(`/api/quiz/attempts?userId=${me.id}`)).status).toBe(403);
    expect((await outsider.fetch(`/api/quiz/attempts?organizationId=${org.id}`)).status).toBe(403);
    const [mgr] = await createPeople(1, { organizationId: org.id, role: "manager", tag: "qmgr" });
    const manager = await signIn(mgr!.email, TEST_PASSWORD, freshIp());
    const list = await (await manager.fetch(`/api/quiz/attempts?organizationId=${org.id}`)).json();
    expect(list.attempts.length).toBeGreaterThan(200);
  });
});
