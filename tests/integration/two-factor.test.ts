// Two-step sign-in (TOTP, RFC 6238) end to end over HTTP. Every code is computed by the `otpauth`
// npm package from the otpauth:// URI the app hands out (tests/helpers/totp.ts), never by the app's
// own library. Admins without it are refused on admin APIs and sent to enrolment from admin pages;
// enrolment switches on only after a right code; sign-in then needs the code; wrong codes share the
// per-account throttle of passwords; a backup code works once; a TOTP code signs in once (RFC 6238
// §5.2); an organization can require it of its managers; the shortest password allowed follows it
// (NIST SP 800-63B-4 §3.1.1.2: 15 characters without a second factor, 8 with one).
import { createHash } from "node:crypto";
import { and, count, desc, eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, rateLimitBucket, session, totpCodeUse, user } from "@/db/schema";
import { APP, cookiesOf, fetchFrom, freshIp, linkIn, mailsTo, waitForMail } from "../helpers/http";
import { createOrganization, createPerson } from "../helpers/fixtures";
import { codeForUri } from "../helpers/totp";

afterAll(() => pool.end());

const LOCK_FAILURES = Number(process.env.SIGN_IN_LOCK_FAILURES ?? 10);

/** Cookie jar as a header: later Set-Cookie values replace earlier ones; expired (empty) ones drop out. */
function merge(jar: string, res: Response): string {
  const map = new Map(jar ? jar.split("; ").map((p) => [p.slice(0, p.indexOf("=")), p.slice(p.indexOf("=") + 1)] as const) : []);
  for (const pair of cookiesOf(res).split("; ").filter(Boolean)) {
    const name = pair.slice(0, pair.indexOf("="));
    const value = pair.slice(pair.indexOf("=") + 1);
    if (value) map.set(name, value);
    else map.delete(name);
  }
  return [...map].map(([k, v]) => `${k}=${v}`).join("; ");
}

/**
 * One request from a fresh loopback address (the two-factor endpoints allow 3 per 10 s per address;
 * the per-account throttle is what these tests prove, and no address change escapes it).
 */
