// Admin console and account settings in a real browser: an admin changes a person's role through
// the UI, "sign out everywhere else" ends another browser's session, axe (WCAG 2.2 AA tags) finds
// nothing on the admin pages and /account, and both work at phone width.
import { randomUUID } from "node:crypto";
import path from "node:path";
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { hashPassword } from "better-auth/crypto";
import mysql from "mysql2/promise";
import { DEMO_PASSWORD } from "../../db/demo";
import { signInAs } from "./helpers";

const PASSWORD = "e2e-person-pass-2026";

async function newPage(browser: Browser, width = 1280) {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  return context.newPage();
}

/**
 * A verified person in an organization of the test's own (never a demo organization, whose people
 * other tests count), straight in the test database. Invented names.
 */
async function createPerson(tag: string, role: string, organizationName: string, name: string) {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const id = randomUUID();
    const suffix = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
    const email = `${tag}-${suffix}@test.example`;
    const orgId = randomUUID();
    await conn.query("insert into organization (id, name, kind, seats, created_at) values (?, ?, 'contractor', 10, now(3))", [orgId, `${organizationName} ${suffix}`]);
    await conn.query("insert into user (id, name, email, email_verified, role, organization_id, created_at, updated_at) values (?, ?, ?, 1, ?, ?, now(3), now(3))", [id, name, email, role, orgId]);
    await conn.query("insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at) values (?, ?, 'credential', ?, ?, now(3), now(3))", [randomUUID(), id, id, await hashPassword(PASSWORD)]);
    return { id, email, name };
  } finally {
    await conn.end();
  }
}

// Each sign-in leaves from its own loopback address (helpers.ts), so rate limits of one test never hit another.
const signIn = (page: Page, email: string, password: string) => signInAs(page, email, password);

async function axe(page: Page, what: string) {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  expect(results.violations.map((v) => `${what}: ${v.id} (${v.nodes.length}) ${v.nodes[0]?.target}`)).toEqual([]);
}

test("an admin changes a person's role through the people screen", async ({ browser }) => {
  const person = await createPerson("e2e-role", "learner", "Brindlecombe Sprinkler Co", "Orrin Talbec");
  const page = await newPage(browser);
  await signIn(page, "admin@riser.example", DEMO_PASSWORD);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Admin" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Admin" })).toBeVisible();
  await page.getByRole("navigation", { name: "Admin sections" }).getByRole("link", { name: "People" }).click();
  await page.getByLabel("Search name or e-mail").fill(person.email);
  const row = page.getByRole("row").filter({ hasText: person.email });
  await expect(row).toHaveCount(1);
  await expect(row).toContainText("Learner");
  await row.getByRole("button", { name: `Manage ${person.name}` }).click();

  const dialog = page.getByRole("dialog", { name: `Manage ${person.name}` });
  await expect(dialog).toBeVisible();
  await axe(page, "/admin/people with the manage dialog open");
  await dialog.getByLabel("New role").selectOption("manager");
  await dialog.getByRole("button", { name: "Change role" }).click();
  // The reason is required: a field error, and nothing changes.
  await expect(dialog.getByRole("alert").filter({ hasText: /Give a reason/ })).toBeVisible(); // the field's own error (the error summary repeats it)
  await dialog.getByLabel("Reason for the role change").fill("Runs the Design office from next month");
  await dialog.getByRole("button", { name: "Change role" }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole("status")).toContainText(`${person.name} is now Manager.`);
  await expect(row).toContainText("Manager");

  // The audit log shows the change with its reason.
  await page.getByRole("navigation", { name: "Admin sections" }).getByRole("link", { name: "Audit log" }).click();
  await page.getByLabel("Action").selectOption("user.role");
  const entry = page.getByRole("row").filter({ hasText: person.email });
  await expect(entry.first()).toContainText("Runs the Design office from next month");
});

test("axe finds no violations on the admin pages", async ({ browser }) => {
  const page = await newPage(browser);
  await signIn(page, "admin@riser.example", DEMO_PASSWORD);
  for (const [url, ready] of [
    ["/admin", "Latest audit entries"],
    ["/admin/organizations", "All organizations"],
    ["/admin/people", "Joined"],
    ["/admin/content", "What is synced"],
    ["/admin/mail", "Recipient"],
    ["/admin/audit", "Reason and details"],
  ] as const) {
    await page.goto(url);
    await expect(page.getByText(ready).first()).toBeVisible();
    await axe(page, url);
  }
});

