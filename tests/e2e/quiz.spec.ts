import { expect, test } from "@playwright/test";
import mysql from "mysql2/promise";
import { loadCatalogFrom } from "../../lib/content/load";
import type { Question } from "../../lib/content/schema";
import { backdateOpens, signInAs, throwAwayLearner } from "./helpers";

const MODULE = "talking-with-homebuyers";

/** The right option texts for the person's open attempt, read from the test database. */
async function rightAnswers(email: string) {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const [rows] = await conn.query(
      `select i.position, v.body from quiz_attempt_item i join quiz_question_version v on v.id = i.question_version_id
       join quiz_attempt a on a.id = i.attempt_id join user u on u.id = a.user_id
       where u.email = ? and a.status = 'open' and a.module_slug = ? order by i.position`,
      [email, MODULE],
    );
    return (rows as { position: number; body: string | Question }[]).map((r) => (typeof r.body === "string" ? (JSON.parse(r.body) as Question) : r.body));
  } finally {
    await conn.end();
  }
}

test("a learner completes a module's lessons, passes its quiz and sees the module complete", async ({ page }) => {
  const email = await throwAwayLearner();
  await signInAs(page, email);
  const mod = loadCatalogFrom("content").modules.find((m) => m.slug === MODULE)!;
  // Every lesson opened through its page (the server stamps the first open); right away the button
  // is refused, since the reading time has not passed.
  for (const l of mod.lessons) await page.goto(`/modules/${MODULE}/${l.slug}`);
  await page.goto(`/modules/${MODULE}/${mod.lessons[0]!.slug}`);
  await page.getByRole("button", { name: "Mark this lesson complete" }).click();
  await expect(page.getByTestId("lesson-progress").getByRole("alert")).toContainText("Keep reading");
  await backdateOpens(email);
  // The first lesson through the page, the rest through the same API the button uses.
  await page.getByRole("button", { name: "Mark this lesson complete" }).click();
  await expect(page.getByText("✓ Lesson complete")).toBeVisible();
  for (const l of mod.lessons.slice(1)) {
    const res = await page.request.post("/api/progress", { data: { module: MODULE, lesson: l.slug }, headers: { origin: new URL(page.url()).origin } });
    expect(res.status()).toBe(200);
  }
  // All lessons done: the quiz is the module page's main action (not "Continue the lessons").
  await page.goto(`/modules/${MODULE}`);
  await expect(page.getByTestId("module-main-action")).toHaveText("Start the quiz");
  await page.getByTestId("module-main-action").click();
  await expect(page).toHaveURL(new RegExp(`/modules/${MODULE}/quiz$`));
  await page.getByRole("button", { name: "Start the quiz" }).click();
  await expect(page.getByTestId("quiz-progress")).toHaveText(/Answered 0 of/);
  // An open attempt resumes: reloading the page offers "Resume the quiz", not "Start the quiz".
  await page.reload();
  await expect(page.getByRole("button", { name: "Resume the quiz" })).toBeVisible();
  await page.getByRole("button", { name: "Resume the quiz" }).click();
  await expect(page.getByTestId("quiz-progress")).toHaveText(/Answered 0 of/);
  const questions = await rightAnswers(email);
  for (const [i, q] of questions.entries()) {
    const box = page.getByRole("listitem", { name: `Question ${i + 1} of ${questions.length}` });
    if (q.type === "single") await box.getByLabel(q.options.find((o) => o.id === q.correct)!.text, { exact: true }).check();
    else if (q.type === "multiple") for (const c of q.correct) await box.getByLabel(q.options.find((o) => o.id === c)!.text, { exact: true }).check();
    else if (q.type === "truefalse") await box.getByLabel(q.correct ? "True" : "False", { exact: true }).check();
    else if (q.type === "numeric") await box.getByRole("textbox").fill(String(q.answer));
  }
  await expect(page.getByTestId("quiz-progress")).toHaveText(`Answered ${questions.length} of ${questions.length}`);
  await page.getByRole("button", { name: "Submit answers" }).click();
  await page.getByRole("button", { name: "Submit now" }).click();
  await expect(page.getByTestId("quiz-result")).toContainText("Passed: 100%");
  await page.goto(`/modules/${MODULE}`);
  await expect(page.getByTestId("module-complete")).toBeVisible();
});

test("the quiz shows one question per screen on a phone", async ({ page }) => {
  await page.setViewportSize({ width: 360, height: 780 });
  await signInAs(page, "kasimir@quillmoor.example");
  await page.goto("/modules/how-systems-work/quiz");
  // Kasimir completed this module (demo seed), so the quiz offers a new attempt, not "Start the quiz".
  await page.getByRole("button", { name: "Take the quiz again" }).click();
  await expect(page.getByText("Question 1 of", { exact: false }).first()).toBeVisible();
  await expect(page.getByText(/^Question 2 of/)).toBeHidden();
  await page.getByRole("button", { name: "Next" }).click();
  await expect(page.getByText(/^Question 2 of/)).toBeVisible();
});
