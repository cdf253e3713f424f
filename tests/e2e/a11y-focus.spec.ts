// Focus management and live regions, by keyboard only: after a client-side navigation the focus is
// on the new page's h1; after a failed submit it is on an error summary whose links lead to each
// field (the public-sector error summary pattern); the shared dialog keeps Tab inside and gives the
// focus back to its opener; the search result count is announced once per pause, not per key; the
// evidence upload's progress is announced in quarter steps, each once. The heading focus and the
// error summary once more in Spanish (html lang es-US, the Spanish catalog's words).
import { readFileSync } from "node:fs";
import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import sharp from "sharp";
import { demoByRole } from "../../db/demo";
import { focusState } from "./a11y-checks";
import { signInAs, throwAwayLearner } from "./helpers";

/** One namespace of the message catalogs (messages/<locale>/<namespace>.json). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- catalog trees, read by key below
const catalog = (locale: string, ns: string): any => JSON.parse(readFileSync(path.join(process.cwd(), "messages", locale, `${ns}.json`), "utf8"));

/** Every text the live region takes on, in order (a screen reader speaks each change). */
async function recordLiveRegion(page: Page, selector: string) {
  await page.locator(selector).waitFor({ state: "attached" });
  await page.evaluate((selector) => {
    const w = window as unknown as { spoken: string[] };
    w.spoken = [];
    const el = document.querySelector(selector)!;
    new MutationObserver(() => {
      const t = el.textContent ?? "";
      if (t && t !== w.spoken.at(-1)) w.spoken.push(t);
    }).observe(el, { childList: true, characterData: true, subtree: true });
  }, selector);
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
  const spoken = await recordLiveRegion(page, '[data-testid="search-announcement"]');
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

test("in Spanish: a failed sign-in focuses the error summary, and navigation focuses the new heading", async ({ browser }) => {
  const esAuth = catalog("es", "auth");
  const esShell = catalog("es", "shell");
  // a browser that prefers Spanish, signed out (RFC 9110 Accept-Language, as Chromium sends the context's locale)
  const context = await browser.newContext({ locale: "es-MX", viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  try {
    await page.goto("/sign-in");
    await expect(page.locator("html")).toHaveAttribute("lang", "es-US");
    await page.getByLabel(esAuth.email).focus();
    await page.keyboard.press("Enter");
    const summary = page.getByTestId("error-summary");
    await expect(summary).toBeFocused();
    const links = summary.getByRole("link");
    await expect(links).toHaveCount(2);
    await expect(links.nth(0)).toContainText(esAuth.email);
    await expect(links.nth(1)).toContainText(esAuth.password);
    await page.keyboard.press("Tab");
    await page.keyboard.press("Tab");
    await page.keyboard.press("Enter");
    await expect(page.getByLabel(esAuth.password, { exact: true })).toBeFocused();

    // a learner whose account reads in Spanish moves through the main menu by keyboard
    await signInAs(page, await throwAwayLearner());
    const chosen = await page.request.post("/api/account/language", { data: { language: "es" }, headers: { origin: new URL(page.url()).origin } });
    expect(chosen.status()).toBe(200);
    await page.reload();
    await expect(page.locator("html")).toHaveAttribute("lang", "es-US");
    await page.getByRole("navigation", { name: esShell.mainNav }).getByRole("link", { name: esShell.nav.modules }).focus();
    await page.keyboard.press("Enter");
    await page.waitForURL("**/modules");
    await expect(page.locator("main h1")).toBeFocused();
    const f = await focusState(page);
    expect({ indicator: f.indicator, obscuredBy: f.obscuredBy, inView: f.inView }).toEqual({ indicator: true, obscuredBy: null, inView: true });
  } finally {
    await context.close();
  }
});

test("the evidence upload announces its progress in quarter steps, each once, not per progress event", async ({ page, context }) => {
  test.setTimeout(90_000);
  const en = catalog("en", "signoffs");
  await signInAs(page, await throwAwayLearner());
  await page.goto("/modules/pipe-and-joining/sign-offs");
  const skill = page.getByTestId("skill-pj-cpvc-joint-and-cure");
  // a noisy photo (about 1.5 MB as JPEG) over an upload held to 256 KB/s by Chromium's own network
  // throttling (DevTools protocol Network.emulateNetworkConditions): a few seconds of progress events
  const photo = await sharp({ create: { width: 1600, height: 1200, channels: 3, background: "#808080", noise: { type: "gaussian", mean: 128, sigma: 60 } } }).jpeg({ quality: 92 }).toBuffer();
  expect(photo.byteLength).toBeGreaterThan(1024 * 1024);
  await skill.getByLabel(en.files).setInputFiles({ name: "joint.jpg", mimeType: "image/jpeg", buffer: photo });
  const spoken = await recordLiveRegion(page, '[data-testid="skill-pj-cpvc-joint-and-cure"] [data-testid="upload-announcement"]');
  const cdp = await context.newCDPSession(page);
  await cdp.send("Network.enable");
  await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 256 * 1024 });
  await skill.getByRole("button", { name: en.send }).focus();
  await page.keyboard.press("Enter");
  await expect(skill.getByText(en.status.submitted, { exact: true })).toBeVisible({ timeout: 60_000 });
  await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
  const said = await spoken();
  // The visible percentage changed with every progress event; the live region spoke at most the
  // five quarter steps (messages/en/signoffs.json "progress"), rising, never the same one twice.
  const steps = said.map((t) => Number(/^(\d+)%/.exec(t)?.[1]));
  expect(said.length).toBeGreaterThanOrEqual(1);
  expect(said.length).toBeLessThanOrEqual(5);
  for (const [i, pct] of steps.entries()) {
    expect(said[i]).toBe(en.progress.replace("{pct}", String(pct)));
    expect(pct % 25).toBe(0);
    if (i) expect(pct).toBeGreaterThan(steps[i - 1]!);
  }
});
