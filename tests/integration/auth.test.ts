// Sign-up → verification mail from the local catcher → sign-in → sign-out, through the real route
// handlers and MariaDB; bad input gives field errors, never a 500.
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { user } from "@/db/schema";
import { APP, anonymous, cookiesOf, fetchFrom, freshIp, linkIn, postJson, signIn, uniqueEmail, waitForMail } from "../helpers/http";

const PASSWORD = "correct-horse-42";
afterAll(() => pool.end());

async function signUp(body: Record<string, unknown>) {
  return postJson(anonymous(), "/api/account/sign-up", body);
}

/** Signs up and keeps the browser's sign-up cookie: confirming from this browser keeps the password. */
async function signUpKeepingCookie(body: Record<string, unknown>) {
  const res = await anonymous().fetch("/api/account/sign-up", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  return { status: res.status, cookie: cookiesOf(res) };
}

describe("sign-up, verification, sign-in, sign-out", () => {
  it("runs end to end", async () => {
    const email = uniqueEmail("newmgr");
    const res = await signUpKeepingCookie({ name: "Perpetua Vosk", email, password: PASSWORD, organizationName: "Vosk Sprinkler Co" });
    expect(res.status).toBe(201);
    expect(res.cookie).toMatch(/riser_signup=/);

    // Not verified yet: sign-in refused with 403.
    const early = await fetchFrom(freshIp(), `${APP}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP },
      body: JSON.stringify({ email, password: PASSWORD }),
    });
    expect(early.status).toBe(403);

    const mail = await waitForMail(email, /confirm/i);
    const link = linkIn(mail.text);
    expect(link.startsWith(APP)).toBe(true);
    const verify = await fetchFrom(freshIp(), link, { redirect: "manual", headers: { cookie: res.cookie } });
    expect([302, 303, 307]).toContain(verify.status);
    expect(verify.headers.get("location")).toContain("/sign-in?verified=1");

    const client = await signIn(email, PASSWORD);
    const session = await (await client.fetch("/api/auth/get-session")).json();
    expect(session.user.email).toBe(email);
    expect(session.user.role).toBe("manager");
    expect(session.user.organizationId).toBeTruthy();

    const out = await client.fetch("/api/auth/sign-out", { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(out.status).toBe(200);
    const cleared = cookiesOf(out);
    const after = await fetch(`${APP}/api/auth/get-session`, { headers: { cookie: client.cookie } });
    expect(await after.json()).toBeNull();
    expect(cleared).toMatch(/session_token=/);
  });

  it("refuses an account created at the raw auth endpoint (no organization or role can be chosen)", async () => {
    const email = uniqueEmail("raw");
    const res = await postJson(anonymous(), "/api/auth/sign-up/email", { name: "Sly Actor", email, password: PASSWORD, role: "admin" });
    expect([400, 403]).toContain(res.status);
    const rows = await db.select({ id: user.id }).from(user).where(eq(user.email, email));
    expect(rows).toEqual([]);
  });

  it("rate limits sign-in attempts per client address in fixed windows, with its own message", async () => {
    const ip = freshIp();
    const max = Number(process.env.AUTH_RATE_LIMIT_MAX ?? 20);
    const windowS = Number(process.env.AUTH_RATE_LIMIT_WINDOW_S ?? 60);
    // start well inside a window, so the burst is counted in one
    const into = (Date.now() / 1000) % windowS;
    if (into > windowS - 15) await new Promise((r) => setTimeout(r, (windowS - into + 1) * 1000));
    const answers: { status: number; code?: string }[] = [];
    for (let i = 0; i < max + 2; i++) {
      // a different unknown address each time: the per-account pause never applies, only the per-client limit
      const r = await fetchFrom(ip, `${APP}/api/auth/sign-in/email`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: APP },
        body: JSON.stringify({ email: uniqueEmail("nobody"), password: "wrong-password-1" }),
      });
      answers.push({ status: r.status, code: ((await r.json().catch(() => ({}))) as { code?: string }).code });
    }
    expect(answers.slice(0, max).every((a) => a.status === 401), answers.map((a) => a.status).join(",")).toBe(true);
    expect(answers.at(-1)).toEqual({ status: 429, code: "CLIENT_SIGN_IN_LIMIT" });
  });

  it("never rate limits reading one's own session: a crew behind one office address loads many pages", async () => {
    const learner = await signIn("dario@quillmoor.example");
    // 250 session reads from one address in a burst — above better-auth's default 200 per minute
    const statuses = new Set<number>();
    let signedIn = 0;
    for (let i = 0; i < 250; i++) {
      const r = await learner.fetch("/api/auth/get-session");
      statuses.add(r.status);
      if (((await r.json()) as { user?: unknown } | null)?.user) signedIn++;
    }
    expect(signedIn).toBe(250);
    expect([...statuses]).toEqual([200]);
  });
});

describe("bad input on sign-up", () => {
  it("names the field for an invalid e-mail and a short password", async () => {
    const res = await signUp({ name: "A Person", email: "not-an-email", password: "short", organizationName: "C" });
    expect(res.status).toBe(400);
    const fe = res.json.fieldErrors as Record<string, string[]>;
    expect(fe.email?.[0]).toMatch(/e-mail/i);
    expect(fe.password?.[0]).toMatch(/15 characters/);
    expect(fe.organizationName?.[0]).toBeTruthy();
  });

  it("refuses a duplicate e-mail with a field error and writes nothing", async () => {
    const res = await signUp({ name: "Copy Cat", email: "maren@quillmoor.example", password: PASSWORD, organizationName: "Copycat Fire" });
    expect(res.status).toBe(400);
    expect((res.json.fieldErrors as Record<string, string[]>).email?.[0]).toMatch(/exists/);
  });

  it("answers a body that is not JSON with 400", async () => {
    const res = await anonymous().fetch("/api/account/sign-up", { method: "POST", headers: { "content-type": "application/json" }, body: "{nope" });
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatch(/JSON/);
  });

  it("stores HTML and SQL in a name as given and renders it escaped", async () => {
    const email = uniqueEmail("xss");
    const name = `<script>alert("x")</script>'); DROP TABLE user;--`;
    const res = await signUpKeepingCookie({ name, email, password: PASSWORD, organizationName: `<b>Bold</b> & Co` });
    expect(res.status).toBe(201);
    const mail = await waitForMail(email, /confirm/i);
    await fetch(linkIn(mail.text), { redirect: "manual", headers: { cookie: res.cookie } });
    const client = await signIn(email, PASSWORD);
    const session = await (await client.fetch("/api/auth/get-session")).json();
    expect(session.user.name).toBe(name);
    const html = await (await client.fetch("/learn")).text();
    expect(html).not.toContain('<script>alert("x")</script>');
    expect(html).toContain("&lt;script&gt;");
  });
});