test("the admin and account pages work at phone width (360 px) and desktop width (1280 px)", async ({ browser }, testInfo) => {
  // Screenshots for a person to look at: RISER_SCREENSHOT_DIR, or this test's output folder.
  const shots = process.env.RISER_SCREENSHOT_DIR ?? testInfo.outputPath();
  for (const width of [1280, 360]) {
    const page = await newPage(browser, width);
    await signIn(page, "admin@riser.example", DEMO_PASSWORD);
    for (const [url, ready] of [
      ["/admin", "Latest audit entries"],
      ["/admin/organizations", "All organizations"],
      ["/admin/people", "Joined"],
      ["/admin/content", "What is synced"],
      ["/admin/mail", "Recipient"],
      ["/admin/audit", "Reason and details"],
      ["/account", "This device"],
    ] as const) {
      await page.goto(url);
      await expect(page.getByText(ready).first()).toBeVisible();
      await page.waitForLoadState("networkidle");
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow, `${url} at ${width} px scrolls sideways`).toBeLessThanOrEqual(1);
      await page.screenshot({ path: path.join(shots, `${url.slice(1).replace(/\//g, "-")}-${width}.png`), fullPage: true });
    }
    // the manage dialog fits the screen too
    await page.goto("/admin/people");
    // other suites add many people; search so that Dario is on the first page
    await page.locator("#people-q").fill("Dario");
    await page.getByRole("button", { name: "Manage Dario Feltham" }).click();
    const dialog = page.getByRole("dialog", { name: "Manage Dario Feltham" });
    await expect(dialog).toBeVisible();
    const box = await dialog.boundingBox();
    expect(box!.width).toBeLessThanOrEqual(width);
    await page.screenshot({ path: path.join(shots, `admin-people-dialog-${width}.png`) });
    await page.context().close();
  }
});

test("'sign out everywhere else' ends the session in another browser", async ({ browser }) => {
  const person = await createPerson("e2e-others", "learner", "Osterfield Fire Systems", "Linnea Sorvath");
  const office = await newPage(browser);
  const truck = await newPage(browser, 360);
  await signIn(office, person.email, PASSWORD);
  await signIn(truck, person.email, PASSWORD);

  await office.getByRole("link", { name: person.name }).click();
  await expect(office).toHaveURL(/\/account$/);
  await expect(office.getByRole("heading", { level: 1, name: "Account" })).toBeVisible();
  const sessions = office.getByTestId("session-list").getByRole("listitem");
  await expect(sessions).toHaveCount(2);
  await axe(office, "/account");

  await office.getByRole("button", { name: "Sign out everywhere else" }).click();
  await expect(office.getByText(/Signed out everywhere else \(1 session ended\)/)).toBeVisible();
  await expect(sessions).toHaveCount(1);
  await expect(sessions.first()).toContainText("This device");

  // The other browser is signed out: the next page needs a sign-in — within the session copy's bound
  // (README "Security model": 60 s; 3 s on the test profile, SESSION_CACHE_MAX_AGE_S).
  await expect(async () => {
    await truck.goto("/learn");
    await expect(truck).toHaveURL(/\/sign-in/, { timeout: 1_000 });
  }).toPass({ timeout: 15_000 });
  // This browser is still signed in.
  await office.goto("/learn");
  await expect(office).toHaveURL(/\/learn$/);
});

test("the password form asks for the current password and says when it is wrong", async ({ browser }) => {
  const person = await createPerson("e2e-pw", "sales", "Wrenmoor Homes", "Marisol Quenby");
  const page = await newPage(browser);
  await signIn(page, person.email, PASSWORD);
  await page.goto("/account");
  await page.getByLabel("New password", { exact: true }).fill("another-good-pass-1");
  await page.getByLabel("New password again").fill("another-good-pass-1");
  await page.getByRole("button", { name: "Change the password" }).click();
  await expect(page.getByRole("alert").filter({ hasText: /^Enter your current password$/ })).toBeVisible();
  await page.getByLabel("Current password").fill("not-the-password-9");
  await page.getByRole("button", { name: "Change the password" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "That is not your current password" })).toBeVisible();
  await page.getByLabel("Current password").fill(PASSWORD);
  await page.getByRole("button", { name: "Change the password" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Your password is changed" })).toBeVisible();
});
