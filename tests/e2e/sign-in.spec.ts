// The sign-in form itself, in a real browser: a wrong password gets a message, the right one leads
// to the page named in ?next=, and a ?next= that points off the site lands on /learn instead.
import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD } from "../../db/demo";

test("signs in through the form and follows only same-site next links", async ({ page }) => {
  await page.goto("/sign-in?next=%2Fmodules");
  await page.waitForLoadState("networkidle"); // the form posts through its script once hydrated
  await page.getByLabel("E-mail").fill("dario@quillmoor.example");
  await page.getByLabel("Password").fill("not-the-password-at-all");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText(/do not match an account/)).toBeVisible();
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL("**/modules");

  await page.context().clearCookies();
  await page.goto("/sign-in?next=%2F%5Cevil.example");
  await page.waitForLoadState("networkidle");
  await page.getByLabel("E-mail").fill("dario@quillmoor.example");
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL("**/learn");
  expect(new URL(page.url()).host).toBe(new URL(process.env.APP_URL ?? "http://127.0.0.1:3100").host);
});
