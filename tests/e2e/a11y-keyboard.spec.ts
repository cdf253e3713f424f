// The whole loop by keyboard alone (Tab, Shift+Tab, arrows, Enter, Space, Escape; no mouse, no
// click): a manager filters the board, opens a person, assigns a module with a due date and
// approves a sign-off; the learner signs in, opens the assigned module, reads a lesson and marks it
// complete, opens a glossary term and closes it with Escape, takes and submits the quiz, reads the
// result and downloads the certificate. At every step the focus is where it should be, shows a
// focus indicator (WCAG 2.4.7) and is not covered by a sticky bar (2.4.11).
// Fixtures that are not the behaviour under test go through the helpers: a throw-away learner,
// the learner's evidence sent through the same API the upload form uses, and the reading-time
// backdating of first opens (the server's own stamps, tests/e2e/helpers.ts).
import { expect as baseExpect, test, type Locator, type Page } from "@playwright/test";
import mysql from "mysql2/promise";
import sharp from "sharp";
import { demoByRole } from "../../db/demo";
import { loadCatalogFrom } from "../../lib/content/load";
import type { Question } from "../../lib/content/schema";
import { focusState } from "./a11y-checks";
import { backdateOpens, signInAs, throwAwayLearner } from "./helpers";

test.describe.configure({ mode: "serial", timeout: 180_000 }); // two long walks through the product
const expect = baseExpect.configure({ timeout: 30_000 }); // board and search answers on a busy 2-core machine

const MODULE = "talking-with-homebuyers";
const SKILL = "pj-cpvc-joint-and-cure"; // a pipe-and-joining skill (content/modules/pipe-and-joining)
let learner = "";
const note = `Keyboard check ${Date.now().toString(36)}`;

/** The focus is on `target`, visibly, and in view with its centre uncovered by sticky or fixed boxes. */
async function expectFocusOn(page: Page, target: Locator, step: string) {
  await expect(target, step).toBeFocused();
  const f = await focusState(page);
  expect({ step, indicator: f.indicator, obscuredBy: f.obscuredBy, inView: f.inView }).toEqual({ step, indicator: true, obscuredBy: null, inView: true });
}

/** Presses Tab (or Shift+Tab) until `target` has the focus, then checks the focus as above. */
async function tabTo(page: Page, target: Locator, step: string, { back = false, max = 80 } = {}) {
  for (let i = 0; i < max; i++) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) break;
    await page.keyboard.press(back ? "Shift+Tab" : "Tab");
  }
  await expectFocusOn(page, target, step);
}

test("a manager filters the board, opens a person, assigns a module with a date and approves a sign-off by keyboard", async ({ page, browser }) => {
  learner = await throwAwayLearner();
  // The learner's evidence, sent through the upload API from the learner's own session.
  const lctx = await browser.newContext();
  const lpage = await lctx.newPage();
  await signInAs(lpage, learner);
  const photo = await sharp({ create: { width: 640, height: 480, channels: 3, background: "#d8d2c0" } }).jpeg().toBuffer();
  const sent = await lpage.request.post("/api/sign-offs", {
    headers: { origin: new URL(lpage.url()).origin },
    multipart: { module: "pipe-and-joining", skill: SKILL, note, files: { name: "joint.jpg", mimeType: "image/jpeg", buffer: photo } },
  });
  expect(sent.status()).toBe(201);
  await lctx.close();

  await page.setViewportSize({ width: 1280, height: 800 });
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  const nav = page.getByRole("navigation", { name: "Main" });
  await tabTo(page, nav.getByRole("link", { name: "Team" }), "main menu: Team");
  await page.keyboard.press("Enter");
  await page.waitForURL("**/team");
  await expectFocusOn(page, page.locator("main h1"), "board heading after navigation");

  // Filter the board by the person's e-mail: one row.
  await tabTo(page, page.getByLabel("Name or e-mail"), "board filter: name or e-mail");
  await page.keyboard.type(learner);
  const table = page.getByRole("region", { name: "Team board table" });
  await expect(table.locator("tbody tr")).toHaveCount(1);
  const person = table.getByRole("link", { name: "Test Reader" });
  await tabTo(page, person, "the person's link in the filtered board");
  await page.keyboard.press("Enter");
  await page.waitForURL("**/team/people/**");
  await expectFocusOn(page, page.locator("main h1"), "person heading after navigation");

  // Nothing assigned yet: the person's page leads to the assign form.
  await tabTo(page, page.getByRole("link", { name: "Assign a module or a learning path" }), "assign link on the person's page");
  await page.keyboard.press("Enter");
  await page.waitForURL("**/team/assign**");
  await expectFocusOn(page, page.locator("main h1"), "assign heading after navigation");
  const form = page.getByRole("form", { name: "Assign work" });
  await tabTo(page, form.getByRole("radio", { name: "Learning path" }), "kind: learning path");
  await page.keyboard.press("ArrowRight");
  await expect(form.getByRole("radio", { name: "Module" })).toBeChecked();
  await page.keyboard.press("Tab");
  const which = form.getByRole("combobox", { name: "Module" });
  await expectFocusOn(page, which, "module select");
  await page.keyboard.type("Talking with");
  await expect(which).toHaveValue(MODULE);
  await tabTo(page, form.getByLabel("Find by name or e-mail"), "people search");
  await page.keyboard.type(learner);
  const hit = form.getByRole("list", { name: "Matching people" }).getByRole("button", { name: new RegExp(learner.replace(/[.+]/g, "\\$&")) });
  await tabTo(page, hit, "matching person");
  await page.keyboard.press("Enter");
  await expect(form.getByRole("list", { name: "Chosen people" })).toContainText("Test Reader");
  const due = new Date(Date.now() + 30 * 86_400_000);
  await tabTo(page, form.getByLabel("Due date"), "due date");
  await page.keyboard.type(`${String(due.getUTCMonth() + 1).padStart(2, "0")}${String(due.getUTCDate()).padStart(2, "0")}${due.getUTCFullYear()}`);
  await expect(form.getByLabel("Due date")).toHaveValue(due.toISOString().slice(0, 10));
  await tabTo(page, form.getByRole("button", { name: "Assign" }), "assign button");
  await page.keyboard.press("Enter");
  await expect(form.getByRole("status")).toBeVisible();

  // The sign-off queue: approve the learner's evidence.
  await tabTo(page, page.getByRole("navigation", { name: "Team pages" }).getByRole("link", { name: "Sign-offs" }), "team pages: sign-offs", { back: true });
  await page.keyboard.press("Enter");
  await page.waitForURL("**/team/sign-offs**");
  await expectFocusOn(page, page.locator("main h1"), "sign-offs heading after navigation");
  const item = page.getByTestId("sign-off-item").filter({ hasText: note });
  await tabTo(page, item.getByRole("button", { name: "Approve sign-off" }), "approve button", { max: 200 });
  await page.keyboard.press("Enter");
  await expect(item.getByText(/✓ Approved\./)).toBeVisible();
});

