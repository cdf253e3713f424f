// What a certificate stands for: results that teach without handing out the question bank's key,
// names checked by the server and kept on the certificate as issued, and a completion that is
// recorded even when it could not be recorded at grading time.
import { and, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate, lessonProgress, mailOutbox, moduleCompletion, quizAttempt, user } from "@/db/schema";
import { freshIp, postJson, signIn, type Client } from "../helpers/http";
import { pdfText } from "../helpers/pdf";
import { answersFor, catalog } from "../helpers/quiz";
import { TEST_PASSWORD, createOrganization, createPeople, readAndComplete } from "../helpers/fixtures";

const MODULE = "talking-with-homebuyers"; // 3 attempts per 24 h, 10 minutes between attempts
let org: { id: string; teamId: string };
const person = async (tag: string) => {
  const [p] = await createPeople(1, { organizationId: org.id, teamId: org.teamId, tag });
  return { ...p!, client: await signIn(p!.email, TEST_PASSWORD, freshIp()) };
};

beforeAll(async () => {
  org = await createOrganization("Integrity Test Fire Co");
});
afterAll(() => pool.end());

type Feedback = { correct: boolean; correctAnswer: string | null; explanation: string; yourAnswer: string };

async function failAttempt(client: Client) {
  const a = await postJson(client, "/api/quiz/attempts", { module: MODULE });
  expect(a.status, a.text).toBe(201);
  const id = a.json.id as string;
  const res = await postJson(client, `/api/quiz/attempts/${id}/submit`, { answers: await answersFor(id, () => false) });
  expect(res.status).toBe(200);
  expect(res.json.passed).toBe(false);
  // the 10-minute wait between attempts, as if it had passed (the server's own stamps moved back)
  await db
    .update(quizAttempt)
    .set({ startedAt: sql`${quizAttempt.startedAt} - INTERVAL 15 MINUTE`, submittedAt: sql`${quizAttempt.submittedAt} - INTERVAL 15 MINUTE` })
    .where(eq(quizAttempt.id, id));
  return { id, res };
}

describe("quiz results", () => {
  it("show which questions were wrong and why, but not the keyed answers while attempts remain", async () => {
    const me = await person("fb-hidden");
    const first = await failAttempt(me.client);
    const feedback = first.res.json.feedback as Feedback[];
    expect(feedback.length).toBeGreaterThan(0);
    expect(first.res.json.answersRevealed).toBe(false);
    for (const f of feedback) {
      expect(f.correct).toBe(false);
      expect(f.explanation.length).toBeGreaterThan(10);
      expect(f.correctAnswer).toBeNull();
    }
    // the same through the attempt view, and for a second failed attempt
    const view = await (await me.client.fetch(`/api/quiz/attempts/${first.id}`)).json();
    expect((view.feedback as Feedback[]).every((f) => f.correctAnswer === null)).toBe(true);
    const second = await failAttempt(me.client);
    expect((second.res.json.feedback as Feedback[]).every((f) => f.correctAnswer === null)).toBe(true);

    // the third and last attempt of the period: now the keys show, on every attempt's results
    const third = await failAttempt(me.client);
    expect(third.res.json.answersRevealed).toBe(true);
    expect((third.res.json.feedback as Feedback[]).every((f) => typeof f.correctAnswer === "string" && f.correctAnswer.length > 0)).toBe(true);
    const again = await (await me.client.fetch(`/api/quiz/attempts/${first.id}`)).json();
    expect(again.answersRevealed).toBe(true);
  });

  it("a passing attempt may show the key", async () => {
    const me = await person("fb-pass");
    const a = await postJson(me.client, "/api/quiz/attempts", { module: MODULE });
    const id = a.json.id as string;
    const answers = await answersFor(id, (i) => i !== 0); // one wrong, still above the pass mark
    const res = await postJson(me.client, `/api/quiz/attempts/${id}/submit`, { answers });
    expect(res.json.passed).toBe(true);
    expect(res.json.answersRevealed).toBe(true);
    const wrong = (res.json.feedback as Feedback[]).filter((f) => !f.correct);
    expect(wrong).toHaveLength(1);
    expect(wrong[0]!.correctAnswer).toBeTruthy();
  });
});

