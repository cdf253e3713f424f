// Refreshers after a material content change: the catalog sync records a change marked material
// (revision raised with a "what changed" line) and flags exactly the people who completed the
// module before it; a non-material edit flags nobody; old attempts keep the question versions
// they used; the home page, the lesson, the board and the CSV show it; a passed refresher clears it
// and the certificate stays valid.
import path from "node:path";
import { and, eq, inArray, isNull } from "drizzle-orm";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate, materialChange, questionVersion, quizAttemptItem, refresherCompletion } from "@/db/schema";
import { syncCatalog } from "@/lib/catalog";
import { refresherCountFor } from "@/lib/refreshers";
import { sendManagerDigests } from "@/lib/team/reminders";
import { loadCatalogFrom, type Catalog } from "@/lib/content/load";
import type { Question } from "@/lib/content/schema";
import { clientOf, completedWithCertificate, completion, daysFromNow, fixtureOrg, fixturePerson, gradedAttempt, type FixturePerson } from "../helpers/fixtures";
import { getJson, postJson, waitForMail, type Client } from "../helpers/http";
import { rightAnswer, wrongAnswer } from "../helpers/quiz";

const MODULE = "freeze-protection";
const LESSON = "antifreeze-limits";
const QUESTION = "fp-antifreeze-listed-only";
const LESSON_CHANGE = "Antifreeze rules now shown for each NFPA 13D edition (test change)";
const QUESTION_CHANGE = "Listed-only question now names the 2012 cut-off (test change)";

const original = loadCatalogFrom(path.resolve("content"));
/** The content as an author would leave it after an edit; `material` adds revision + changed. */
function edited(material: boolean, promptTail: string): Catalog {
  const c = structuredClone(original);
  const mod = c.modules.find((m) => m.slug === MODULE)!;
  const lesson = mod.lessons.find((l) => l.slug === LESSON)!;
  const q = mod.questions.find((x) => x.id === QUESTION)!;
  for (const x of mod.questions) if (x.id === QUESTION || x.id === drawnId) x.prompt = `${x.prompt} ${promptTail}`;
  if (material) {
    lesson.meta = { ...lesson.meta, revision: 2, changed: LESSON_CHANGE };
    Object.assign(q, { revision: 2, changed: QUESTION_CHANGE });
  }
  return c;
}

let org: { id: string; teams: Record<string, string> };
let before: FixturePerson, never: FixturePerson, after: FixturePerson;
let mgr: Client, beforeClient: Client, neverClient: Client, afterClient: Client;
let oldAttemptId = "";
let managerEmail = "";
let oldVersionId = 0;
/** the question of the earlier attempt's first item: edited too, so its version changes under the attempt */
let drawnId = "";

beforeAll(async () => {
  org = await fixtureOrg("Refresher Co", { teams: ["Crew"] });
  const manager = await fixturePerson(org, { name: "Mira Manager", role: "manager" });
  managerEmail = manager.email;
  before = await fixturePerson(org, { name: "Bram Before", teamId: org.teams.Crew! });
  never = await fixturePerson(org, { name: "Nell Never", teamId: org.teams.Crew! });
  after = await fixturePerson(org, { name: "Ada After", teamId: org.teams.Crew! });
  await completedWithCertificate(before, MODULE, { completedAt: daysFromNow(-30), expiresAt: daysFromNow(300) });
  [mgr, beforeClient, neverClient, afterClient] = await Promise.all([clientOf(manager.id), clientOf(before.id), clientOf(never.id), clientOf(after.id)]);
  // an attempt drawn before the change (the question version it used must survive the sync)
  const start = await postJson(beforeClient, "/api/quiz/attempts", { module: MODULE });
  expect(start.status, start.text).toBeLessThan(300);
  oldAttemptId = start.json.id as string;
  const [first] = await db
    .select({ versionId: quizAttemptItem.questionVersionId, questionId: questionVersion.questionId })
    .from(quizAttemptItem)
    .innerJoin(questionVersion, eq(questionVersion.id, quizAttemptItem.questionVersionId))
    .where(and(eq(quizAttemptItem.attemptId, oldAttemptId), eq(quizAttemptItem.position, 1)));
  oldVersionId = first!.versionId;
  drawnId = first!.questionId;
}, 60_000);

