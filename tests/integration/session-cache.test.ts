// The session cookie cache (lib/auth/session-cache.ts): a signed copy of the session saves the
// database round trip per request, and a change to the person still takes effect within the stated
// bound. The test profile trusts a copy for SESSION_CACHE_MAX_AGE_S seconds (3, set by
// scripts/test.mjs and honoured on local instances only) instead of production's 60: the same code
// path, a shorter clock. Changes written straight to the database stand for a change made through
// another app server (this server's in-process versions do not move); changes made through this
// server's own routes take effect at once.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { session, user } from "@/db/schema";
import { postJson, signIn, type Client } from "../helpers/http";
import { createPerson, createTestOrganization } from "../helpers/fixtures";

const MAX_AGE_MS = Number(process.env.SESSION_CACHE_MAX_AGE_S ?? 60) * 1000;
// one request's time on a busy machine plus the poll step
const SLACK_MS = 2000;
const LESSON = "/modules/freeze-protection/where-homes-freeze";

let org: { id: string };
beforeAll(async () => {
  org = await createTestOrganization("Fenwick Sprinkler Service");
});
afterAll(() => pool.end());

const sessionOf = async (c: Client) => (await c.fetch("/api/auth/get-session")).json();
const accountStatus = async (c: Client) => (await c.fetch("/api/account/sessions")).status;

/** Polls until `done` holds; returns when it did, in ms since `from` (fails past the bound). */
async function within(from: number, done: () => Promise<boolean>): Promise<number> {
  for (;;) {
    if (await done()) return Date.now() - from;
    if (Date.now() - from > MAX_AGE_MS + SLACK_MS) return Infinity;
    await new Promise((r) => setTimeout(r, 200));
  }
}

/**
 * A signed-in person. The copy in the cookie was written between `asked` and `signedAt` (the
 * sign-in answer): it is younger than now − asked, and stops being trusted by signedAt + max age —
 * before any change made after signing in is a max age old.
 */
async function signedInPerson(tag: string) {
  const p = await createPerson({ tag, organizationId: org.id });
  const asked = Date.now();
  const client = await signIn(p.email, p.password);
  const signedAt = Date.now();
  // the sign-in answer carries the signed copy: the cache is on
  expect(client.cookie).toMatch(/better-auth\.session_data=/);
  return { p, client, asked, signedAt };
}

/** While the copy is surely young, the change is not seen yet: proof that no database read happened. */
async function expectStillCached(asked: number, check: () => Promise<void>) {
  if (Date.now() - asked < MAX_AGE_MS - 1000) await check();
}

describe("session cookie cache", () => {
  it("is trusted for at most 60 s in any deployment", () => {
    expect(MAX_AGE_MS).toBeGreaterThan(0);
    expect(MAX_AGE_MS).toBeLessThanOrEqual(60_000);
  });

  it("a sign-out everywhere, a ban and a role change made on another app server take effect within the bound", async () => {
    const [ended, banned, promoted] = await Promise.all([signedInPerson("cache-end"), signedInPerson("cache-ban"), signedInPerson("cache-role")]);

    await db.delete(session).where(eq(session.userId, ended.p.id));
    await db.update(user).set({ banned: true, banReason: "Bound test" }).where(eq(user.id, banned.p.id));
    await db.update(user).set({ role: "manager" }).where(eq(user.id, promoted.p.id));

    await expectStillCached(ended.asked, async () => expect((await sessionOf(ended.client))?.user.email).toBe(ended.p.email));
    await expectStillCached(banned.asked, async () => expect(await accountStatus(banned.client)).toBe(200));
    await expectStillCached(promoted.asked, async () => expect((await sessionOf(promoted.client)).user.role).toBe("learner"));

    const [endedAfter, bannedAfter, promotedAfter] = await Promise.all([
      within(ended.signedAt, async () => (await sessionOf(ended.client)) === null && (await accountStatus(ended.client)) === 401),
      within(banned.signedAt, async () => (await accountStatus(banned.client)) === 401),
      within(promoted.signedAt, async () => (await sessionOf(promoted.client))?.user.role === "manager"),
    ]);
    expect(endedAfter, "sessions ended").toBeLessThanOrEqual(MAX_AGE_MS + SLACK_MS);
    expect(bannedAfter, "banned").toBeLessThanOrEqual(MAX_AGE_MS + SLACK_MS);
    expect(promotedAfter, "role changed").toBeLessThanOrEqual(MAX_AGE_MS + SLACK_MS);
    // a lesson page (checked in proxy.ts) refuses the banned person too
    const lesson = await banned.client.fetch(LESSON);
    expect(lesson.status).toBe(307);
    expect(lesson.headers.get("location")).toContain("/sign-in");
  });

  it("the same changes made through this app server take effect at once", async () => {
    const admin = await signIn("admin@riser.example");
    const [ended, banned, promoted] = await Promise.all([signedInPerson("now-end"), signedInPerson("now-ban"), signedInPerson("now-role")]);
    // warm: each copy has been used once, by a route handler and by the proxy and page of a lesson
    // (both remember an accepted copy, lib/auth/session-read.ts)
    for (const c of [ended, banned, promoted]) {
      expect(await accountStatus(c.client)).toBe(200);
      expect((await c.client.fetch(LESSON)).status).toBe(200);
    }

    expect((await postJson(admin, `/api/admin/people/${ended.p.id}/sign-out`, { reason: "Lost phone" })).status).toBe(200);
    expect((await postJson(admin, `/api/admin/people/${banned.p.id}/ban`, { reason: "Shared the account" })).status).toBe(200);
    expect((await postJson(admin, `/api/admin/people/${promoted.p.id}/role`, { role: "manager", reason: "Leads the crew" })).status).toBe(200);

    expect(await sessionOf(ended.client)).toBeNull();
    expect(await accountStatus(ended.client)).toBe(401);
    expect(await accountStatus(banned.client)).toBe(401);
    expect((await sessionOf(promoted.client)).user.role).toBe("manager");
    for (const c of [ended, banned]) {
      const lesson = await c.client.fetch(LESSON);
      expect(lesson.status).toBe(307);
      expect(lesson.headers.get("location")).toContain("/sign-in");
    }
  });
});
