// Focus management and live regions, by keyboard only: after a client-side navigation the focus is
// on the new page's h1; after a failed submit it is on an error summary whose links lead to each
// field (the public-sector error summary pattern); the shared dialog keeps Tab inside and gives the
// focus back to its opener; the search result count is announced once per pause, not per key.
import { expect, test, type Page } from "@playwright/test";
import { demoByRole } from "../../db/demo";
import { focusState } from "./a11y-checks";
import { signInAs } from "./helpers";

/** Every text the live region takes on, in order (a screen reader speaks each change). */
async function recordLiveRegion(page: Page, testId: string) {
  await page.getByTestId(testId).waitFor({ state: "attached" });
  await page.evaluate((testId) => {
    const w = window as unknown as { spoken: string[] };
    w.spoken = [];
    const el = document.querySelector(`[data-testid="${testId}"]`)!;
    new MutationObserver(() => {
      const t = el.textContent ?? "";
      if (t && t !== w.spoken.at(-1)) w.spoken.push(t);
    }).observe(el, { childList: true, characterData: true, subtree: true });
  }, testId);
  return () => page.evaluate(() => (window as unknown as { spoken: string[] }).spoken);
}

test("navigation focuses the new heading; search counts are announced once per pause", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 800 });
  await signInAs(page, "dario@quillmoor.example");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Modules" }).focus();
  await page.keyboard.press("Enter");
  await page.waitForURL("**/modules");
  const h1 = page.locator("main h1");
  await expect(h1).toBeFocused();
  expect((await focusState(page)).obscuredBy).toBeNull();

  // Search: eight keystrokes, one announcement of the count once typing pauses.
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Search" }).focus();
  await page.keyboard.press("Enter");
  await page.waitForURL("**/search");
  await expect(h1).toBeFocused();
  const spoken = await recordLiveRegion(page, "search-announcement");
  await page.keyboard.press("Tab"); // the search box follows the heading
  await expect(page.getByRole("searchbox")).toBeFocused();
  await page.keyboard.type("sidewall", { delay: 80 });
  await expect(page.getByTestId("search-announcement")).toHaveText(/^\d+ results?$/, { timeout: 20_000 });
  await page.waitForTimeout(1000); // nothing more may follow
  expect(await spoken()).toHaveLength(1);
});

test("a failed sign-in submit focuses an error summary whose links lead to each field", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").focus();
  await page.keyboard.press("Enter"); // submits the empty form
  const summary = page.getByTestId("error-summary");
  await expect(summary).toBeFocused();
  await expect(summary.getByRole("heading")).toBeVisible();
  const links = summary.getByRole("link");
  await expect(links).toHaveCount(2);
  await expect(links.nth(0)).toContainText("E-mail");
  await expect(links.nth(1)).toContainText("Password");
  await page.keyboard.press("Tab");
  await expect(links.nth(0)).toBeFocused();
  await page.keyboard.press("Tab");
  await page.keyboard.press("Enter");
  await expect(page.getByLabel("Password")).toBeFocused();
  // typing a fix does not pull the focus back to the summary
  await page.keyboard.type("x");
  await expect(page.getByLabel("Password")).toBeFocused();
});

test("the shared dialog keeps Tab inside and returns the focus to its opener", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 800 });
  await signInAs(page, demoByRole("admin").email);
  await page.goto("/admin/people");
  const opener = page.getByRole("button", { name: /^Manage / }).first();
  await opener.focus();
  await page.keyboard.press("Enter");
  const dialog = page.getByRole("dialog");
  await expect(dialog).toBeVisible();
  for (let i = 0; i < 25; i++) {
    await page.keyboard.press(i % 5 === 4 ? "Shift+Tab" : "Tab");
    expect(await dialog.evaluate((d) => d.contains(document.activeElement))).toBe(true);
  }
  await page.keyboard.press("Escape");
  await expect(dialog).toBeHidden();
  await expect(opener).toBeFocused();
});
