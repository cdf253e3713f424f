// Account settings against the running app: password change needs the current password, "sign out
// everywhere else" ends the other sessions only, an e-mail change waits for the new address to be
// confirmed, and "download my records" holds the person's own rows (lessons, attempts, certificates,
// sign-offs) and nobody else's.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { certificate, signOff, user } from "@/db/schema";
import { anonymous as anonymousClient, APP, fetchFrom, freshIp, linkIn, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { createPerson, createTestOrganization, gradedAttempt, readAndComplete } from "../helpers/fixtures";

// the tests' own organization: nobody is added to the demo organizations
let org: { id: string; name: string };
beforeAll(async () => {
  org = await createTestOrganization("Ashgrove Fire Protection");
});
afterAll(() => pool.end());

async function trySignIn(email: string, password: string) {
  return fetchFrom(freshIp(), `${APP}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP },
    body: JSON.stringify({ email, password }),
  });
}
const sessionOf = async (c: Client) => (await c.fetch("/api/auth/get-session")).json();

describe("password change", () => {
  it("needs the current password; afterwards only the new one works", async () => {
    const p = await createPerson({ tag: "pw", organizationId: org.id });
    const client = await signIn(p.email, p.password);
    const next = "a-brand-new-pass-42";

    const missing = await postJson(client, "/api/auth/change-password", { newPassword: next });
    expect(missing.status).toBe(400);
    const wrong = await postJson(client, "/api/auth/change-password", { currentPassword: "not-my-password-1", newPassword: next });
    expect(wrong.status).toBe(400);
    expect(wrong.json.code).toBe("INVALID_PASSWORD");
    expect((await trySignIn(p.email, p.password)).status).toBe(200); // unchanged

    const ok = await postJson(client, "/api/auth/change-password", { currentPassword: p.password, newPassword: next });
    expect(ok.status).toBe(200);
    expect((await trySignIn(p.email, p.password)).status).toBe(401);
    expect((await trySignIn(p.email, next)).status).toBe(200);
  });
});

describe("sign out everywhere else", () => {
  it("ends the other sessions and keeps this one", async () => {
    const p = await createPerson({ tag: "others", organizationId: org.id });
    const office = await signIn(p.email, p.password);
    const truck = await signIn(p.email, p.password);
    const list = await (await office.fetch("/api/account/sessions")).json();
    expect(list.sessions).toHaveLength(2);
    expect(list.sessions.filter((s: { current: boolean }) => s.current)).toHaveLength(1);
    expect(JSON.stringify(list)).not.toMatch(/token/i);

    const res = await postJson(office, "/api/auth/revoke-other-sessions", {});
    expect(res.status).toBe(200);
    expect(await sessionOf(truck)).toBeNull();
    expect((await sessionOf(office))?.user.email).toBe(p.email);
    const after = await (await office.fetch("/api/account/sessions")).json();
    expect(after.sessions).toEqual([expect.objectContaining({ current: true })]);
  });
});

describe("name and e-mail", () => {
  it("saves a new name", async () => {
    const p = await createPerson({ tag: "name", organizationId: org.id });
    const client = await signIn(p.email, p.password);
    expect((await postJson(client, "/api/auth/update-user", { name: "Perrin Galloway" })).status).toBe(200);
    expect((await sessionOf(client)).user.name).toBe("Perrin Galloway");
    // the e-mail cannot be changed this way, only with re-verification
    expect((await postJson(client, "/api/auth/update-user", { email: uniqueEmail("sneaky") })).status).toBe(400);
  });

  it("answers an over-long name or address with 400 and a message, not a database error", async () => {
    const p = await createPerson({ tag: "long", organizationId: org.id });
    const client = await signIn(p.email, p.password);
    const before = (await sessionOf(client)).user.name;
    const longName = await postJson(client, "/api/auth/update-user", { name: "N".repeat(201) });
    expect(longName.status).toBe(400);
    expect(longName.json.message).toMatch(/at most 200 characters/);
    expect((await sessionOf(client)).user.name).toBe(before);
    const longMail = await postJson(client, "/api/auth/change-email", { newEmail: `${"m".repeat(250)}@test.example`, password: p.password });
    expect(longMail.status).toBe(400);
    expect(longMail.json.message).toMatch(/at most 255 characters/);
    const longSignIn = await postJson(anonymousClient(), "/api/auth/sign-in/email", { email: `${"s".repeat(260)}@test.example`, password: "whatever-it-is" });
    expect(longSignIn.status).toBe(400);
  });

  it("changes the e-mail only after the new address is confirmed, and tells the old address", async () => {
    const p = await createPerson({ tag: "email", organizationId: org.id });
    const client = await signIn(p.email, p.password);
    const next = uniqueEmail("email-new");
    const other = await signIn(p.email, p.password);
    // the current password is required, and a wrong one changes nothing
    const missing = await postJson(client, "/api/auth/change-email", { newEmail: next, callbackURL: "/account?email=changed" });
    expect(missing.status).toBe(400);
    expect(missing.json.message).toMatch(/current password/i);
    const wrong = await postJson(client, "/api/auth/change-email", { newEmail: next, callbackURL: "/account?email=changed", password: "not-my-password-1" });
    expect(wrong.status).toBe(400);
    expect(await sessionOf(other)).not.toBeNull();
    const res = await postJson(client, "/api/auth/change-email", { newEmail: next, callbackURL: "/account?email=changed", password: p.password });
    expect(res.status).toBe(200);
    // the account's other sessions end; this one stays
    expect(await sessionOf(other)).toBeNull();
    expect((await sessionOf(client))?.user.email).toBe(p.email);
    const mail = await waitForMail(next, /confirm your new e-mail/i);
    const notice = await waitForMail(p.email, /about to change/i);
    expect(notice.text).toContain(next);
    // not yet changed
    const [before] = await db.select({ email: user.email }).from(user).where(eq(user.id, p.id));
    expect(before?.email).toBe(p.email);

    const link = linkIn(mail.text);
    const open = await fetchFrom(client.ip, link, { redirect: "manual", headers: { cookie: client.cookie } });
    expect([302, 303, 307]).toContain(open.status);
    expect(open.headers.get("location")).toContain("/account?email=changed");
    const [after] = await db.select({ email: user.email, verified: user.emailVerified }).from(user).where(eq(user.id, p.id));
    expect(after).toEqual({ email: next, verified: true });
    expect((await trySignIn(next, p.password)).status).toBe(200);
    expect((await trySignIn(p.email, p.password)).status).toBe(401);
  });
});

describe("download my records", () => {
  it("holds the person's own lessons and attempts and none of anyone else's", async () => {
    const me = await createPerson({ tag: "rec-me", organizationId: org.id });
    const other = await createPerson({ tag: "rec-other", organizationId: org.id });
    const mine = await signIn(me.email, me.password);
    const theirs = await signIn(other.email, other.password);
    await readAndComplete(mine, me.id, "freeze-protection", ["where-homes-freeze"]);
    await readAndComplete(theirs, other.id, "freeze-protection", ["where-homes-freeze"]);
    // attempts written as the quiz engine stores them
    const now = new Date();
    const myAttempt = await gradedAttempt({ id: me.id, organizationId: org.id }, "freeze-protection", true, now, { score: 90, seed: 11 });
    const theirAttempt = await gradedAttempt({ id: other.id, organizationId: org.id }, "freeze-protection", false, now, { score: 40, seed: 12 });

    // a certificate and a sign-off each, stored the way their areas store them
    const serialNumber = 900_000 + Math.floor(Math.random() * 99_999);
    const cert = (userId: string, n: number, holderName: string) => ({
      serial: `RSR-T-${serialNumber + n}`,
      serialYear: 1999,
      serialNumber: serialNumber + n,
      verificationCode: randomUUID().replace(/-/g, ""),
      userId,
      holderName,
      organizationId: org.id,
      organizationName: org.name,
      kind: "module" as const,
      subjectSlug: "freeze-protection",
      subjectTitle: "Freeze protection",
      ceHours: "1.00",
      completionId: serialNumber + n,
      issuedAt: now,
      expiresAt: new Date(now.getTime() + 365 * 86_400_000),
    });
    await db.insert(certificate).values([cert(me.id, 0, "Test rec-me"), cert(other.id, 1, "Test rec-other")]);
    const mySignOff = randomUUID();
    const theirSignOff = randomUUID();
    await db.insert(signOff).values([
      { id: mySignOff, userId: me.id, organizationId: org.id, moduleSlug: "pipe-and-joining", skillId: "pj-cpvc-joint-and-cure", status: "submitted", submittedAt: now },
      { id: theirSignOff, userId: other.id, organizationId: org.id, moduleSlug: "pipe-and-joining", skillId: "pj-cpvc-joint-and-cure", status: "submitted", submittedAt: now },
    ]);

    const res = await mine.fetch("/api/account/records?format=json");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="riser-my-records-/);
    const body = await res.json();
    expect(body.person).toMatchObject({ id: me.id, email: me.email, organization: org.name, team: null });
    expect(body.lessons).toEqual([expect.objectContaining({ module: "freeze-protection", lesson: "where-homes-freeze" })]);
    // the reading time behind it: the server's first-open stamp is part of the record
    expect(body.lessons[0].firstOpenedAt).toBeTruthy();
    expect(body.attempts.map((a: { id: string }) => a.id)).toEqual([myAttempt]);
    expect(body.attempts[0]).toMatchObject({ score: 90, passed: true, passMark: 80 });
    expect(body.notAvailable).toEqual([]);
    expect(body.certificates).toEqual([expect.objectContaining({ serial: `RSR-T-${serialNumber}`, subjectSlug: "freeze-protection", status: "valid" })]);
    expect(body.signOffs).toEqual([expect.objectContaining({ id: mySignOff, skillId: "pj-cpvc-joint-and-cure", status: "submitted" })]);
    const text = JSON.stringify(body);
    expect(text).not.toContain(`RSR-T-${serialNumber + 1}`);
    expect(text).not.toContain(theirSignOff);
    expect(text).not.toContain(other.id);
    expect(text).not.toContain(other.email);
    expect(text).not.toContain(theirAttempt);

    const csvRes = await mine.fetch("/api/account/records?format=csv");
    expect(csvRes.status).toBe(200);
    expect(csvRes.headers.get("content-type")).toMatch(/text\/csv/);
    const csv = (await csvRes.text()).replace(/^\uFEFF/, "");
    const rows = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
    expect(rows.filter((r) => r.record === "lesson").map((r) => r.reference)).toEqual(["where-homes-freeze"]);
    expect(rows.filter((r) => r.record === "attempt")).toEqual([expect.objectContaining({ reference: myAttempt, score: "90", status: "passed" })]);
    expect(rows.filter((r) => r.record === "certificate").map((r) => r.reference)).toEqual([`RSR-T-${serialNumber}`]);
    expect(rows.filter((r) => r.record === "sign-off").map((r) => r.reference)).toEqual([mySignOff]);
    expect(csv).not.toContain(theirAttempt);
    expect(csv).not.toContain(theirSignOff);
    expect(csv).not.toContain(other.id);

    expect((await mine.fetch("/api/account/records?format=xml")).status).toBe(400);
  });
});
