import { expect, type Page } from "@playwright/test";
import { Agent, fetch } from "undici";
import { DEMO_PASSWORD } from "../../db/demo";

const APP = process.env.APP_URL ?? "http://127.0.0.1:3100";
const octet = () => 1 + Math.floor(Math.random() * 254);

/**
 * Signs a browser page in. The app learns the client address from the connection itself, and the
 * browser always connects from 127.0.0.1, so many form sign-ins in a row would meet the per-client
 * sign-in rate limit. The sign-in request therefore leaves from its own loopback address (a real
 * peer address, not a header) and the browser gets the session cookie it answers with.
 * tests/e2e/sign-in.spec.ts covers the form itself.
 */
export async function signInAs(page: Page, email: string, password = DEMO_PASSWORD) {
  const dispatcher = new Agent({ localAddress: `127.${octet()}.${octet()}.${octet()}` });
  try {
    const res = await fetch(`${APP}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP },
      body: JSON.stringify({ email, password }),
      dispatcher,
    });
    expect(res.status, `sign-in of ${email}`).toBe(200);
    const cookies = res.headers.getSetCookie().map((c) => {
      const [pair] = c.split(";");
      const i = pair!.indexOf("=");
      return { name: pair!.slice(0, i), value: pair!.slice(i + 1), url: APP, httpOnly: true, sameSite: "Lax" as const };
    });
    await page.context().addCookies(cookies);
  } finally {
    await dispatcher.close();
  }
  await page.goto("/learn");
  await page.waitForURL("**/learn");
}
