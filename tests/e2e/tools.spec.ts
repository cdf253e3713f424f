import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { PDFDocument } from "pdf-lib";
import { readFileSync } from "node:fs";
import path from "node:path";
import { signInAs, throwAwayLearner } from "./helpers";

test("a calculator computes from typed inputs, shows field errors and downloads its PDF summary", async ({ page }) => {
  await signInAs(page, "callum@quillmoor.example");
  await page.goto("/tools/sprinkler-flow");
  await page.waitForLoadState("networkidle"); // the form computes through its script once hydrated
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

test("system demand at phone width keeps a result summary in view, and its chart shows the demand point clear of the axes", async ({ page }) => {
  await signInAs(page, "callum@quillmoor.example");
  await page.setViewportSize({ width: 360, height: 780 });
  await page.goto("/tools/system-demand");
  const bar = page.locator("[data-summary-bar]");
  // at the top of the inputs, the summary bar is already on screen with the demand and the verdict
  await expect(bar).toBeInViewport();
  await expect(bar).toContainText("psi");
  await expect(bar).toContainText(/Pass|Short/);
  // editing an input far down the form: the bar is still on screen and follows the change
  const additional = page.getByLabel(/^Additional flow at the same time/);
  await additional.scrollIntoViewIfNeeded();
  await expect(bar).toBeInViewport();
  const before = await bar.innerText();
  await additional.fill("5");
  await expect(bar).not.toHaveText(before);
  await expect(bar).toBeInViewport();
  // the additional-flow step shows the flow added, not the total
  await expect(page.getByText("Additional flow: 5.0 gpm")).toBeVisible();

  await page.setViewportSize({ width: 1280, height: 900 });
  // the drawing loads when its figure comes near the screen (components/tools/supply-chart.tsx)
  await page.locator('figure[aria-label="Demand versus supply"]').scrollIntoViewIfNeeded();
  const chart = page.locator(".recharts-wrapper");
  await chart.scrollIntoViewIfNeeded();
  await expect(chart).toBeVisible();
  const wrapper = (await chart.boundingBox())!;
  const label = (await page.locator(".recharts-wrapper text", { hasText: "Demand" }).first().boundingBox())!;
  // the label sits wholly inside the chart …
  expect(label.x).toBeGreaterThanOrEqual(wrapper.x);
  expect(label.x + label.width).toBeLessThanOrEqual(wrapper.x + wrapper.width);
  expect(label.y).toBeGreaterThanOrEqual(wrapper.y);
  // … and over no axis tick label
  const ticks = await page.locator(".recharts-cartesian-axis-tick-value").all();
  expect(ticks.length).toBeGreaterThan(4);
  for (const t of ticks) {
    const b = (await t.boundingBox())!;
    const overlaps = b.x < label.x + label.width && label.x < b.x + b.width && b.y < label.y + label.height && label.y < b.y + b.height;
    expect(overlaps).toBe(false);
  }
  // the demand point sits well inside the flow axis (not squashed against 0)
  await expect(page.locator('figure[aria-label="Demand versus supply"] figcaption')).toContainText(/shown up to/);
});

test("system demand: a field far below the first screen works at once — what is typed stays, the result follows, the unit switch converts it, a typo shows beside it", async ({ page }) => {
  await signInAs(page, "callum@quillmoor.example");
  await page.setViewportSize({ width: 360, height: 780 });
  await page.goto("/tools/system-demand");
  await page.waitForLoadState("networkidle");
  const bar = page.locator("[data-summary-bar]");
  await expect(bar).toContainText("psi");
  const before = await bar.innerText();
  // the last pipe run's length, far down the phone-width form, typed into without scrolling to it first
  const length = page.locator('[data-field^="segments."][data-field$=".length"]').last();
  await length.fill("100");
  await expect(length).toHaveValue("100");
  await expect(bar).not.toHaveText(before);
  await expect(length).toHaveValue("100");
  // US -> SI: 100 ft = 30.48 m (the international foot is 0.3048 m exactly; NIST SP 811, appendix B)
  await page.getByLabel(/^SI/).check();
  await expect(length).toHaveValue("30.48");
  await expect(page.locator(`label[for="${await length.getAttribute("id")}"]`)).toContainText("(m)");
  // a typo: the field's own error, tied to it for screen readers
  await length.fill("3o");
  await expect(length).toHaveAttribute("aria-invalid", "true");
  const described = (await length.getAttribute("aria-describedby"))!.split(" ");
  await expect(page.locator(`[id="${described[0]}"]`)).toHaveAttribute("role", "alert");
  await expect(bar).toContainText(/fix/i);
});

test("friction loss in 1 in CPVC uses the average bore and lets the listed inside diameter govern", async ({ page }) => {
  await signInAs(page, "callum@quillmoor.example");
  await page.goto("/tools/friction-loss");
  await page.getByLabel("Pipe material").selectOption("cpvc");
  await page.getByLabel("Nominal size").selectOption("1");
  // ASTM F442 SDR 13.5, 1 in: OD 1.315 − 2 × (0.097 + 0.010) = 1.101 in average bore (tolerance from memory — verify)
  await expect(page.locator('[data-report="friction-loss"]')).toContainText("1.101 in");
  await page.getByText("Maker's listed values (optional)").click();
  await page.getByLabel(/^Listed inside diameter/).fill("1.09");
  await expect(page.locator('[data-report="friction-loss"]')).toContainText("1.090 in");
  await expect(page.locator('[data-report="friction-loss"]')).toContainText(/nominal overstates loss/);
});

test("a calculator in Spanish: what the browser works out after an edit — the report and the field errors — reads the Spanish report catalog", async ({ page }) => {
  // the report catalog loads with the calculators' engine, in the reader's language (components/tools/engine-loader.ts)
  const es = JSON.parse(readFileSync(path.join(process.cwd(), "messages", "es", "calcReports.json"), "utf8")) as { sprinklerFlow: { noteDischarge: string } };
  const email = await throwAwayLearner();
  await signInAs(page, email);
  await page.goto("/tools");
  await page.getByTestId("language-switch").getByRole("button", { name: "Español" }).click();
  await expect(page.locator("html")).toHaveAttribute("lang", "es-US");
  await page.goto("/tools/sprinkler-flow");
  await page.waitForLoadState("networkidle");
  await page.locator('[data-field="k"]').fill("5.6");
  await page.locator('[data-field="pressure"]').fill("16");
  // Q = K√P = 5.6 × √16 = 22.4 gpm (NFPA 13D discharge relation; arithmetic exact)
  await expect(page.locator('[data-result="headline"]')).toContainText("22.4");
  await expect(page.locator('[data-report="sprinkler-flow"]')).toContainText(es.sprinklerFlow.noteDischarge);
  // a K-factor above the library's documented limit (100, lib/hydraulics/errors.ts INPUT_LIMITS): the field's
  // own error, from the Spanish catalog's inputErrors.atMost ("{field}: debe ser como máximo {max}; se recibió {got}.")
  const k = page.locator('[data-field="k"]');
  await k.fill("150");
  await expect(k).toHaveAttribute("aria-invalid", "true");
  const errorId = (await k.getAttribute("aria-describedby"))!.split(" ")[0]!;
  await expect(page.locator(`[id="${errorId}"]`)).toContainText("debe ser como máximo 100; se recibió 150");
  await expect(page.locator('[data-result="headline"]')).toHaveCount(0);
});
