// Sign-in throttling and client addresses against the real server (scripts/serve.mjs appends the
// connected peer to X-Forwarded-For; TRUSTED_PROXY_HOPS=0 on test profiles). Every request here
// really leaves from its own loopback address (tests/helpers/http.ts fetchFrom) and also carries a
// forged X-Forwarded-For, which must change nothing. Per-account limit: NIST SP 800-63B §5.2.2
// (rate limiting of failed authentication attempts on a single account).
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { session, user } from "@/db/schema";
import esMail from "@/messages/es/mail.json";
import { APP, fetchFrom, freshIp, mailsTo, uniqueEmail, waitForMail } from "../helpers/http";
import { createOrganization, createPeople, TEST_PASSWORD } from "../helpers/fixtures";

afterAll(() => pool.end());

const LOCK_FAILURES = Number(process.env.SIGN_IN_LOCK_FAILURES ?? 10);
const LOCK_WINDOW_S = Number(process.env.SIGN_IN_LOCK_WINDOW_S ?? 900);
const forged = () => `203.0.113.${1 + Math.floor(Math.random() * 250)}`; // TEST-NET-3 (RFC 5737)

function signInFrom(ip: string, email: string, password: string, xff = forged()) {
  return fetchFrom(ip, `${APP}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP, "x-forwarded-for": xff },
    body: JSON.stringify({ email, password }),
  });
}

/** Riser's counters use fixed windows: start a burst well inside one. */
async function awayFromWindowEdge(windowS = LOCK_WINDOW_S, seconds = 20) {
  const into = (Date.now() / 1000) % windowS;
  if (into > windowS - seconds) await new Promise((r) => setTimeout(r, (windowS - into + 1) * 1000));
}

describe("client address", () => {
  it("a forged X-Forwarded-For does not escape the per-client sign-in limit", async () => {
    const ip = freshIp();
    const max = Number(process.env.AUTH_RATE_LIMIT_MAX ?? 20);
    const statuses: number[] = [];
    // a different unknown account each time, so only the per-client limit (AUTH_RATE_LIMIT_MAX per
    // fixed minute) applies; started away from a window edge so the burst stays inside one window
    await awayFromWindowEdge(Number(process.env.AUTH_RATE_LIMIT_WINDOW_S ?? 60), 15);
    for (let i = 0; i < max + 2; i++) statuses.push((await signInFrom(ip, uniqueEmail("nobody"), "wrong-password-1", forged())).status);
    expect(statuses.slice(0, max).every((s) => s === 401), statuses.join(",")).toBe(true);
    expect(statuses.at(-1)).toBe(429);
  });

  it("the session records the connected address, not the forged one", async () => {
    const org = await createOrganization("Addr Test Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "addr" });
    const ip = freshIp();
    const res = await signInFrom(ip, p!.email, TEST_PASSWORD, "198.51.100.7");
    expect(res.status).toBe(200);
    const rows = await db.select({ ip: session.ipAddress }).from(session).where(eq(session.userId, p!.id));
    expect(rows.map((r) => r.ip)).toEqual([ip]);
  });

  it("a forged X-Forwarded-For does not escape the certificate look-up limit", async () => {
    const ip = freshIp();
    const max = Number(process.env.VERIFY_RATE_LIMIT_MAX ?? 30);
    let last = 0;
    await awayFromWindowEdge(Number(process.env.VERIFY_RATE_LIMIT_WINDOW_S ?? 60), 15);
    for (let i = 0; i <= max; i++) {
      last = (await fetchFrom(ip, `${APP}/api/verify/RSR-NOPE-${i}`, { headers: { "x-forwarded-for": forged() } })).status;
    }
    expect(last).toBe(429);
  });
});

describe("per-account sign-in pause", () => {
  it("pauses an account after repeated wrong passwords from many addresses, says so, and mails its owner", async () => {
    const org = await createOrganization("Lockout Test Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "lockout" });
    await awayFromWindowEdge();
    const statuses: number[] = [];
    let lastBody: { message?: string; code?: string } = {};
    for (let i = 0; i < LOCK_FAILURES + 2; i++) {
      const res = await signInFrom(freshIp(), p!.email, `wrong-password-${i}`);
      statuses.push(res.status);
      lastBody = (await res.json()) as typeof lastBody;
    }
    expect(statuses.slice(0, LOCK_FAILURES).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(LOCK_FAILURES)).toEqual([429, 429]);
    expect(lastBody.code).toBe("ACCOUNT_SIGN_IN_PAUSED");
    expect(lastBody.message).toMatch(/paused/i);

    // The right password does not get through while the account is paused, from yet another address.
    expect((await signInFrom(freshIp(), p!.email, TEST_PASSWORD)).status).toBe(429);

    // Exactly one notice to the owner, naming the pause and the way out.
    let notices: Awaited<ReturnType<typeof mailsTo>> = [];
    for (let i = 0; i < 50 && !notices.length; i++) {
      notices = (await mailsTo(p!.email)).filter((m) => /paused/i.test(m.subject));
      if (!notices.length) await new Promise((r) => setTimeout(r, 200));
    }
    expect(notices).toHaveLength(1);
    expect(notices[0]!.text).toContain("/forgot-password");
  });

  it("mails the pause notice in the owner's stored language", async () => {
    const org = await createOrganization("Pausa Idioma Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "lockout-es" });
    await db.update(user).set({ language: "es" }).where(eq(user.id, p!.id));
    await awayFromWindowEdge();
    for (let i = 0; i < LOCK_FAILURES; i++) await signInFrom(freshIp(), p!.email, `contrasena-mala-${i}`);
    const notice = await waitForMail(p!.email);
    // messages/es/mail.json auth.paused, with the count of failures and the way out filled in
    expect(notice.subject).toBe(esMail.auth.paused.subject);
    expect(notice.text).toContain(`Hola, ${p!.name}:`);
    expect(notice.text).toContain(`Hubo ${LOCK_FAILURES} intentos`);
    expect(notice.text).toContain("/forgot-password");
    expect(notice.text).not.toMatch(/wrong password|is paused/);
  });

  it("does not pause an account for failures under the limit", async () => {
    const org = await createOrganization("Under Limit Co");
    const [p] = await createPeople(1, { organizationId: org.id, tag: "underlimit" });
    await awayFromWindowEdge();
    for (let i = 0; i < LOCK_FAILURES - 1; i++) expect((await signInFrom(freshIp(), p!.email, `wrong-${i}`)).status).toBe(401);
    expect((await signInFrom(freshIp(), p!.email, TEST_PASSWORD)).status).toBe(200);
  });
});
