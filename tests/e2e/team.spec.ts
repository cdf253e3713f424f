// The team board in a real browser: the demo manager (Maren, Quillmoor Fire Protection) filters the
// board to one crew and sees exactly its people (db/demo.ts: South crew = Kasimir, Odette, Wendell,
// Rafaela); axe (WCAG 2.2 AA tags) finds no violations on /team.
import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { DEMO_PEOPLE, demoByRole } from "../../db/demo";
import { signInAs } from "./helpers";

const southCrew = DEMO_PEOPLE.filter((p) => p.org === "quillmoor" && p.team === "South crew").map((p) => p.name);

test("the demo manager filters the board to one team and sees its people", async ({ page }) => {
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  await page.goto("/team");
  const table = page.getByRole("region", { name: "Team board table" });
  await expect(page.getByText(/^Showing 1–\d+ of \d+ people$/)).toBeVisible();
  const everyone = await table.locator("tbody tr").count();
  expect(everyone).toBeGreaterThanOrEqual(9); // Quillmoor's nine demo people (other tests may add more)
  await page.getByLabel("Team", { exact: true }).selectOption({ label: "South crew" });
  await expect(page).toHaveURL(/team=/);
  await expect(table.locator("tbody tr")).toHaveCount(southCrew.length);
  const shown = await table.locator("tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-person")));
  expect(shown.sort()).toEqual([...southCrew].sort());
  await expect(page.getByText(`Showing 1–${southCrew.length} of ${southCrew.length} people`)).toBeVisible();

  // A status filter on top: Wendell failed "How a home sprinkler system works" (scripts/seed/seed-team.ts).
  await page.getByLabel("Status").selectOption({ label: "Failed last attempt" });
  await expect(table.locator("tbody tr")).toHaveCount(1);
  await expect(table.locator("tbody tr")).toHaveAttribute("data-person", "Wendell Ashcombe");
  await page.getByRole("button", { name: "Clear filters" }).click();
  await expect(table.locator("tbody tr")).toHaveCount(everyone);
});

test("axe finds no violations on /team", async ({ page }) => {
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  await page.goto("/team");
  await expect(page.getByRole("region", { name: "Team board table" })).toBeVisible();
  await expect(page.getByRole("region", { name: "Totals per team table" })).toBeVisible();
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  expect(results.violations.map((v) => `${v.id} (${v.nodes.length}) ${v.nodes[0]?.target} ${v.nodes[0]?.failureSummary ?? ""}`)).toEqual([]);
});

test("a board cell opens its details on tap; at 1280 px the person column stays while modules scroll", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 800 });
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  await page.goto("/team");
  const table = page.getByRole("region", { name: "Team board table" });
  await expect(table).toBeVisible();
  const cell = table.getByTestId("board-cell").first();
  await cell.locator("summary").click();
  await expect(cell.getByText(/lessons? done/)).toBeVisible();
  const { scrolls, sticky } = await table.evaluate((el) => ({
    scrolls: el.scrollWidth > el.clientWidth,
    sticky: getComputedStyle(el.querySelector("thead th")!).position,
  }));
  expect(scrolls).toBe(true);
  expect(sticky).toBe("sticky");
});
