import { expect, test } from "@playwright/test";
import { demoByRole } from "../../db/demo";
import { signInAs } from "./helpers";

test("the demo manager sees the manager navigation", async ({ page }) => {
  await signInAs(page, demoByRole("manager", "quillmoor").email);
  const nav = page.getByRole("navigation", { name: "Main" });
  await expect(nav.getByRole("link", { name: "Team" })).toBeVisible();
  await expect(nav.getByRole("link", { name: "Admin" })).toHaveCount(0);
});

test("a learner does not see the manager navigation", async ({ page }) => {
  await signInAs(page, demoByRole("learner").email);
  const nav = page.getByRole("navigation", { name: "Main" });
  await expect(nav.getByRole("link", { name: "My training" })).toBeVisible();
  await expect(nav.getByRole("link", { name: "Team" })).toHaveCount(0);
});