async function call(jar: string, path: string, body?: unknown) {
  const res = await fetchFrom(freshIp(), `${APP}${path}`, {
    method: body === undefined ? "GET" : "POST",
    redirect: "manual",
    headers: { origin: APP, ...(jar ? { cookie: jar } : {}), ...(body === undefined ? {} : { "content-type": "application/json" }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  let json: Record<string, unknown> = {};
  try {
    json = JSON.parse(text);
  } catch {
    /* a page */
  }
  return { status: res.status, json, jar: merge(jar, res), location: res.headers.get("location") };
}

const passwordStep = (email: string, password: string) => call("", "/api/auth/sign-in/email", { email, password });

/** Turns two-step sign-in on for a signed-in person; returns the URI, backup codes and the renewed session. */
async function enrol(jar: string, password: string) {
  const started = await call(jar, "/api/auth/two-factor/enable", { password });
  expect(started.status, JSON.stringify(started.json)).toBe(200);
  const uri = started.json.totpURI as string;
  const backupCodes = started.json.backupCodes as string[];
  expect(uri).toMatch(/^otpauth:\/\/totp\/Riser:/);
  expect(backupCodes).toHaveLength(10);
  const verified = await call(started.jar, "/api/auth/two-factor/verify-totp", { code: codeForUri(uri) });
  expect(verified.status, JSON.stringify(verified.json)).toBe(200);
  return { uri, backupCodes, jar: verified.jar };
}

/** A full sign-in: password, then the second step with the given body (code or backup code). */
async function signInWith(email: string, password: string, path: string, code: string) {
  const first = await passwordStep(email, password);
  expect(first.status).toBe(200);
  expect(first.json.twoFactorRedirect).toBe(true);
  return call(first.jar, path, { code });
}

const twoFactorOn = async (id: string) => (await db.select({ on: user.twoFactorEnabled }).from(user).where(eq(user.id, id)))[0]?.on;

describe("admins must use two-step sign-in", () => {
  it("refuses an admin without it on admin APIs and sends admin pages to enrolment; after enrolment sign-in needs the code", async () => {
    const admin = await createPerson({ tag: "tfa-admin", role: "admin", organizationId: null });
    let { jar } = await passwordStep(admin.email, admin.password);

    // signed in with the password only: admin and manager APIs refuse, the person's own pages work
    const refused = await call(jar, "/api/admin/people");
    expect(refused.status).toBe(403);
    expect(refused.json.code).toBe("SECOND_FACTOR_REQUIRED");
    expect((await call(jar, "/api/admin/audit")).status).toBe(403);
    expect((await call(jar, "/api/team/board")).status).toBe(403);
    const page = await call(jar, "/admin/people");
    expect(page.status).toBe(307);
    expect(page.location).toContain("/account?second-factor=required");
    expect((await call(jar, "/account")).status).toBe(200);
    expect((await call(jar, "/learn")).status).toBe(200);

    // enrolment: nothing switches on until a right code is verified
    const started = await call(jar, "/api/auth/two-factor/enable", { password: admin.password });
    expect(started.status).toBe(200);
    expect(await twoFactorOn(admin.id)).toBe(false);
    const wrong = await call(started.jar, "/api/auth/two-factor/verify-totp", { code: "000000" === codeForUri(started.json.totpURI as string) ? "111111" : "000000" });
    expect(wrong.status).toBe(401);
    expect(await twoFactorOn(admin.id)).toBe(false);
    expect((await call(started.jar, "/api/admin/people")).status).toBe(403);
    const ok = await call(started.jar, "/api/auth/two-factor/verify-totp", { code: codeForUri(started.json.totpURI as string) });
    expect(ok.status).toBe(200);
    expect(await twoFactorOn(admin.id)).toBe(true);
    jar = ok.jar;
    expect((await call(jar, "/api/admin/people")).status).toBe(200);

    // the next sign-in: the password alone gives no session
    const first = await passwordStep(admin.email, admin.password);
    expect(first.status).toBe(200);
    expect(first.json).toMatchObject({ twoFactorRedirect: true, twoFactorMethods: ["totp"] });
    expect((await call(first.jar, "/api/auth/get-session")).json).toBeNull();
    expect((await call(first.jar, "/api/admin/people")).status).toBe(401);
    // "remember this device" is not offered
    expect((await call(first.jar, "/api/auth/two-factor/verify-totp", { code: codeForUri(started.json.totpURI as string), trustDevice: true })).status).toBe(400);
    const second = await call(first.jar, "/api/auth/two-factor/verify-totp", { code: codeForUri(started.json.totpURI as string) });
    expect(second.status).toBe(200);
    expect((await call(second.jar, "/api/admin/people")).status).toBe(200);

    // turning it off needs the password; then the admin is refused again
    expect((await call(second.jar, "/api/auth/two-factor/disable", { password: "not-the-password-at-all" })).status).toBe(400);
    const off = await call(second.jar, "/api/auth/two-factor/disable", { password: admin.password });
    expect(off.status).toBe(200);
    expect(await twoFactorOn(admin.id)).toBe(false);
    expect((await call(off.jar, "/api/admin/people")).status).toBe(403);
  });
});

describe("everyone may use two-step sign-in", () => {
  it("counts wrong codes against the account like wrong passwords, whatever address they come from", async () => {
    const org = await createOrganization("Two-step crew");
    const person = await createPerson({ tag: "tfa-throttle", organizationId: org.id });
    const first = await passwordStep(person.email, person.password);
    const { uri } = await enrol(first.jar, person.password);

    // wrong codes, each from its own address; a sign-in allows a few before it must start again
    let failures = 0;
    let pending = "";
    while (failures < LOCK_FAILURES) {
      if (!pending) {
        const step = await passwordStep(person.email, person.password);
        expect(step.status).toBe(200);
        pending = step.jar;
      }
      const right = codeForUri(uri);
      const r = await call(pending, "/api/auth/two-factor/verify-totp", { code: right === "123456" ? "654321" : "123456" });
      expect(r.status).toBe(401);
      failures++;
      if (failures % 4 === 0) pending = "";
    }
    // the account is paused: the right code and the right password are both refused, with the reason
    if (!pending) pending = (await passwordStep(person.email, person.password)).jar || pending;
    const rightCode = await call(pending, "/api/auth/two-factor/verify-totp", { code: codeForUri(uri) });
    expect(rightCode.status).toBe(429);
    expect(rightCode.json.code).toBe("ACCOUNT_SIGN_IN_PAUSED");
    const password = await passwordStep(person.email, person.password);
    expect(password.status).toBe(429);
    expect(password.json.code).toBe("ACCOUNT_SIGN_IN_PAUSED");
    // the owner hears about it
    let notices: unknown[] = [];
    for (let i = 0; i < 50 && !notices.length; i++) {
      notices = (await mailsTo(person.email)).filter((m) => /paused/i.test(m.subject));
      if (!notices.length) await new Promise((r) => setTimeout(r, 200));
    }
    expect(notices).toHaveLength(1);
  });

  it("accepts each backup code once", async () => {
    const org = await createOrganization("Backup crew");
    const person = await createPerson({ tag: "tfa-backup", organizationId: org.id });
    const { backupCodes } = await enrol((await passwordStep(person.email, person.password)).jar, person.password);
    const [a, b] = backupCodes as [string, string];

    const used = await signInWith(person.email, person.password, "/api/auth/two-factor/verify-backup-code", a);
    expect(used.status).toBe(200);
    expect(((await call(used.jar, "/api/auth/get-session")).json as { user?: { email?: string } }).user?.email).toBe(person.email);

    const again = await signInWith(person.email, person.password, "/api/auth/two-factor/verify-backup-code", a);
    expect(again.status).toBe(401);
    expect((await call(again.jar, "/api/auth/get-session")).json).toBeNull();

    const other = await signInWith(person.email, person.password, "/api/auth/two-factor/verify-backup-code", b);
    expect(other.status).toBe(200);
  });
});

describe("a TOTP code signs in once (RFC 6238 §5.2: no second acceptance of the same OTP)", () => {
  const sessionsOf = async (id: string) => (await db.select({ n: count() }).from(session).where(eq(session.userId, id)))[0]?.n ?? 0;

  it("refuses the same code a second time, lets exactly one of two simultaneous sign-ins with a code through, and takes the next step's code", async () => {
    const org = await createOrganization("Replay crew");
    const person = await createPerson({ tag: "tfa-replay", organizationId: org.id });
    // the app accepts the codes of the step before, the current one and the one after (30 s each);
    // start early enough in a step that the step-before code stays valid for the whole test
    if (Date.now() % 30_000 > 20_000) await new Promise((r) => setTimeout(r, 30_000 - (Date.now() % 30_000) + 200));
    const { uri } = await enrol((await passwordStep(person.email, person.password)).jar, person.password);
    const step = Math.floor(Date.now() / 30_000);
    const [previous, current, next] = [step - 1, step, step + 1].map((s) => codeForUri(uri, s * 30_000 + 1_000)) as [string, string, string];
    // three distinct codes (a collision of two 6-digit codes is about one in a million: then this run proves less, not wrongly)
    expect(new Set([previous, current, next]).size).toBe(3);

    // a code accepted once is refused the second time, with the reason, and gives no session
    const first = await signInWith(person.email, person.password, "/api/auth/two-factor/verify-totp", previous);
    expect(first.status, JSON.stringify(first.json)).toBe(200);
    const again = await signInWith(person.email, person.password, "/api/auth/two-factor/verify-totp", previous);
    expect(again.status).toBe(409);
    expect(again.json.code).toBe("TOTP_CODE_ALREADY_USED");
    expect(again.json.message).toMatch(/already used/i);
    expect((await call(again.jar, "/api/auth/get-session")).json).toBeNull();
    // a replay is not counted against the per-account sign-in budget (it is no guess; lib/auth/second-factor.ts)
    const failKey = `signin-fail:${createHash("sha256").update(person.email.toLowerCase()).digest("hex")}`;
    expect(await db.select().from(rateLimitBucket).where(eq(rateLimitBucket.bucketKey, failKey))).toEqual([]);

    // two sign-ins racing with the same fresh code: exactly one session comes of them
    const before = await sessionsOf(person.id);
    const [a, b] = await Promise.all([passwordStep(person.email, person.password), passwordStep(person.email, person.password)]);
    const race = await Promise.all([a, b].map((p) => call(p.jar, "/api/auth/two-factor/verify-totp", { code: current })));
    expect(race.map((r) => r.status).sort()).toEqual([200, 409]);
    expect(await sessionsOf(person.id)).toBe(before + 1);

    // the code the app will show in the next step is a fresh one and works
    const fresh = await signInWith(person.email, person.password, "/api/auth/two-factor/verify-totp", next);
    expect(fresh.status, JSON.stringify(fresh.json)).toBe(200);
    expect(((await call(fresh.jar, "/api/auth/get-session")).json as { user?: { email?: string } }).user?.email).toBe(person.email);

    // what is kept: one keyed hash per accepted code, neither the code nor its plain (reversible) SHA-256
    const kept = (await db.select({ codeHash: totpCodeUse.codeHash }).from(totpCodeUse).where(eq(totpCodeUse.userId, person.id))).map((r) => r.codeHash);
    expect(kept).toHaveLength(3);
    for (const code of [previous, current, next]) {
      expect(kept).not.toContain(code);
      expect(kept).not.toContain(createHash("sha256").update(code).digest("hex"));
    }
    for (const h of kept) expect(h).toMatch(/^[0-9a-f]{64}$/);
  });
});

describe("an organization may require it of its managers", () => {
  it("is switched on by a manager who uses it (audited); managers without it are then refused on team APIs", async () => {
    const org = await createOrganization("Two-step contractor");
    const lead = await createPerson({ tag: "tfa-lead", role: "manager", organizationId: org.id });
    const other = await createPerson({ tag: "tfa-other", role: "manager", organizationId: org.id });
    const otherJar = (await passwordStep(other.email, other.password)).jar;
    let leadJar = (await passwordStep(lead.email, lead.password)).jar;

    // not yet required: both work
    expect((await call(otherJar, "/api/team/board")).status).toBe(200);
    // a manager without it cannot require it (they would lock themselves out)
    const early = await call(leadJar, "/api/team/security", { requireManagerTwoFactor: true });
    expect(early.status).toBe(409);
    expect((await call(leadJar, "/api/team/security")).json.requireManagerTwoFactor).toBe(false);

    leadJar = (await enrol(leadJar, lead.password)).jar;
    const on = await call(leadJar, "/api/team/security", { requireManagerTwoFactor: true });
    expect(on.status).toBe(200);
    const [row] = await db
      .select({ actorId: auditLog.actorId, details: auditLog.details })
      .from(auditLog)
      .where(and(eq(auditLog.organizationId, org.id), eq(auditLog.action, "organization.manager-two-factor")))
      .orderBy(desc(auditLog.id));
    expect(row).toMatchObject({ actorId: lead.id, details: { required: true } });

    // the other manager: refused on team APIs, sent to enrolment from team pages, own pages still open
    const refused = await call(otherJar, "/api/team/board");
    expect(refused.status).toBe(403);
    expect(refused.json.code).toBe("SECOND_FACTOR_REQUIRED");
    const page = await call(otherJar, "/team");
    expect(page.status).toBe(307);
    expect(page.location).toContain("/account?second-factor=required");
    expect((await call(otherJar, "/learn")).status).toBe(200);
    // the manager who uses it works on
    expect((await call(leadJar, "/api/team/board")).status).toBe(200);

    // a learner of that organization is not affected
    const learner = await createPerson({ tag: "tfa-learner", organizationId: org.id });
    expect((await call((await passwordStep(learner.email, learner.password)).jar, "/api/progress?module=freeze-protection")).status).toBe(200);

    // once the other manager enrols, the team pages open for them
    const enrolled = await enrol(otherJar, other.password);
    expect((await call(enrolled.jar, "/api/team/board")).status).toBe(200);

    // switching it off is audited too
    expect((await call(leadJar, "/api/team/security", { requireManagerTwoFactor: false })).status).toBe(200);
    expect((await call(leadJar, "/api/team/security")).json.requireManagerTwoFactor).toBe(false);
  });

  it("cannot be switched by a learner, nor for another organization", async () => {
    const org = await createOrganization("Two-step learner org");
    const otherOrg = await createOrganization("Two-step other org");
    const learner = await createPerson({ tag: "tfa-l2", organizationId: org.id });
    const manager = await createPerson({ tag: "tfa-m2", role: "manager", organizationId: org.id });
    const lj = (await passwordStep(learner.email, learner.password)).jar;
    expect((await call(lj, "/api/team/security", { requireManagerTwoFactor: true })).status).toBe(403);
    const mj = (await enrol((await passwordStep(manager.email, manager.password)).jar, manager.password)).jar;
    expect((await call(mj, "/api/team/security", { requireManagerTwoFactor: true, org: otherOrg.id })).status).toBe(403);
    expect((await call(mj, "/api/team/security", { requireManagerTwoFactor: "yes" })).status).toBe(400);
  });
});

describe("password length follows the second factor (NIST SP 800-63B-4 §3.1.1.2: 15 characters without one, 8 with one)", () => {
  const change = (jar: string, currentPassword: string, newPassword: string) => call(jar, "/api/auth/change-password", { currentPassword, newPassword, revokeOtherSessions: false });

  /** The token of a mailed reset link (the link itself redirects to /reset-password?token=…). */
  async function resetToken(email: string): Promise<string> {
    expect((await call("", "/api/auth/request-password-reset", { email, redirectTo: "/reset-password" })).status).toBe(200);
    const hop = await fetchFrom(freshIp(), linkIn((await waitForMail(email, /reset/i)).text), { redirect: "manual" });
    return new URL(hop.headers.get("location")!, APP).searchParams.get("token")!;
  }

  it("without two-step sign-in a new password needs 15 characters, by change and by reset", async () => {
    const org = await createOrganization("Long password crew");
    const person = await createPerson({ tag: "pw-one-factor", organizationId: org.id });
    const { jar } = await passwordStep(person.email, person.password);
    const short = await change(jar, person.password, "quarry-bend-9"); // 13 characters
    expect(short.status).toBe(400);
    expect(short.json).toMatchObject({ code: "PASSWORD_TOO_SHORT", message: expect.stringMatching(/15 characters/) });
    expect((await passwordStep(person.email, "quarry-bend-9")).status).toBe(401);

    const token = await resetToken(person.email);
    expect(await (await fetchFrom(freshIp(), `${APP}/reset-password?token=${encodeURIComponent(token)}`)).text()).toContain("At least 15 characters");
    const reset = await call("", "/api/auth/reset-password", { newPassword: "quarry-bend-9", token });
    expect(reset.status).toBe(400);
    expect(reset.json).toMatchObject({ code: "PASSWORD_TOO_SHORT" });
    expect((await passwordStep(person.email, person.password)).status).toBe(200);
  });

  it("with it, 8 characters are enough (7 are not), and it cannot be turned off while the password is under 15", async () => {
    const org = await createOrganization("Short password crew");
    const person = await createPerson({ tag: "pw-two-factor", organizationId: org.id });
    const { jar } = await enrol((await passwordStep(person.email, person.password)).jar, person.password);

    const seven = await change(jar, person.password, "tq7-marl".slice(0, 7));
    expect(seven.status).toBe(400);
    expect(seven.json).toMatchObject({ code: "PASSWORD_TOO_SHORT", message: expect.stringMatching(/8 characters/) });
    const eight = await change(jar, person.password, "tq7-marl");
    expect(eight.status, JSON.stringify(eight.json)).toBe(200);
    const first = await passwordStep(person.email, "tq7-marl");
    expect(first.status).toBe(200);
    expect(first.json.twoFactorRedirect).toBe(true); // the code is still asked for

    // turning the second factor off would leave an 8-character single factor: refused, still on
    const off = await call(eight.jar, "/api/auth/two-factor/disable", { password: "tq7-marl" });
    expect(off.status).toBe(400);
    expect(off.json).toMatchObject({ code: "PASSWORD_TOO_SHORT_FOR_ONE_FACTOR" });
    expect(await twoFactorOn(person.id)).toBe(true);
    // a wrong password is answered as wrong, not as short
    expect((await call(eight.jar, "/api/auth/two-factor/disable", { password: "nope-123" })).json).toMatchObject({ code: "INVALID_PASSWORD" });

    // a reset of this account takes 8 characters too
    const token = await resetToken(person.email);
    // the reset page's form asks for the 8 of this account (the hint and the browser-side check)
    expect(await (await fetchFrom(freshIp(), `${APP}/reset-password?token=${encodeURIComponent(token)}`)).text()).toContain("At least 8 characters, since this account also signs in with a code");
    const reset = await call("", "/api/auth/reset-password", { newPassword: "brm4-kelp", token });
    expect(reset.status, JSON.stringify(reset.json)).toBe(200);
    expect((await passwordStep(person.email, "brm4-kelp")).json.twoFactorRedirect).toBe(true);
  });
});
