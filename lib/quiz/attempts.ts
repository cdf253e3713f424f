import "server-only";
import { log } from "@/lib/log";
import { metrics } from "@/lib/metrics";
// Over 300 lines on purpose: starting, saving, grading, viewing and listing attempts share one
// locking discipline (the attempt row FOR UPDATE) and the same row/item shapes; split, the lock
// rules would live in several files.
import { randomInt, randomUUID } from "node:crypto";
import { and, asc, desc, eq, gte, inArray, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { questionVersion, quizAttempt, quizAttemptItem, user } from "@/db/schema";
import { AccessError, canManageOrganization, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { checkAndRecordCompletion } from "@/lib/completion";
import { displayQuestion, findModule, localizedModule } from "@/lib/content";
import type { ContentLocale, Question } from "@/lib/content";
import { adoptedCode } from "@/lib/editions";
import { answerProblem, correctAnswerText, drawAttempt, editionBank, fillPrompt, gradeItem, publicItem, score, type Answer } from "./engine";
import { utcStamp } from "@/lib/dates";

/** Answers sent after the time limit plus this grace are refused; the attempt is graded as saved. */
const GRACE_MS = 15_000;

type AttemptRow = typeof quizAttempt.$inferSelect;
type ItemRow = typeof quizAttemptItem.$inferSelect & { body: Question };

function rulesOf(moduleSlug: string) {
  const mod = findModule(moduleSlug);
  if (!mod) throw new DomainError("not-found", `No module "${moduleSlug}".`);
  return mod;
}

async function loadItems(attemptId: string, tx: Tx | typeof db = db): Promise<ItemRow[]> {
  const rows = await tx
    .select({ item: quizAttemptItem, body: questionVersion.body })
    .from(quizAttemptItem)
    .innerJoin(questionVersion, eq(questionVersion.id, quizAttemptItem.questionVersionId))
    .where(eq(quizAttemptItem.attemptId, attemptId))
    .orderBy(asc(quizAttemptItem.position));
  return rows.map((r) => ({ ...r.item, body: r.body as Question }));
}

const pastDeadline = (a: AttemptRow, now = Date.now()) => a.deadlineAt !== null && now > a.deadlineAt.getTime();

/** The items with their question text in the viewer's language (grading never reads these). */
const shown = (items: ItemRow[], locale: ContentLocale): ItemRow[] => (locale === "en" ? items : items.map((i) => ({ ...i, body: displayQuestion(i.body, locale) })));

/** The attempt as the learner sees it while it is open: questions and saved answers, nothing more. */
function openView(a: AttemptRow, graded: ItemRow[], locale: ContentLocale = "en") {
  const items = shown(graded, locale);
  return {
    id: a.id,
    module: a.moduleSlug,
    status: "open" as const,
    startedAt: a.startedAt.toISOString(),
    deadlineAt: a.deadlineAt?.toISOString() ?? null,
    passMark: a.passMark,
    questions: items.map((i) => publicItem(i.position, { question: i.body, optionOrder: i.optionOrder, params: i.params })),
    answers: Object.fromEntries(items.filter((i) => i.answer !== null).map((i) => [i.position, i.answer as Answer])),
  };
}

function answerText(item: ItemRow): string {
  const q = item.body;
  const a = item.answer as Answer;
  if (a === null || a === undefined) return "No answer";
  if (q.type === "single") return q.options.find((o) => o.id === a)?.text ?? String(a);
  if (q.type === "multiple" && Array.isArray(a)) return q.options.filter((o) => a.includes(o.id)).map((o) => o.text).join("; ") || "No answer";
  if (q.type === "truefalse") return a ? "True" : "False";
  return `${a} ${"unit" in q ? q.unit : ""}`.trim();
}

/**
 * The graded attempt with per-question feedback (only after submit): right or wrong, the person's
 * answer and the explanation for every question; the keyed answer only when `reveal` (the attempt
 * passed, or the person has no attempts left in the module's period), so that a few failed
 * attempts do not hand out the question bank's key.
 */
function resultView(a: AttemptRow, graded: ItemRow[], reveal: boolean, locale: ContentLocale = "en") {
  const mod = localizedModule(a.moduleSlug, locale);
  const items = shown(graded, locale);
  return {
    id: a.id,
    module: a.moduleSlug,
    status: "graded" as const,
    startedAt: a.startedAt.toISOString(),
    submittedAt: a.submittedAt?.toISOString() ?? null,
    lateGraded: a.lateGraded,
    score: a.score,
    passed: a.passed,
    passMark: a.passMark,
    correctCount: items.filter((i) => i.correct).length,
    total: items.length,
    answersRevealed: reveal,
    feedback: items.map((i) => {
      const lesson = mod?.lessons.find((l) => l.slug === i.body.lesson);
      return {
        position: i.position,
        id: i.body.id,
        prompt: i.body.type === "parametric" ? fillPrompt(i.body.prompt, { ...i.body.fixed, ...(i.params ?? {}) }) : i.body.prompt,
        yourAnswer: answerText(i),
        correct: !!i.correct,
        correctAnswer: reveal ? correctAnswerText({ question: i.body, params: i.params }) : null,
        explanation: i.body.explanation,
        lesson: { slug: i.body.lesson, title: lesson?.meta.title ?? i.body.lesson, href: `/modules/${a.moduleSlug}/${i.body.lesson}` },
      };
    }),
  };
}

export type AttemptView = ReturnType<typeof openView> | ReturnType<typeof resultView>;

async function getAttemptRow(id: string, tx: Tx | typeof db = db, lock = false): Promise<AttemptRow> {
  const q = tx.select().from(quizAttempt).where(eq(quizAttempt.id, id));
  const [row] = lock ? await q.for("update") : await q;
  if (!row) throw new DomainError("not-found", "No such attempt.");
  return row;
}

function assertOwner(viewer: Viewer, a: AttemptRow) {
  if (a.userId !== viewer.id) throw new AccessError(403, "This attempt belongs to someone else.");
}

/**
 * Grades inside the caller's transaction (attempt row locked): one statement marks every item,
 * one updates the attempt. Returns the graded row and items (unchanged if already graded).
 */
async function gradeLocked(tx: Tx, a: AttemptRow, late: boolean, loaded?: ItemRow[]): Promise<{ row: AttemptRow; items: ItemRow[] }> {
  const items = loaded ?? (await loadItems(a.id, tx));
  if (a.status === "graded") return { row: a, items };
  const marked = items.map((i) => ({ ...i, correct: gradeItem({ question: i.body, params: i.params }, (i.answer ?? null) as Answer) }));
  const s = score(marked.filter((i) => i.correct).length, marked.length);
  const graded = { status: "graded", score: s, passed: s >= a.passMark, submittedAt: new Date(), lateGraded: late };
  if (marked.length) {
    // the items and the attempt in one statement (one round trip inside the lock)
    const cases = sql.join(marked.map((i) => sql`WHEN ${i.position} THEN ${i.correct ? 1 : 0}`), sql` `);
    await tx.execute(
      sql`UPDATE quiz_attempt a JOIN quiz_attempt_item i ON i.attempt_id = a.id SET i.correct = CASE i.position ${cases} END, a.status = ${graded.status}, a.score = ${graded.score}, a.passed = ${graded.passed}, a.submitted_at = ${graded.submittedAt}, a.late_graded = ${graded.lateGraded} WHERE a.id = ${a.id}`,
    );
  } else {
    await tx.update(quizAttempt).set(graded).where(eq(quizAttempt.id, a.id));
  }
  return { row: { ...a, ...graded, submittedAt: new Date(Math.floor(graded.submittedAt.getTime())) }, items: marked };
}

/** Starts an attempt (or resumes the open one) under the module's rules. */
/** `locale` (here and in viewAttempt/submitAttempt): the language the questions are shown in; grading is the same. */
export async function startAttempt(viewer: Viewer, moduleSlug: string, locale: ContentLocale = "en"): Promise<AttemptView> {
  const mod = rulesOf(moduleSlug);
  const rules = mod.meta.quiz;
  const now = Date.now();
  // the organization's default adopted edition: only questions that hold in it are drawn
  const edition = (await adoptedCode(viewer.organizationId))?.edition ?? null;
  let expiredToComplete = false;
  const id = await db.transaction(async (tx) => {
    // One start at a time per person: lock their user row.
    await tx.select({ id: user.id }).from(user).where(eq(user.id, viewer.id)).for("update");
    const open = await tx
      .select()
      .from(quizAttempt)
      .where(and(eq(quizAttempt.userId, viewer.id), eq(quizAttempt.moduleSlug, moduleSlug), eq(quizAttempt.status, "open")));
    for (const a of open) {
      if (!pastDeadline(a, now)) return a.id;
      const g = await gradeLocked(tx, a, true);
      if (g.row.passed) expiredToComplete = true;
    }
    const since = new Date(now - rules.periodHours * 3_600_000);
    const recent = await tx
      .select({ startedAt: quizAttempt.startedAt, submittedAt: quizAttempt.submittedAt })
      .from(quizAttempt)
      .where(and(eq(quizAttempt.userId, viewer.id), eq(quizAttempt.moduleSlug, moduleSlug), gte(quizAttempt.startedAt, since)))
      .orderBy(asc(quizAttempt.startedAt));
    if (recent.length >= rules.attemptsPerPeriod) {
      const next = new Date(recent[0]!.startedAt.getTime() + rules.periodHours * 3_600_000);
      throw new DomainError("conflict", `You have used ${rules.attemptsPerPeriod} attempts in ${rules.periodHours} hours. Your next attempt opens at ${utcStamp(next)}.`);
    }
    const last = recent.at(-1)?.submittedAt;
    if (last && rules.waitMinutes > 0 && now < last.getTime() + rules.waitMinutes * 60_000) {
      const mins = Math.ceil((last.getTime() + rules.waitMinutes * 60_000 - now) / 60_000);
      throw new DomainError("conflict", `Review the lessons first: the next attempt opens in ${mins} minute${mins === 1 ? "" : "s"}.`);
    }
    const versions = await tx
      .select({ id: questionVersion.id, questionId: questionVersion.questionId })
      .from(questionVersion)
      .where(and(eq(questionVersion.moduleSlug, moduleSlug), isNull(questionVersion.retiredAt)));
    const versionOf = new Map(versions.map((v) => [v.questionId, v.id]));
    const bank = editionBank(mod.questions.filter((q) => versionOf.has(q.id)), edition);
    if (bank.length === 0) throw new DomainError("conflict", "This module's quiz is not ready yet.");
    const seed = randomInt(0, 2 ** 31);
    const drawn = drawAttempt(bank, rules.questionsPerAttempt, seed);
    const attemptId = randomUUID();
    await tx.insert(quizAttempt).values({
      id: attemptId,
      userId: viewer.id,
      organizationId: viewer.organizationId,
      moduleSlug,
      seed,
      status: "open",
      startedAt: new Date(now),
      deadlineAt: rules.timeLimitMinutes ? new Date(now + rules.timeLimitMinutes * 60_000) : null,
      passMark: mod.meta.passMark,
      edition,
    });
    await tx.insert(quizAttemptItem).values(
      drawn.map((d, i) => ({ attemptId, position: i + 1, questionVersionId: versionOf.get(d.question.id)!, optionOrder: d.optionOrder, params: d.params, answer: null })),
    );
    return attemptId;
  });
  if (expiredToComplete) await completeAfterGrading(viewer.id, moduleSlug);
  return viewAttempt(viewer, id, locale);
}

/** An attempt as its viewer may see it: open → questions only; graded → results. */
export async function viewAttempt(viewer: Viewer, id: string, locale: ContentLocale = "en"): Promise<AttemptView> {
  const a = await getAttemptRow(id);
  if (a.userId !== viewer.id && !canManageOrganization(viewer, a.organizationId)) {
    throw new AccessError(403, "This attempt belongs to someone else.");
  }
  const items = await loadItems(id);
  if (a.status === "graded") return resultView(a, items, a.passed === true || (await attemptsLeft(a.userId, a.moduleSlug)) === 0, locale);
  if (a.userId !== viewer.id) return { ...openView(a, []), questions: [], answers: {} };
  return openView(a, items, locale);
}

/** Attempts the person may still start in the module's current period (its attempt limit). */
async function attemptsLeft(userId: string, moduleSlug: string, now = Date.now()): Promise<number> {
  const rules = rulesOf(moduleSlug).meta.quiz;
  const since = new Date(now - rules.periodHours * 3_600_000);
  const [row] = await db
    .select({ n: sql<number>`count(*)` })
    .from(quizAttempt)
    .where(and(eq(quizAttempt.userId, userId), eq(quizAttempt.moduleSlug, moduleSlug), gte(quizAttempt.startedAt, since)));
  return Math.max(0, rules.attemptsPerPeriod - Number(row?.n ?? 0));
}

export type AnswerInput = { position: number; answer: Answer };

function validateAnswers(items: ItemRow[], answers: AnswerInput[]) {
  const byPos = new Map(items.map((i) => [i.position, i]));
  const fieldErrors: Record<string, string[]> = {};
  for (const a of answers) {
    const item = byPos.get(a.position);
    if (!item) {
      fieldErrors[`answers.${a.position}`] = ["this question is not part of the attempt"];
      continue;
    }
    const problem = answerProblem({ question: item.body, optionOrder: item.optionOrder }, a.answer);
    if (problem) fieldErrors[`answers.${a.position}`] = [problem];
  }
  if (Object.keys(fieldErrors).length) throw new DomainError("invalid", "Some answers do not fit their questions; nothing was saved.", fieldErrors);
}

/** Saves answers as the person goes; all or nothing. */
export async function saveAnswers(viewer: Viewer, id: string, answers: AnswerInput[]): Promise<{ saved: number }> {
  let gradedLate = false;
  const result = await db.transaction(async (tx) => {
    const a = await getAttemptRow(id, tx, true);
    assertOwner(viewer, a);
    if (a.status === "graded") throw new DomainError("conflict", "This attempt is already submitted.");
    if (a.deadlineAt && Date.now() > a.deadlineAt.getTime() + GRACE_MS) {
      await gradeLocked(tx, a, true);
      gradedLate = true;
      return { saved: 0 };
    }
    const items = await loadItems(id, tx);
    validateAnswers(items, answers);
    await writeAnswers(tx, id, answers);
    return { saved: answers.length };
  });
  if (gradedLate) {
    await afterGrading(viewer.id, id);
    throw new DomainError("conflict", "Time is up: the attempt was graded with the answers saved before the limit.");
  }
  return result;
}

async function afterGrading(userId: string, id: string) {
  const a = await getAttemptRow(id);
  if (a.passed) await completeAfterGrading(userId, a.moduleSlug);
}

/**
 * Grades the attempt on the server, once: the attempt row is locked, so concurrent or repeated
 * submits wait for the first and then return the same stored result.
 */
export async function submitAttempt(viewer: Viewer, id: string, finalAnswers: AnswerInput[] = [], locale: ContentLocale = "en"): Promise<AttemptView & { completionPending?: string }> {
  let refusedLate = false;
  const graded = await db.transaction(async (tx) => {
    const a = await getAttemptRow(id, tx, true);
    assertOwner(viewer, a);
    if (a.status === "graded") return null; // a repeat: answer from the stored result below
    const late = a.deadlineAt !== null && Date.now() > a.deadlineAt.getTime() + GRACE_MS;
    let items = await loadItems(id, tx);
    if (finalAnswers.length && !late) {
      validateAnswers(items, finalAnswers);
      await writeAnswers(tx, id, finalAnswers);
      const byPos = new Map(finalAnswers.map((f) => [f.position, f.answer]));
      items = items.map((i) => (byPos.has(i.position) ? { ...i, answer: byPos.get(i.position) ?? null } : i));
    }
    if (late && finalAnswers.length) refusedLate = true;
    return gradeLocked(tx, a, late, items);
  });
  if (graded) {
    metrics.quizSubmits.inc({ result: graded.row.passed ? "passed" : "failed" });
    log().info({ attemptId: id, module: graded.row.moduleSlug, score: graded.row.score, passed: graded.row.passed }, "quiz attempt graded");
  }
  const completion = graded?.row.passed ? await completeAfterGrading(viewer.id, graded.row.moduleSlug) : null;
  if (refusedLate) throw new DomainError("conflict", "Time is up: the attempt was graded with the answers saved before the limit. See your results.");
  // A repeat reads the stored rows; the first grading answers from the rows it has just written
  // (the same values, so every response is identical) instead of reading them again.
  const view = graded
    ? resultView(graded.row, graded.items, graded.row.passed === true || (await attemptsLeft(graded.row.userId, graded.row.moduleSlug)) === 0, locale)
    : await viewAttempt(viewer, id, locale);
  return completion === "pending" ? { ...view, completionPending: COMPLETION_PENDING } : view;
}

const COMPLETION_PENDING =
  "Your result is saved. Recording the module's completion did not finish just now; it is retried automatically and your certificate follows by e-mail.";

/**
 * The grade is committed before this runs: a failure here must not turn a saved pass into an error.
 * It is reported in the answer and retried by the "completion-retry" job (lib/completion.ts).
 */
async function completeAfterGrading(userId: string, moduleSlug: string): Promise<"done" | "pending"> {
  try {
    await checkAndRecordCompletion(userId, moduleSlug);
    return "done";
  } catch (err) {
    log().error({ err, module: moduleSlug, personId: userId }, "completion failed after grading; the completion-retry job records it");
    return "pending";
  }
}

/** Writes answers with one statement. */
async function writeAnswers(tx: Tx, id: string, answers: AnswerInput[]) {
  if (!answers.length) return;
  const cases = sql.join(answers.map((a) => sql`WHEN ${a.position} THEN ${a.answer === null ? null : JSON.stringify(a.answer)}`), sql` `);
  const positions = sql.join(answers.map((a) => sql`${a.position}`), sql`, `);
  await tx.execute(sql`UPDATE quiz_attempt_item SET answer = CASE position ${cases} END WHERE attempt_id = ${id} AND position IN (${positions})`);
}

/** Attempts of one person (own, or a managed person's), newest first. */
export async function listAttempts(viewer: Viewer, personId: string, moduleSlug?: string) {
  if (personId !== viewer.id) {
    const [p] = await db.select({ org: user.organizationId }).from(user).where(eq(user.id, personId));
    if (!p) throw new DomainError("not-found", "No such person.");
    if (!canManageOrganization(viewer, p.org)) throw new AccessError(403, "You cannot see this person's attempts.");
  }
  const rows = await db
    .select({ id: quizAttempt.id, module: quizAttempt.moduleSlug, status: quizAttempt.status, startedAt: quizAttempt.startedAt, submittedAt: quizAttempt.submittedAt, score: quizAttempt.score, passed: quizAttempt.passed })
    .from(quizAttempt)
    .where(and(eq(quizAttempt.userId, personId), moduleSlug ? eq(quizAttempt.moduleSlug, moduleSlug) : undefined))
    .orderBy(desc(quizAttempt.startedAt))
    .limit(200);
  return rows;
}

/** Attempts of everyone in an organization (the team board's source), managers and admins only. */
export async function listOrganizationAttempts(viewer: Viewer, organizationId: string, moduleSlug?: string) {
  if (!canManageOrganization(viewer, organizationId)) throw new AccessError(403, "That belongs to another organization.");
  return db
    .select({ id: quizAttempt.id, userId: quizAttempt.userId, module: quizAttempt.moduleSlug, status: quizAttempt.status, submittedAt: quizAttempt.submittedAt, score: quizAttempt.score, passed: quizAttempt.passed })
    .from(quizAttempt)
    .where(and(eq(quizAttempt.organizationId, organizationId), moduleSlug ? eq(quizAttempt.moduleSlug, moduleSlug) : undefined, inArray(quizAttempt.status, ["open", "graded"])))
    .orderBy(desc(quizAttempt.startedAt))
    .limit(5000);
}
