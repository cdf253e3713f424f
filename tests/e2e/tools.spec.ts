import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { PDFDocument } from "pdf-lib";
import { signInAs } from "./helpers";

test("a calculator computes from typed inputs, shows field errors and downloads its PDF summary", async ({ page }) => {
  await signInAs(page, "callum@quillmoor.example");
  await page.goto("/tools/sprinkler-flow");
  await page.getByLabel(/^K-factor/).fill("5.6");
  await page.getByLabel(/^Pressure at the sprinkler/).fill("16");
  // Q = K√P = 5.6 × √16 = 22.4 gpm (NFPA 13D discharge relation; arithmetic exact)
  await expect(page.locator('[data-result="headline"]')).toContainText("22.4");
  await expect(page.getByText(/teaching and checking aid/i).first()).toBeVisible();

  await page.getByLabel(/^Pressure at the sprinkler/).fill("-3");
  await expect(page.getByRole("alert").first()).toBeVisible();
  await expect(page.locator('[data-result="headline"]')).toHaveCount(0);
  await expect(page.locator("body")).not.toContainText("NaN");

  await page.getByLabel(/^Pressure at the sprinkler/).fill("16");
  await expect(page.locator('[data-result="headline"]')).toContainText("22.4");
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Download PDF summary" }).click()]);
  expect(download.suggestedFilename()).toMatch(/\.pdf$/);
  const bytes = await (await download.createReadStream()).toArray();
  const pdf = await PDFDocument.load(Buffer.concat(bytes));
  expect(pdf.getPageCount()).toBe(1);
});

test("the flow-test calculator shows supply against demand with a pass or short result", async ({ page }) => {
  await signInAs(page, "callum@quillmoor.example");
  await page.goto("/tools/flow-test");
  await page.getByLabel(/^Static pressure/).fill("65");
  await page.getByLabel(/^Residual pressure/).fill("50");
  await page.getByLabel(/^Test flow/).fill("900");
  // NFPA 291: at the test flow itself the curve passes through the residual reading (50 psi).
  await page.getByLabel(/^Design flow/).fill("900");
  await expect(page.locator('[data-result="headline"]')).toContainText("50.0 psi");
  await page.getByLabel(/^Pressure needed at the design flow/).fill("55");
  await expect(page.locator("[data-verdict]")).toHaveAttribute("data-verdict", "short");
  await page.getByLabel(/^Pressure needed at the design flow/).fill("45");
  await expect(page.locator("[data-verdict]")).toHaveAttribute("data-verdict", "pass");
  await expect(page.locator(".recharts-wrapper")).toBeVisible();
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21aa"]).analyze();
  expect(results.violations.map((v) => `${v.id} ${v.nodes[0]?.target}`)).toEqual([]);
});
