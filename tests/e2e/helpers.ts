import type { Page } from "@playwright/test";
import { DEMO_PASSWORD } from "../../db/demo";

const octet = () => 1 + Math.floor(Math.random() * 254);

/** Signs in through the form. Each test presents its own client address (as a proxy would report it),
 * so that the per-client sign-in rate limit of one test does not block the next. */
export async function signInAs(page: Page, email: string) {
  await page.context().setExtraHTTPHeaders({ "x-forwarded-for": `10.${octet()}.${octet()}.${octet()}` });
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL("**/learn");
}