afterAll(async () => {
  await db.delete(materialChange).where(inArray(materialChange.whatChanged, [LESSON_CHANGE, QUESTION_CHANGE]));
  await syncCatalog(original);
  await pool.end();
});

const refreshersOf = async (c: Client) => (await getJson<{ refreshers: { module: string; lessons: { slug: string; whatChanged: string }[]; questionChanges: string[]; questions: { position: number; id: string }[] }[] }>(c, "/api/refreshers")).body.refreshers;

describe("a non-material edit", () => {
  it("adds a question version but records no change and flags nobody", async () => {
    const counts = await syncCatalog(edited(false, "(wording)"));
    expect(counts.materialChanges).toBe(0);
    expect(counts.questionVersionsAdded).toBeGreaterThanOrEqual(1);
    expect(await refreshersOf(beforeClient)).toEqual([]);
  });
});

describe("a material change", () => {
  it("is recorded once by the sync, and re-syncing does not record it again", async () => {
    const first = await syncCatalog(edited(true, "(cut-off named)"));
    expect(first.materialChanges).toBe(2);
    expect((await syncCatalog(edited(true, "(cut-off named)"))).materialChanges).toBe(0);
    // someone who completes after the change owes nothing
    await completion(after.id, MODULE, await gradedAttempt(after, MODULE, true, new Date()), new Date());
  });

  it("keeps the earlier attempt on the question version it used", async () => {
    const [item] = await db.select().from(quizAttemptItem).where(and(eq(quizAttemptItem.attemptId, oldAttemptId), eq(quizAttemptItem.position, 1)));
    expect(item!.questionVersionId).toBe(oldVersionId);
    const [old] = await db.select().from(questionVersion).where(eq(questionVersion.id, oldVersionId));
    expect(old!.retiredAt).not.toBeNull();
    expect((old!.body as Question).prompt).not.toContain("(cut-off named)");
    const [live] = await db.select().from(questionVersion).where(and(eq(questionVersion.questionId, drawnId), isNull(questionVersion.retiredAt)));
    expect(live!.version).toBeGreaterThan(old!.version);
    expect((live!.body as Question).prompt).toContain("(cut-off named)");
  });

  it("flags exactly the person who completed before it", async () => {
    const due = await refreshersOf(beforeClient);
    expect(due.map((r) => r.module)).toEqual([MODULE]);
    expect(due[0]!.lessons).toEqual([expect.objectContaining({ slug: LESSON, whatChanged: LESSON_CHANGE })]);
    expect(due[0]!.questionChanges).toEqual([QUESTION_CHANGE]);
    expect(due[0]!.questions.map((q) => q.id)).toEqual([QUESTION]);
    expect(await refreshersOf(neverClient)).toEqual([]);
    expect(await refreshersOf(afterClient)).toEqual([]);
    expect(await refresherCountFor(org.id)).toBe(1); // the managers' weekly digest line
  });

  it("reaches the managers' weekly digest", async () => {
    // a week of its own, far from the weeks the reminder tests claim
    await sendManagerDigests({ now: daysFromNow(7 * 40) });
    const digest = await waitForMail(managerEmail, /^Weekly training summary for Refresher Co/);
    expect(digest.text).toContain("People with a refresher due after a lesson changed: 1\n");
  });

  it("shows on the home page, on the changed lesson, on the board and in the CSV", async () => {
    // what the page shows, without the scripts (they carry the message catalogs, "Refresher due" included)
    const shown = async (c: typeof beforeClient, url: string) => (await (await c.fetch(url)).text()).replace(/<script\b[\s\S]*?<\/script>/g, "");
    const home = await shown(beforeClient, "/learn");
    expect(home).toContain("Refresher due");
    expect(home).toContain(LESSON_CHANGE);
    expect(await shown(afterClient, "/learn")).not.toContain("Refresher due");
    const lesson = await (await beforeClient.fetch(`/modules/${MODULE}/${LESSON}`)).text();
    expect(lesson).toContain("Changed since you completed it");
    // the change itself is highlighted at the top of the lesson
    expect(lesson).toMatch(new RegExp(`data-testid="lesson-change"[^>]*>[\\s\\S]*?<mark[^>]*>${LESSON_CHANGE.replace(/[()]/g, "\\$&")}</mark>`));
    expect(await (await afterClient.fetch(`/modules/${MODULE}/${LESSON}`)).text()).not.toContain('data-testid="lesson-change"');
    const board = await getJson<{ rows: { name: string; cells: Record<string, { refresherDue: boolean }> }[] }>(mgr, `/api/team/board?module=${MODULE}&pageSize=50`);
    const flags = Object.fromEntries(board.body.rows.map((r) => [r.name, r.cells[MODULE]?.refresherDue]));
    expect([flags["Bram Before"], flags["Nell Never"], flags["Ada After"]]).toEqual([true, false, false]);
    const csv = Papa.parse<string[]>((await (await mgr.fetch(`/api/team/board.csv?module=${MODULE}`)).text()).replace(/^\uFEFF/, "").trim()).data;
    expect(csv.find((r) => r[0] === "Bram Before")![3]).toMatch(/refresher due/);
    expect(csv.find((r) => r[0] === "Ada After")![3]).not.toMatch(/refresher due/);
  });

  it("refuses a refresher nobody owes and bad answers with a 4xx", async () => {
    expect((await postJson(neverClient, "/api/refreshers", { module: MODULE, answers: [] })).status).toBe(409);
    expect((await postJson(beforeClient, "/api/refreshers", { answers: [] })).status).toBe(400);
    expect((await postJson(beforeClient, "/api/refreshers", { module: MODULE, answers: [{ position: 1, answer: "z" }] })).status).toBe(400);
    expect((await postJson(beforeClient, "/api/refreshers", { module: "no-such-module", answers: [] })).status).toBe(404);
  });

  it("a failed refresher keeps the flag; a passed one clears it and the certificate stays valid", async () => {
    const q = edited(true, "(cut-off named)").modules.find((m) => m.slug === MODULE)!.questions.find((x) => x.id === QUESTION)!;
    const fail = await postJson(beforeClient, "/api/refreshers", { module: MODULE, answers: [{ position: 1, answer: wrongAnswer(q) }] });
    expect(fail.json.passed, fail.text).toBe(false);
    expect(await refreshersOf(beforeClient)).toHaveLength(1);
    const pass = await postJson(beforeClient, "/api/refreshers", { module: MODULE, answers: [{ position: 1, answer: rightAnswer(q, null) }] });
    expect(pass.json, pass.text).toMatchObject({ passed: true, score: 100 });
    expect(await refreshersOf(beforeClient)).toEqual([]);
    expect(await db.select().from(refresherCompletion).where(eq(refresherCompletion.userId, before.id))).toHaveLength(1);
    const [cert] = await db.select().from(certificate).where(eq(certificate.userId, before.id));
    expect(cert!.revokedAt).toBeNull();
    expect(cert!.expiresAt.getTime()).toBeGreaterThan(Date.now());
    const board = await getJson<{ rows: { name: string; cells: Record<string, { refresherDue: boolean; status: string }> }[] }>(mgr, `/api/team/board?module=${MODULE}&pageSize=50`);
    const bram = board.body.rows.find((r) => r.name === "Bram Before")!;
    expect(bram.cells[MODULE]).toMatchObject({ refresherDue: false });
  });
});
