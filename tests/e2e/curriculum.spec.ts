import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { backdateOpens, signInAs, throwAwayLearner } from "./helpers";

test("a learner opens a lesson, marks it complete after the reading time and sees the module progress change", async ({ page }) => {
  const email = await throwAwayLearner();
  await signInAs(page, email);
  await page.goto("/modules/freeze-protection");
  await expect(page.getByTestId("module-lesson-count")).toHaveText(/0 of 4 done/);
  await page.getByRole("link", { name: "Where homes freeze" }).first().click();
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  await expect(page.getByTestId("module-progress")).toHaveText(/0 of 4/);
  // right after opening: refused, with the reading time still to go
  await page.getByRole("button", { name: "Mark this lesson complete" }).click();
  await expect(page.getByTestId("lesson-progress").getByRole("alert")).toContainText("Keep reading");
  await expect(page.getByTestId("module-progress")).toHaveText(/0 of 4/);
  // the server's own first-open stamp moved back, as if the reading time had passed
  await backdateOpens(email);
  await page.getByRole("button", { name: "Mark this lesson complete" }).click();
  await expect(page.getByText("✓ Lesson complete")).toBeVisible();
  await expect(page.getByTestId("module-progress")).toHaveText(/1 of 4/);
  await page.goto("/modules/freeze-protection");
  await expect(page.getByTestId("module-lesson-count")).toHaveText(/1 of 4 done/);
});

test("axe finds no violations on catalog, lesson, card and search pages", async ({ page }) => {
  await signInAs(page, "wendell@quillmoor.example");
  for (const url of ["/modules", "/modules/hydraulics-and-permits/flow-pressure-and-k-factor", "/reference/sidewall-placement", "/search?q=antifreeze", "/"]) {
    await page.goto(url);
    if (url.startsWith("/search")) await expect(page.locator("ol li").first()).toBeVisible();
    const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
    expect(results.violations.map((v) => `${url}: ${v.id} (${v.nodes.length}) ${v.nodes[0]?.target}`)).toEqual([]);
  }
});

test("the lesson page works at phone width", async ({ page }) => {
  await page.setViewportSize({ width: 360, height: 780 });
  await signInAs(page, "wendell@quillmoor.example");
  await page.goto("/modules/sprinklers-and-coverage/sprinkler-types");
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(1);
  await page.getByRole("button", { name: "Menu" }).click();
  await expect(page.getByTestId("main-nav").getByRole("link", { name: "Modules" })).toBeVisible();
});