/** The right answers of the person's open attempt, read from the test database (as in quiz.spec.ts). */
async function rightAnswers(email: string) {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const [rows] = await conn.query(
      `select v.body from quiz_attempt_item i join quiz_question_version v on v.id = i.question_version_id
       join quiz_attempt a on a.id = i.attempt_id join user u on u.id = a.user_id
       where u.email = ? and a.status = 'open' and a.module_slug = ? order by i.position`,
      [email, MODULE],
    );
    return (rows as { body: string | Question }[]).map((r) => (typeof r.body === "string" ? (JSON.parse(r.body) as Question) : r.body));
  } finally {
    await conn.end();
  }
}

test("the learner signs in, reads, marks complete, uses the glossary, passes the quiz and downloads the certificate by keyboard", async ({ page }) => {
  expect(learner, "the manager's test creates the learner").not.toBe("");
  await page.setViewportSize({ width: 1280, height: 800 });
  // Sign in through the form (one form sign-in; the rest of the suite signs in through the API).
  await page.goto("/sign-in");
  await tabTo(page, page.getByLabel("E-mail"), "sign-in e-mail");
  await page.keyboard.type(learner);
  await page.keyboard.press("Tab");
  await expectFocusOn(page, page.getByLabel("Password"), "sign-in password");
  await page.keyboard.type("riser-demo-2026");
  await page.keyboard.press("Enter");
  await page.waitForURL("**/learn");

  // The assigned module, from "My training".
  const mod = loadCatalogFrom("content").modules.find((m) => m.slug === MODULE)!;
  await tabTo(page, page.locator("main").getByRole("link", { name: mod.meta.title }).first(), "assigned module on My training");
  await page.keyboard.press("Enter");
  await page.waitForURL(`**/modules/${MODULE}`);
  await expectFocusOn(page, page.locator("main h1"), "module heading after navigation");
  await tabTo(page, page.getByTestId("module-main-action"), "module main action");
  await page.keyboard.press("Enter");
  await page.waitForURL(`**/modules/${MODULE}/${mod.lessons[0]!.slug}`);
  await expectFocusOn(page, page.locator("main h1"), "lesson heading after navigation");

  // A glossary term: Enter opens its definition, Escape closes it and the focus stays on the term.
  const term = page.locator("main").getByRole("button", { name: /\(glossary term\)/ }).first();
  await tabTo(page, term, "glossary term");
  await page.keyboard.press("Enter");
  const definition = page.locator(`[id="${await term.getAttribute("aria-controls")}"]`);
  await expect(definition).toBeVisible();
  await page.keyboard.press("Escape");
  await expect(definition).toBeHidden();
  await expectFocusOn(page, term, "glossary term after Escape");

  // Reading time: the server's first-open stamp moved back (helpers), then the button counts.
  await backdateOpens(learner);
  await tabTo(page, page.getByRole("button", { name: "Mark this lesson complete" }), "mark complete");
  await page.keyboard.press("Enter");
  await expect(page.getByText("✓ Lesson complete")).toBeVisible();
  // The other lessons through the same API the button uses (opened first, so the server stamps them).
  for (const l of mod.lessons.slice(1)) expect((await page.request.get(`/modules/${MODULE}/${l.slug}`)).status()).toBe(200);
  await backdateOpens(learner);
  for (const l of mod.lessons.slice(1)) {
    const res = await page.request.post("/api/progress", { data: { module: MODULE, lesson: l.slug }, headers: { origin: new URL(page.url()).origin } });
    expect(res.status()).toBe(200);
  }

  // The quiz, answered by keyboard.
  await page.goto(`/modules/${MODULE}`);
  await tabTo(page, page.getByTestId("module-main-action"), "start the quiz link");
  await page.keyboard.press("Enter");
  await page.waitForURL(`**/modules/${MODULE}/quiz`);
  await tabTo(page, page.getByRole("button", { name: "Start the quiz" }), "start the quiz button");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("quiz-progress")).toHaveText(/Answered 0 of/);
  const questions = await rightAnswers(learner);
  const spoken: string[] = [];
  await page.exposeFunction("recordSaveAnnouncement", (t: string) => spoken.push(t));
  await page.getByTestId("quiz-save-announcement").evaluate((el) => {
    new MutationObserver(() => el.textContent && (window as unknown as { recordSaveAnnouncement: (t: string) => void }).recordSaveAnnouncement(el.textContent)).observe(el, { childList: true, characterData: true, subtree: true });
  });
  for (const [i, q] of questions.entries()) {
    const box = page.getByRole("listitem", { name: `Question ${i + 1} of ${questions.length}` });
    const inputs = box.locator("input");
    const step = `question ${i + 1}`;
    if (q.type === "numeric") {
      await tabTo(page, inputs.first(), step);
      await page.keyboard.type(String(q.answer));
    } else if (q.type === "multiple") {
      // options may be shown in another order than stored: match them by their text
      const shown = (await box.locator("label").allInnerTexts()).map((t) => t.trim());
      const right = q.options.filter((o) => q.correct.includes(o.id)).map((o) => o.text);
      for (const [j, text] of shown.entries()) {
        await tabTo(page, inputs.nth(j), `${step}, option ${j + 1}`);
        if (right.includes(text)) await page.keyboard.press("Space");
      }
    } else if (q.type === "single" || q.type === "truefalse") {
      const shown = (await box.locator("label").allInnerTexts()).map((t) => t.trim());
      const right = shown.indexOf(q.type === "truefalse" ? (q.correct ? "True" : "False") : q.options.find((o) => o.id === q.correct)!.text);
      expect(right, `${step}: the right answer is shown`).toBeGreaterThanOrEqual(0);
      await tabTo(page, inputs.first(), step);
      if (right === 0) await page.keyboard.press("Space");
      for (let k = 0; k < right; k++) await page.keyboard.press("ArrowDown");
      await expectFocusOn(page, inputs.nth(right), `${step}, chosen answer`);
      await expect(inputs.nth(right)).toBeChecked();
    } else throw new Error(`${step}: no keyboard recipe for a ${q.type} question in ${MODULE}`);
  }
  await expect(page.getByTestId("quiz-progress")).toHaveText(`Answered ${questions.length} of ${questions.length}`);
  await expect(page.getByTestId("quiz-save-announcement")).toHaveText("Answers saved");
  await tabTo(page, page.getByRole("button", { name: "Submit answers" }), "submit answers");
  await page.keyboard.press("Enter");
  await expectFocusOn(page, page.getByRole("button", { name: "Submit now" }), "confirmation dialog");
  await page.keyboard.press("Enter");
  const result = page.getByTestId("quiz-result");
  await expect(result).toContainText("Passed: 100%");
  await expectFocusOn(page, result.getByRole("heading", { level: 2 }).first(), "result heading");
  // one "Answers saved" for the whole quiz, not one per answer
  expect(spoken).toEqual(["Answers saved"]);

  // The certificate, from the main menu.
  await tabTo(page, page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Certificates" }), "main menu: certificates", { back: true, max: 200 });
  await page.keyboard.press("Enter");
  await page.waitForURL("**/certificates");
  await expectFocusOn(page, page.locator("main h1"), "certificates heading after navigation");
  const card = page.locator("li", { has: page.getByRole("heading", { name: mod.meta.title }) });
  const download = page.waitForEvent("download");
  await tabTo(page, card.getByRole("link", { name: /Download PDF/ }), "download the certificate");
  await page.keyboard.press("Enter");
  expect((await download).suggestedFilename()).toMatch(/^riser-certificate-RSR-\d{4}-\d{6}\.pdf$/);
});
