import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import mysql from "mysql2/promise";
import sharp from "sharp";
import { signInAs } from "./helpers";

const LEARNER = { email: "tobin@quillmoor.example", name: "Tobin Reyl" };
const MANAGER = "maren@quillmoor.example";
const SKILL = { id: "pj-cpvc-joint-and-cure", title: "Makes a CPVC solvent-cement joint and respects its cure schedule" };

async function axe(page: Page, label: string) {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"]).analyze();
  expect(results.violations.map((v) => `${label}: ${v.id} (${v.nodes.length}) ${v.nodes[0]?.target}`)).toEqual([]);
}

// The learner starts with nothing sent for this skill, also when the suite runs twice on one database.
test.beforeAll(async () => {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    await conn.query("delete s from sign_off s join user u on u.id = s.user_id where u.email = ? and s.skill_id = ?", [LEARNER.email, SKILL.id]);
  } finally {
    await conn.end();
  }
});

test("a learner uploads a photo for a skill and their manager approves it", async ({ browser }) => {
  const learnerPage = await (await browser.newContext()).newPage();
  await signInAs(learnerPage, LEARNER.email);
  await learnerPage.goto("/modules/pipe-and-joining");
  await learnerPage.getByRole("link", { name: "Practical sign-offs" }).click();
  await expect(learnerPage.getByRole("heading", { level: 1, name: "Practical sign-offs" })).toBeVisible();
  const skill = learnerPage.getByTestId(`skill-${SKILL.id}`);
  await expect(skill.getByText("Required", { exact: true })).toBeVisible();
  await expect(skill.getByText("Not sent yet")).toBeVisible();
  await axe(learnerPage, "learner sign-offs");

  // A phone-sized photo of the joint (drawn here), with the note for the reviewer.
  const photo = await sharp({ create: { width: 1200, height: 900, channels: 3, background: "#e9e4d0" } }).jpeg().toBuffer();
  await skill.getByLabel("Photos or PDF").setInputFiles({ name: "cpvc-joint.jpg", mimeType: "image/jpeg", buffer: photo });
  await skill.getByLabel("Note for the reviewer (optional)").fill("Joint in the garage ceiling, 2:15 pm, about 60 °F. Dario watched.");
  await skill.getByRole("button", { name: "Send for sign-off" }).click();
  await expect(skill.getByText("Waiting for review", { exact: true })).toBeVisible();
  await expect(skill.getByRole("img", { name: /cpvc-joint\.jpg/ })).toBeVisible();

  const managerPage = await (await browser.newContext()).newPage();
  await signInAs(managerPage, MANAGER);
  await managerPage.goto("/team/sign-offs");
  const item = managerPage.getByTestId("sign-off-item").filter({ hasText: LEARNER.name }).filter({ hasText: SKILL.title });
  await expect(item).toHaveCount(1);
  await expect(item.getByText("Dario watched")).toBeVisible();
  const thumb = item.getByRole("img", { name: /cpvc-joint\.jpg/ });
  await expect(thumb).toBeVisible();
  // the thumbnail really streamed through the checking route (a broken image has no natural width)
  await thumb.scrollIntoViewIfNeeded();
  await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => (img.complete ? img.naturalWidth : 0))).toBeGreaterThan(0);
  await axe(managerPage, "review queue");
  await item.getByRole("button", { name: "Approve sign-off" }).click();
  await expect(item.getByText(`✓ Approved. ${LEARNER.name} has been e-mailed.`)).toBeVisible();
  // The queue updates without a reload: the approved item leaves the waiting list.
  await expect(item).toHaveCount(0, { timeout: 10_000 });

  await learnerPage.reload();
  await expect(learnerPage.getByTestId(`skill-${SKILL.id}`).getByText("✓ Signed off")).toBeVisible();
  await expect(learnerPage.getByTestId(`skill-${SKILL.id}`).getByText(/Signed off by Maren Ostrowe/)).toBeVisible();
});

test("returning without a comment is refused in the form", async ({ page }) => {
  await signInAs(page, MANAGER);
  await page.goto("/team/sign-offs");
  // Dario's demo submission waits in the queue (lib/signoffs/seed.ts)
  const item = page.getByTestId("sign-off-item").filter({ hasText: "Dario Feltham" }).first();
  await item.getByRole("button", { name: "Return with comment" }).click();
  await expect(item.getByRole("alert")).toHaveText(/Say what is missing or needs redoing/);
  await expect(item.getByRole("button", { name: "Approve sign-off" })).toBeVisible();
});
