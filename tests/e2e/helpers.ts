// Playwright helpers in one place: signing a page in, and the reading-time fixtures for browser tests
// (tests/helpers/fixtures.ts has the integration ones).
import { expect, type Page } from "@playwright/test";
import { Agent, fetch } from "undici";
import { DEMO_PASSWORD } from "../../db/demo";
import { demoAdminCode, isDemoAdmin, sendUnusedCode } from "../helpers/totp";
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import mysql from "mysql2/promise";

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
    let answer = res;
    if (((await res.json()) as { twoFactorRedirect?: boolean }).twoFactorRedirect && isDemoAdmin(email)) {
      // the demo admin signs in with two steps: the code from the published demo key (tests/helpers/totp.ts)
      const pending = res.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
      // each code signs in once (RFC 6238 §5.2): take the next unused one
      // (each try from its own loopback address, as tests/helpers/http.ts does: the second-step
      // endpoints allow 3 requests per 10 s per client, and a round of tries can come close together)
      let tries = 0;
      answer = await sendUnusedCode(demoAdminCode, async (code) => {
        const from = tries++ ? new Agent({ localAddress: `127.${octet()}.${octet()}.${octet()}` }) : dispatcher;
        try {
          const r = await fetch(`${APP}/api/auth/two-factor/verify-totp`, {
            method: "POST",
            headers: { "content-type": "application/json", origin: APP, cookie: pending },
            body: JSON.stringify({ code }),
            dispatcher: from,
          });
          await r.clone().arrayBuffer();
          return r;
        } finally {
          if (from !== dispatcher) await from.close();
        }
      });
      expect(answer.status, `second step of ${email}`).toBe(200);
    }
    const cookies = answer.headers.getSetCookie().map((c) => {
      const [pair] = c.split(";");
      const i = pair!.indexOf("=");
      return { name: pair!.slice(0, i), value: pair!.slice(i + 1), url: APP, httpOnly: true, sameSite: "Lax" as const };
    });
    await page.context().addCookies(cookies.filter((c) => c.value !== ""));
  } finally {
    await dispatcher.close();
  }
  await page.goto("/learn");
  await page.waitForURL("**/learn");
}

/**
 * A throw-away learner in the demo contractor, and the seat-time fixture: the server's own
 * first-open stamps of that person moved back in time (never anything the client can send).
 */
export async function throwAwayLearner(): Promise<string> {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    const email = `e2e-reader-${Date.now().toString(36)}-${randomUUID().slice(0, 6)}@test.example`;
    const id = randomUUID();
    const [rows] = await conn.query("select organization_id from user where email = 'rafaela@quillmoor.example'");
    const org = (rows as { organization_id: string }[])[0]!.organization_id;
    await conn.query("insert into user (id, name, email, email_verified, role, organization_id, created_at, updated_at) values (?, 'Test Reader', ?, 1, 'learner', ?, now(), now())", [id, email, org]);
    await conn.query("insert into account (id, account_id, provider_id, user_id, password, created_at, updated_at) values (?, ?, 'credential', ?, ?, now(), now())", [randomUUID(), id, id, await hashPassword(DEMO_PASSWORD)]);
    return email;
  } finally {
    await conn.end();
  }
}

export async function backdateOpens(email: string) {
  const conn = await mysql.createConnection({ uri: process.env.DATABASE_URL! });
  try {
    await conn.query("update lesson_open o join user u on u.id = o.user_id set o.first_opened_at = o.first_opened_at - interval 1 day where u.email = ? and u.email like '%@test.example'", [email]);
  } finally {
    await conn.end();
  }
}
