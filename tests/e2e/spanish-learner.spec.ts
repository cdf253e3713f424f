// A Spanish-speaking learner in the browser: the language comes from the browser's Accept-Language
// before sign-in (RFC 9110 §12.5.4), from the header's English/Español switch, and then from the
// account (stored in MariaDB, so it survives sign-out and a browser with no cookies). Every page
// checked answers with <html lang="es-US"> (BCP 47: Spanish as used in the United States) and shows
// the Spanish catalog's own text (messages/es/*.json), and axe finds no WCAG 2.2 AA violations there.
import { expect, test, type Page } from "@playwright/test";
import mysql from "mysql2/promise";
import { loadCatalogFrom } from "../../lib/content/load";
import { readFileSync } from "node:fs";
import path from "node:path";
import { axeProblems } from "./a11y-checks";
import { signInAs, throwAwayLearner } from "./helpers";

/** One namespace of the message catalogs (messages/<locale>/<namespace>.json). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- catalog trees, read by key below
const catalog = (locale: string, ns: string): any => JSON.parse(readFileSync(path.join(process.cwd(), "messages", locale, `${ns}.json`), "utf8"));
const enShell = catalog("en", "shell");
const esAccount = catalog("es", "account");
const esAuth = catalog("es", "auth");
const esErrors = catalog("es", "errors");
const esLearn = catalog("es", "learn");
const esLesson = catalog("es", "lesson");
const esModules = catalog("es", "modules");
const esQuiz = catalog("es", "quiz");
const esShell = catalog("es", "shell");

const MODULE = "talking-with-homebuyers";

async function expectSpanish(page: Page, label: string) {
  await expect(page.locator("html")).toHaveAttribute("lang", "es-US");
  expect(await axeProblems(page, label)).toEqual([]);
}

async function storedLanguage(email: string): Promise<string> {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const [rows] = await conn.query("select language from user where email = ?", [email]);
    return (rows as { language: string }[])[0]!.language;
  } finally {
    await conn.end();
  }
}

test("a browser that prefers Spanish gets the sign-in page in Spanish before anyone signs in", async ({ browser }) => {
  // Chromium sends the context's locale as its Accept-Language ("es-MX"; Riser matches the primary tag)
  const context = await browser.newContext({ locale: "es-MX" });
  const page = await context.newPage();
  await page.goto("/sign-in");
  await expect(page.getByRole("heading", { level: 1, name: esAuth.signIn })).toBeVisible();
  await expect(page.getByLabel(esAuth.password, { exact: true })).toBeVisible();
  await expect(page.getByTestId("language-switch").getByRole("button", { name: "Español" })).toHaveAttribute("aria-pressed", "true");
  await expectSpanish(page, "sign-in (es)");
  // the form's own check speaks Spanish too (an empty submit: the schema's messages through the catalog)
  await page.getByRole("button", { name: esAuth.signIn, exact: true }).click();
  await expect(page.getByTestId("error-summary")).toContainText(esErrors.enterPassword);
  await context.close();
});

test("a learner switches to Español, works through the learner pages in Spanish, and the choice stays with the account", async ({ page, context }) => {
  const email = await throwAwayLearner();
  await signInAs(page, email);
  await expect(page.locator("html")).toHaveAttribute("lang", "en-US");
  await expect(page.getByRole("heading", { name: "Assigned to you" })).toBeVisible();

  // the header's switch: the account is signed in, so the choice is stored with it
  await page.getByTestId("language-switch").getByRole("button", { name: "Español" }).click();
  await expect(page.getByRole("heading", { name: esLearn.assigned })).toBeVisible();
  await expectSpanish(page, "learn (es)");
  expect(await storedLanguage(email)).toBe("es");

  await page.goto("/modules");
  await expect(page.getByRole("heading", { level: 1, name: esModules.metaTitle })).toBeVisible();
  await expect(page.getByLabel(esModules.path)).toBeVisible();
  await expectSpanish(page, "modules (es)");

  const mod = loadCatalogFrom("content").modules.find((m) => m.slug === MODULE)!;
  await page.goto(`/modules/${MODULE}`);
  await expect(page.getByRole("heading", { name: esModules.whatCompletes })).toBeVisible();
  await expect(page.getByTestId("module-main-action")).toHaveText(esModules.actions.startLessons);
  await expectSpanish(page, "module (es)");

  await page.goto(`/modules/${MODULE}/${mod.lessons[0]!.slug}`);
  await expect(page.getByRole("heading", { name: esModules.objectives })).toBeVisible();
  await expect(page.getByRole("button", { name: esLesson.markComplete })).toBeVisible();
  await expectSpanish(page, "lesson (es)");

  // the quiz page: its chrome, the runner, and the server's grade shown in Spanish
  await page.goto(`/modules/${MODULE}/quiz`);
  await expect(page.getByText(esModules.quizNumeric)).toBeVisible();
  await page.getByRole("button", { name: esQuiz.start }).click();
  await expect(page.getByTestId("quiz-progress")).toHaveText(new RegExp(`^${esQuiz.answeredOf.replace("{answered}", "0").replace("{total}", "\\d+")}$`));
  await expectSpanish(page, "quiz (es)");
  await page.getByRole("button", { name: esQuiz.submitAnswers }).click();
  await expect(page.getByRole("heading", { name: esQuiz.confirmTitle })).toBeVisible();
  await page.getByRole("button", { name: esQuiz.submitNow }).click();
  // nothing answered: 0 % and not passed (the server grades; the page words it in Spanish)
  await expect(page.getByTestId("quiz-result").getByRole("heading", { level: 2 })).toHaveText(esQuiz.notPassedScore.replace("{score}", "0"));
  await expectSpanish(page, "quiz result (es)");

  // Account shows the current choice
  await page.goto("/account");
  await expect(page.getByRole("heading", { name: esAccount.language, exact: true })).toBeVisible();
  await expect(page.getByTestId("language-form").getByRole("radio", { name: "Español" })).toBeChecked();
  await expectSpanish(page, "account (es)");

  // sign out, forget every cookie (no switch cookie left), sign in again: the account decides
  await page.getByRole("button", { name: esShell.signOut }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/account"));
  await context.clearCookies();
  await signInAs(page, email);
  await expect(page.getByRole("heading", { name: esLearn.assigned })).toBeVisible();
  await expect(page.locator("html")).toHaveAttribute("lang", "es-US");

  // and back to English from the Account setting, which is kept as well
  await page.goto("/account");
  await page.getByTestId("language-form").getByRole("radio", { name: "English" }).check();
  await page.getByTestId("language-form").getByRole("button", { name: esAccount.languageSave }).click();
  await expect(page.locator("html")).toHaveAttribute("lang", "en-US");
  await expect(page.getByRole("button", { name: enShell.signOut, exact: true })).toBeVisible();
  expect(await storedLanguage(email)).toBe("en");
});