describe("names", () => {
  it("the server refuses control characters, links, e-mail addresses and overlong names, whatever the form allows", async () => {
    const me = await person("name-rule");
    const [before] = await db.select({ name: user.name }).from(user).where(eq(user.id, me.id));
    for (const name of ["Ann\u0000Lee", "Ann\u202eeeL", "Ann\nLee", "see https://evil.example/x", "www.evil.example", "bob@evil.example", "x".repeat(101), "  ", "1234", "Ann\u200bLee"]) {
      const r = await postJson(me.client, "/api/auth/update-user", { name });
      expect(r.status, JSON.stringify(name)).toBe(400);
    }
    const [after] = await db.select({ name: user.name }).from(user).where(eq(user.id, me.id));
    expect(after!.name).toBe(before!.name);
    for (const name of ["Zoë O’Hara-Nuñez", "J. R. Smith", "Łukasz Wójcik", "李小龙"]) {
      expect((await postJson(me.client, "/api/auth/update-user", { name })).status, name).toBe(200);
    }
  });

  it("the certificate keeps the name as issued: a later rename changes neither verification nor the PDF", async () => {
    const me = await person("name-issued");
    await db.update(user).set({ name: "Perpetua Lomax" }).where(eq(user.id, me.id));
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    await readAndComplete(me.client, me.id, MODULE, mod.lessons.map((l) => l.slug));
    const a = await postJson(me.client, "/api/quiz/attempts", { module: MODULE });
    const id = a.json.id as string;
    expect((await postJson(me.client, `/api/quiz/attempts/${id}/submit`, { answers: await answersFor(id) })).json.passed).toBe(true);
    const [cert] = await db.select().from(certificate).where(and(eq(certificate.userId, me.id), eq(certificate.kind, "module")));
    expect(cert!.holderName).toBe("Perpetua Lomax");

    expect((await postJson(me.client, "/api/auth/update-user", { name: "Someone Else Entirely" })).status).toBe(200);
    const code = Buffer.from(cert!.verificationCode as unknown as Uint8Array).toString("utf8");
    const verify = await (await fetch(`${process.env.APP_URL ?? "http://127.0.0.1:3100"}/api/verify/${code}`, { headers: { "x-forwarded-for": freshIp() } })).json();
    expect(verify.holderName).toBe("Perpetua Lomax");
    const pdf = await me.client.fetch(`/api/certificates/${cert!.id}/pdf`);
    expect(pdf.status).toBe(200);
    const text = pdfText(new Uint8Array(await pdf.arrayBuffer()));
    expect(text).toContain("Perpetua Lomax");
    expect(text).not.toContain("Someone Else");
  });
});

describe("completion after grading", () => {
  it("a pass whose completion was not recorded is completed by the retry job, with its certificate and mail queued", async () => {
    const me = await person("retry");
    const a = await postJson(me.client, "/api/quiz/attempts", { module: MODULE });
    const id = a.json.id as string;
    expect((await postJson(me.client, `/api/quiz/attempts/${id}/submit`, { answers: await answersFor(id) })).json.passed).toBe(true);
    // the lessons' rows exist but the completion check after them never ran (as after a crash)
    const mod = catalog.modules.find((m) => m.slug === MODULE)!;
    const lessonIds = await db.execute(
      sql`select l.id from catalog_lesson l join catalog_module m on m.id = l.module_id where m.slug = ${MODULE} and l.retired_at is null`,
    );
    const ids = (lessonIds[0] as unknown as { id: number }[]).map((r) => r.id);
    expect(ids).toHaveLength(mod.lessons.length);
    await db.insert(lessonProgress).values(ids.map((lessonId) => ({ userId: me.id, lessonId })));
    expect(await db.select().from(moduleCompletion).where(eq(moduleCompletion.userId, me.id))).toHaveLength(0);

    const { retryPendingCompletions } = await import("@/lib/completion");
    const r1 = await retryPendingCompletions();
    expect(r1.completed).toBeGreaterThanOrEqual(1);
    const done = await db.select().from(moduleCompletion).where(eq(moduleCompletion.userId, me.id));
    expect(done).toHaveLength(1);
    expect(done[0]!.attemptId).toBe(id);
    const certs = await db.select().from(certificate).where(eq(certificate.userId, me.id));
    expect(certs.length).toBeGreaterThanOrEqual(1);
    const queued = await db.select().from(mailOutbox).where(and(eq(mailOutbox.to, me.email), eq(mailOutbox.kind, "certificate.issued")));
    expect(queued).toHaveLength(certs.length);
    // running it again changes nothing
    await retryPendingCompletions();
    expect(await db.select().from(moduleCompletion).where(eq(moduleCompletion.userId, me.id))).toHaveLength(1);
  });
});
