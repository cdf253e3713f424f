// Cross-site requests and sign-up abuse against the real server: changes sent from another site's
// page are refused, only JSON bodies are read, sign-ups are rate limited per client and per address,
// unverified accounts neither squat an address nor survive their expiry, and confirming an e-mail
// never hands over a password somebody else chose.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { account, invitation, organization, user } from "@/db/schema";
import { anonymous, APP, cookiesOf, fetchFrom, freshIp, linkIn, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { createOrganization, createPeople, sessionCookieFor } from "../helpers/fixtures";

afterAll(() => pool.end());

async function managerClient(): Promise<{ client: Client; orgId: string }> {
  const org = await createOrganization("Origin Test Co");
  const [m] = await createPeople(1, { organizationId: org.id, role: "manager", tag: "originmgr" });
  const cookie = await sessionCookieFor(m!.id);
  const ip = freshIp();
  return { orgId: org.id, client: { cookie, ip, fetch: (path, init = {}) => fetchFrom(ip, `${APP}${path}`, { redirect: "manual", ...init, headers: { cookie, ...(init.headers as Record<string, string>) } }) } };
}

const invitesFor = async (orgId: string, email: string) =>
  db.select({ id: invitation.id }).from(invitation).where(and(eq(invitation.organizationId, orgId), eq(invitation.email, email)));

describe("changes from another site", () => {
  it("refuses a text/plain invitation sent with another site's Origin (403) and creates nothing", async () => {
    const { client, orgId } = await managerClient();
    const email = uniqueEmail("csrf-invite");
    const res = await client.fetch("/api/team/invites", {
      method: "POST",
      headers: { "content-type": "text/plain", origin: "https://evil.example" },
      body: JSON.stringify({ email, role: "manager" }),
    });
    expect(res.status).toBe(403);
    expect((await res.json()).error).toMatch(/Riser's own pages/);
    expect(await invitesFor(orgId, email)).toEqual([]);
  });

  it("refuses JSON sent with another site's Origin, or marked cross-site by the browser", async () => {
    const { client, orgId } = await managerClient();
    const email = uniqueEmail("csrf-json");
    const body = JSON.stringify({ email, role: "learner" });
    const evil = await client.fetch("/api/team/invites", { method: "POST", headers: { "content-type": "application/json", origin: "https://evil.example" }, body });
    expect(evil.status).toBe(403);
    const nullOrigin = await client.fetch("/api/team/invites", { method: "POST", headers: { "content-type": "application/json", origin: "null" }, body });
    expect(nullOrigin.status).toBe(403);
    const crossSite = await client.fetch("/api/team/invites", { method: "POST", headers: { "content-type": "application/json", "sec-fetch-site": "cross-site" }, body });
    expect(crossSite.status).toBe(403);
    expect(await invitesFor(orgId, email)).toEqual([]);
    // the same request from Riser's own page goes through
    const own = await client.fetch("/api/team/invites", { method: "POST", headers: { "content-type": "application/json", origin: APP, "sec-fetch-site": "same-origin" }, body });
    expect(own.status).toBe(201);
    expect(await invitesFor(orgId, email)).toHaveLength(1);
  });

  it("answers 415 for a body that is not declared JSON, even from Riser's own origin", async () => {
    const { client, orgId } = await managerClient();
    const email = uniqueEmail("plain");
    const res = await client.fetch("/api/team/invites", { method: "POST", headers: { "content-type": "text/plain", origin: APP }, body: JSON.stringify({ email, role: "learner" }) });
    expect(res.status).toBe(415);
    expect((await res.json()).error).toMatch(/JSON/);
    expect(await invitesFor(orgId, email)).toEqual([]);
  });
});

const signUpBody = (email: string) => ({ name: "Tamsin Orlet", email, password: "a-long-sign-up-pass-7", organizationName: "Orlet Fire Systems" });

async function signUpFrom(ip: string, email: string) {
  const res = await fetchFrom(ip, `${APP}/api/account/sign-up`, { method: "POST", headers: { "content-type": "application/json", origin: APP }, body: JSON.stringify(signUpBody(email)) });
  return { status: res.status, cookie: cookiesOf(res), body: (await res.json()) as { error?: string } };
}

describe("sign-up abuse", () => {
  it("rate limits sign-ups from one client (each one mails a stranger)", async () => {
    const ip = freshIp();
    const max = Number(process.env.SIGN_UP_RATE_LIMIT_MAX ?? 5);
    const statuses: number[] = [];
    for (let i = 0; i < 15; i++) statuses.push((await signUpFrom(ip, uniqueEmail("burst"))).status);
    expect(statuses.slice(0, max).every((s) => s === 201)).toBe(true);
    expect(statuses.slice(max).every((s) => s === 429)).toBe(true);
  });

  it("rate limits sign-ups for one address, whatever client sends them", async () => {
    const email = uniqueEmail("oneaddr");
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) statuses.push((await signUpFrom(freshIp(), email)).status);
    expect(statuses).toEqual([201, 201, 201, 429]);
  });

  it("a pending sign-up does not squat the address: the next sign-up replaces it and its trial organization", async () => {
    const email = uniqueEmail("squat");
    expect((await signUpFrom(freshIp(), email)).status).toBe(201);
    const [first] = await db.select({ id: user.id, org: user.organizationId }).from(user).where(eq(user.email, email));
    expect((await signUpFrom(freshIp(), email)).status).toBe(201);
    const rows = await db.select({ id: user.id }).from(user).where(eq(user.email, email));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.id).not.toBe(first!.id);
    expect(await db.select({ id: organization.id }).from(organization).where(eq(organization.id, first!.org!))).toEqual([]);
  });

  it("confirming someone else's sign-up clears their password: the mailbox's owner chooses one", async () => {
    const email = uniqueEmail("prehijack");
    const attackerPassword = "attacker-chose-this-1";
    const attacker = await fetchFrom(freshIp(), `${APP}/api/account/sign-up`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP },
      body: JSON.stringify({ ...signUpBody(email), password: attackerPassword }),
    });
    expect(attacker.status).toBe(201);
    // The owner of the address opens the link in their own browser (no sign-up cookie).
    const link = linkIn((await waitForMail(email, /confirm/i)).text);
    const opened = await fetchFrom(freshIp(), link, { redirect: "manual" });
    expect([302, 303, 307]).toContain(opened.status);
    const location = new URL(opened.headers.get("location")!, APP);
    expect(location.pathname).toBe("/reset-password");
    const token = location.searchParams.get("token")!;
    expect(token).toBeTruthy();

    // The password chosen at sign-up no longer works.
    const tryAttacker = await fetchFrom(freshIp(), `${APP}/api/auth/sign-in/email`, { method: "POST", headers: { "content-type": "application/json", origin: APP }, body: JSON.stringify({ email, password: attackerPassword }) });
    expect(tryAttacker.status).toBe(401);

    // The owner chooses a password with the token and signs in.
    const ownerPassword = "owner-chose-this-one-2";
    const reset = await postJson(anonymous(), "/api/auth/reset-password", { newPassword: ownerPassword, token });
    expect(reset.status).toBe(200);
    const owner = await signIn(email, ownerPassword);
    const me = await (await owner.fetch("/api/auth/get-session")).json();
    expect(me.user.email).toBe(email);
  });

  it("expires unverified accounts and their empty trial organizations (jobs mechanism)", async () => {
    const orgId = randomUUID();
    const userId = randomUUID();
    const email = uniqueEmail("stale");
    const old = new Date(Date.now() - 72 * 3_600_000);
    await db.insert(organization).values({ id: orgId, name: `Stale Trial ${userId.slice(0, 8)}`, kind: "contractor", seats: 3, trialEndsAt: new Date(Date.now() + 86_400_000) });
    await db.insert(user).values({ id: userId, name: "Stale Person", email, emailVerified: false, role: "manager", organizationId: orgId, createdAt: old, updatedAt: old });
    await db.insert(account).values({ id: randomUUID(), accountId: userId, providerId: "credential", userId, password: "x" });
    const res = await anonymous().fetch("/api/jobs/run?job=unverified-accounts-expire", { method: "POST", headers: { "x-jobs-secret": process.env.JOBS_SECRET! } });
    expect(res.status).toBe(200);
    expect(await db.select({ id: user.id }).from(user).where(eq(user.id, userId))).toEqual([]);
    expect(await db.select({ id: organization.id }).from(organization).where(eq(organization.id, orgId))).toEqual([]);
  });
});

describe("password rules at sign-up", () => {
  it("refuses a password under 15 characters, and one on the common-password list, with a field error", async () => {
    const short = await postJson(anonymous(), "/api/account/sign-up", { ...signUpBody(uniqueEmail("shortpw")), password: "fourteen-chars" });
    expect(short.status).toBe(400);
    expect((short.json.fieldErrors as Record<string, string[]>).password?.[0]).toMatch(/15 characters/);
    const email = uniqueEmail("commonpw");
    const common = await postJson(anonymous(), "/api/account/sign-up", { ...signUpBody(email), password: "qwerty123456789" });
    expect(common.status).toBe(400);
    expect((common.json.fieldErrors as Record<string, string[]>).password?.[0]).toMatch(/common or breached/);
    expect(await db.select({ id: user.id }).from(user).where(eq(user.email, email))).toEqual([]);
  });
});

describe("local-only mail", () => {
  it("the test instance (RISER_LOCAL=1 on loopback) has /dev/mail", async () => {
    expect((await anonymous().fetch("/dev/mail")).status).toBe(200);
  });
});
