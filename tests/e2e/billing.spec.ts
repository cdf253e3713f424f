// The demo manager buys 5 seats through the local payment page and sees them on the billing page.
// axe with the WCAG 2.2 AA tags (W3C WCAG 2.2, level AA) on the billing pages.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import { demoByRole } from "../../db/demo";
import { signInAs } from "./helpers";

async function axe(page: Page) {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`)).toEqual([]);
}

/** Screenshots for review when SCREENSHOT_DIR is set (not part of the assertions). */
async function shot(page: Page, name: string) {
  const dir = process.env.SCREENSHOT_DIR;
  if (!dir) return;
  for (const width of [1280, 360]) {
    await page.setViewportSize({ width, height: 900 });
    await page.screenshot({ path: `${dir}/${name}-${width}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1280, height: 900 });
}

test("the demo manager buys 5 seats and sees them on the billing page", async ({ page }) => {
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  await page.goto("/team/billing");
  await expect(page.getByRole("heading", { name: "Seats and billing" })).toBeVisible();
  const before = Number(await page.getByTestId("seats-total").textContent());
  await axe(page);
  await shot(page, "billing");

  const field = page.getByLabel("Seats to add");
  await field.fill("0");
  await page.getByRole("button", { name: "Continue to payment" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "Buy at least 1 seat" })).toBeVisible(); // the field's own error (the error summary repeats it)

  await field.fill("5");
  // 5 seats fall in the first demo plan (lib/billing/plans.ts: 1–9 seats at $39.00 each)
  await expect(page.getByTestId("quote")).toContainText("$195.00");
  await page.getByRole("button", { name: "Continue to payment" }).click();

  await page.waitForURL(/\/pay\/cs_test_/);
  await expect(page.getByRole("heading", { name: "Riser test checkout" })).toBeVisible();
  await expect(page.getByTestId("fake-total")).toHaveText("$195.00");
  await shot(page, "fake-pay");
  await page.getByRole("button", { name: "Pay $195.00" }).click();

  await page.waitForURL(/\/team\/billing\/success\?checkout=/);
  await expect(page.getByTestId("checkout-paid")).toContainText("Payment received: 5 seats added.");
  await expect(page.getByTestId("checkout-paid")).toContainText(`now has ${before + 5} seats`);
  await axe(page);
  await shot(page, "billing-success");

  await page.getByRole("link", { name: "Back to seats and billing" }).click();
  await expect(page.getByTestId("seats-total")).toHaveText(String(before + 5));
  const receipt = page.getByTestId("receipts").locator("tbody tr").first();
  await expect(receipt).toContainText("+5");
  await expect(receipt).toContainText(`${before} → ${before + 5}`);
  await expect(receipt).toContainText("$195.00");
  await shot(page, "billing-after");
});

test("declining on the payment page adds nothing and says so", async ({ page }) => {
  await signInAs(page, demoByRole("manager", "larkhaven").email);
  await page.goto("/team/billing");
  const before = await page.getByTestId("seats-total").textContent();
  await page.getByLabel("Seats to add").fill("2");
  await page.getByRole("button", { name: "Continue to payment" }).click();
  await page.waitForURL(/\/pay\/cs_test_/);
  await page.getByRole("button", { name: "Decline" }).click();
  await page.waitForURL(/\/team\/billing\/cancel/);
  await expect(page.getByTestId("checkout-cancelled")).toContainText("Nothing was charged and no seats were added.");
  await axe(page);
  await shot(page, "billing-cancel");
  await page.getByRole("link", { name: "Back to seats and billing" }).click();
  await expect(page.getByTestId("seats-total")).toHaveText(before ?? "");
  await expect(page.getByTestId("unfinished-checkouts")).toContainText("Not completed");
});

test("a learner is refused the billing page", async ({ page }) => {
  await signInAs(page, demoByRole("learner", "quillmoor").email);
  const res = await page.goto("/team/billing");
  expect(res?.status()).toBe(403);
  await expect(page.getByText("$39.00")).toHaveCount(0);
});
