import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { demoByRole } from "../../db/demo";
import { signInAs } from "./helpers";

// Kasimir Dunleavy holds the demo "New installer" path certificate (lib/certificates/seed.ts).
const KASIMIR = "kasimir@quillmoor.example";

async function axe(page: Page, label: string) {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  expect(results.violations.map((v) => `${label}: ${v.id} (${v.nodes.length}) ${v.nodes[0]?.target}`)).toEqual([]);
}

test("a learner sees their certificates, downloads one, and the public check shows it valid", async ({ page, browser }) => {
  await signInAs(page, KASIMIR);
  await page.goto("/certificates");
  await expect(page.getByRole("heading", { level: 1, name: "Certificates" })).toBeVisible();
  const card = page.locator("li", { has: page.getByRole("heading", { name: "New installer" }) });
  await expect(card.getByTestId("certificate-status")).toHaveText(/Valid/);
  await expect(page.getByTestId("certificates-summary")).toContainText("7 valid certificates");
  await axe(page, "/certificates");

  const download = page.waitForEvent("download");
  await card.getByRole("link", { name: /Download PDF/ }).click();
  expect((await download).suggestedFilename()).toMatch(/^riser-certificate-RSR-\d{4}-\d{6}\.pdf$/);

  const link = await card.getByTestId("share-link").inputValue();
  expect(link).toMatch(/\/verify\/[0-9A-HJKMNP-TV-Z]{28}$/); // new codes: Crockford base32, no trailing punctuation
  // the verifier has no account: a fresh browser context without cookies
  const verifier = await browser.newContext();
  const pub = await verifier.newPage();
  await pub.goto(link);
  await expect(pub.getByTestId("certificate-status")).toHaveText(/Valid/);
  await expect(pub.getByTestId("verify-holder")).toHaveText("Kasimir Dunleavy");
  await expect(pub.getByRole("heading", { level: 1, name: "New installer" })).toBeVisible();
  await axe(pub, "/verify/<code>");
  await verifier.close();
});

test("the check page takes a typed code, explains a malformed one, and shows not found for an unknown one", async ({ page }) => {
  await page.goto("/verify");
  await page.getByLabel("Verification code").fill("not-a-code");
  await page.getByRole("button", { name: "Check certificate" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "That is neither a Riser verification code nor a certificate serial" })).toBeVisible(); // the field's own error (the error summary repeats it)
  await page.getByLabel("Verification code").fill("AAAAAAAAAAAAAAAAAAAAAAAA");
  await page.getByRole("button", { name: "Check certificate" }).click();
  await expect(page.getByRole("heading", { name: "No certificate matches this code" })).toBeVisible();
  await axe(page, "/verify/<unknown>");
});

test("certificate pages fit a phone screen", async ({ page }) => {
  await page.setViewportSize({ width: 360, height: 780 });
  await signInAs(page, KASIMIR);
  await page.goto("/certificates");
  const link = await page.getByTestId("share-link").first().inputValue();
  for (const url of ["/certificates", new URL(link).pathname]) {
    await page.goto(url);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow, url).toBeLessThanOrEqual(1);
  }
});

test("a manager's revoke form insists on a reason before anything is sent", async ({ page }) => {
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  await page.goto("/certificates");
  const row = page.locator("li", { hasText: "Rafaela Quint" }).first();
  await row.getByRole("button", { name: /Revoke/ }).click();
  await row.getByRole("button", { name: "Revoke certificate" }).click();
  await expect(row.getByRole("alert").filter({ hasText: "Give the reason for revoking" })).toBeVisible(); // the field's own error (the error summary repeats it)
  await row.getByRole("button", { name: "Cancel" }).click();
  await expect(row.getByTestId("certificate-status")).toHaveText(/Valid/);
});
