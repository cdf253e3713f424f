// The sign-in form itself, in a real browser: a wrong password gets a message, the right one leads
// to the page named in ?next=, and a ?next= that points off the site lands on /learn instead.
import { expect, test } from "@playwright/test";
import { DEMO_PASSWORD, demoByRole } from "../../db/demo";
import { demoAdminCode } from "../helpers/totp";

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

// Two-step sign-in through the form: after the password, the code field (its own error for a wrong
// code), then the page named in ?next=. The code comes from the reference library otpauth with the
// demo admin's published key. The page hydrates under the nonce CSP: the browser reports no violation.
test("asks an account with two-step sign-in for its code", async ({ page }) => {
  test.setTimeout(120_000);
  const violations: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) violations.push(m.text());
  });
  await page.goto("/sign-in?next=%2Fadmin");
  await page.waitForLoadState("networkidle");
  await page.getByLabel("E-mail").fill(demoByRole("admin").email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  const code = page.getByLabel("Code from your authenticator app");
  await expect(code).toBeVisible();
  const right = demoAdminCode();
  await code.fill(right === "000000" ? "111111" : "000000");
  await page.getByRole("button", { name: "Continue" }).click();
  await expect(page.getByText(/That code is not right/)).toBeVisible();
  // Each code signs in once (RFC 6238 §5.2) and earlier tests sign the demo admin in too. The next
  // step's code is the one least likely to be used already (it is accepted only from the step before
  // it); then the current one. Each answer is read from the server: 409 used, 429 the per-client
  // limit of the second-step endpoints (3 per 10 s), 200 signed in.
  let signedIn = false;
  for (let round = 0; round < 3 && !signedIn; round++) {
    for (const offset of [30_000, 0]) {
      await code.fill(demoAdminCode(Date.now() + offset));
      const [answer] = await Promise.all([
        page.waitForResponse((r) => r.url().includes("/two-factor/verify-totp")),
        page.getByRole("button", { name: "Continue" }).click(),
      ]);
      if (answer.status() === 200) {
        await page.waitForURL("**/admin");
        signedIn = true;
        break;
      }
      if (answer.status() === 429) break;
    }
    if (!signedIn) await page.waitForTimeout(Math.max(10_500, 30_000 - (Date.now() % 30_000) + 200));
  }
  expect(signedIn).toBe(true);
  await expect(page.getByText("Latest audit entries")).toBeVisible();
  expect(violations).toEqual([]);
});
