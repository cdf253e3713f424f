/**
 * The one place tests create their own data, straight in the test database: organizations with
 * teams, people (verified e-mail, credential password), sessions without a password sign-in,
 * lesson progress and reading, quiz attempts, completions and certificates. Tests build on these
 * instead of changing demo people. The names of the older helpers (createOrganization, fixtureOrg,
 * createTestOrganization; createPeople, fixturePerson, createPerson) are kept as thin shapes over
 * the same two inserts, so the tests that use them read as before. No test-runner imports: the
 * benchmarks in bench/ use these too.
 */
import { randomBytes, randomInt, randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import {
  account,
  catalogLesson,
  catalogModule,
  certificate,
  certificateSerialCounter,
  lessonOpen,
  lessonProgress,
  moduleCompletion,
  organization,
  quizAttempt,
  session,
  team,
  user,
} from "@/db/schema";
import { addDays, DAY_MS } from "@/lib/dates";
import { APP, fetchFrom, freshIp, postJson, uniqueEmail, type Client } from "./http";

export const TEST_PASSWORD = "test-people-pass-2026";
export const FIXTURE_PASSWORD = "team-fixture-pass-2026";
export const PERSON_PASSWORD = "test-person-pass-2026";
export const daysFromNow = (n: number) => addDays(new Date(), n);

type Role = "learner" | "sales" | "manager" | "admin";
const suffix = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
/** Hashing is slow on purpose (scrypt): one hash per password per test file. */
const hashes = new Map<string, Promise<string>>();
const hashOf = (password: string) => {
  let h = hashes.get(password);
  if (!h) hashes.set(password, (h = hashPassword(password)));
  return h;
};

// ——— organizations ———

/** An organization of the test's own with named teams; the name gets a unique suffix so that runs do not collide. */
export async function insertOrganization(name: string, opts: { seats?: number; kind?: "contractor" | "builder"; teams?: string[] } = {}) {
  const id = randomUUID();
  const fullName = `${name} ${suffix()}`;
  await db.insert(organization).values({ id, name: fullName, kind: opts.kind ?? "contractor", seats: opts.seats ?? 100 });
  const teams: Record<string, string> = {};
  for (const t of opts.teams ?? []) {
    teams[t] = randomUUID();
    await db.insert(team).values({ id: teams[t]!, organizationId: id, name: t });
  }
  return { id, name: fullName, teams };
}

export async function createOrganization(name: string, seats = 1000): Promise<{ id: string; teamId: string }> {
  const o = await insertOrganization(name, { seats, teams: ["Test crew"] });
  return { id: o.id, teamId: o.teams["Test crew"]! };
}

export type FixtureOrg = { id: string; name: string; teams: Record<string, string> };
export const fixtureOrg = (name: string, opts: { seats?: number; teams?: string[] } = {}): Promise<FixtureOrg> => insertOrganization(name, opts);

export async function createTestOrganization(name: string, kind: "contractor" | "builder" = "contractor") {
  const o = await insertOrganization(name, { kind, seats: 50, teams: ["Test crew"] });
  return { id: o.id, name: o.name, teamId: o.teams["Test crew"]! };
}

export async function orgIdByName(name: string): Promise<string> {
  const [o] = await db.select({ id: organization.id }).from(organization).where(eq(organization.name, name));
  if (!o) throw new Error(`no organization ${name}`);
  return o.id;
}

// ——— people ———

type NewPerson = { name: string; email: string; role?: Role; organizationId: string | null; teamId?: string | null };

/** Inserts people and their credential accounts (in batches of 100) with one password. */
export async function insertPeople(people: NewPerson[], password: string): Promise<(NewPerson & { id: string })[]> {
  const hash = await hashOf(password);
  const rows = people.map((p) => ({ ...p, id: randomUUID() }));
  for (let i = 0; i < rows.length; i += 100) {
    const batch = rows.slice(i, i + 100);
    await db.insert(user).values(batch.map((p) => ({ id: p.id, name: p.name, email: p.email, emailVerified: true, role: p.role ?? "learner", organizationId: p.organizationId, teamId: p.teamId ?? null })));
    await db.insert(account).values(batch.map((p) => ({ id: randomUUID(), accountId: p.id, providerId: "credential", userId: p.id, password: hash })));
  }
  return rows;
}

export type TestPerson = { id: string; name: string; email: string };

/** `count` people in one organization, password TEST_PASSWORD. */
export async function createPeople(count: number, opts: { organizationId: string; teamId?: string | null; role?: Role; tag?: string }): Promise<TestPerson[]> {
  const tag = opts.tag ?? "person";
  const rows = await insertPeople(
    Array.from({ length: count }, (_, i) => ({ name: `Test ${tag} ${i + 1}`, email: uniqueEmail(tag), role: opts.role, organizationId: opts.organizationId, teamId: opts.teamId })),
    TEST_PASSWORD,
  );
  return rows.map(({ id, name, email }) => ({ id, name, email }));
}

export type FixturePerson = { id: string; name: string; email: string; organizationId: string; teamId: string | null };

/** One named person, password FIXTURE_PASSWORD. */
export async function fixturePerson(org: { id: string }, p: { name: string; email?: string; role?: "learner" | "sales" | "manager"; teamId?: string | null }): Promise<FixturePerson> {
  const email = p.email ?? `${p.name.toLowerCase().replace(/[^a-z]+/g, ".")}.${suffix()}@team-fixture.example`;
  const [row] = await insertPeople([{ name: p.name, email, role: p.role, organizationId: org.id, teamId: p.teamId }], FIXTURE_PASSWORD);
  return { id: row!.id, name: p.name, email, organizationId: org.id, teamId: p.teamId ?? null };
}

/** One person by tag (password PERSON_PASSWORD unless given), optionally outside any organization. */
export async function createPerson(opts: { tag: string; role?: Role; organizationId?: string | null; name?: string; password?: string }) {
  const password = opts.password ?? PERSON_PASSWORD;
  const [row] = await insertPeople([{ name: opts.name ?? `Test ${opts.tag}`, email: uniqueEmail(opts.tag), role: opts.role, organizationId: opts.organizationId ?? null }], password);
  return { id: row!.id, email: row!.email, password };
}

// ——— sessions ———

/**
 * A session for a person created above, without a password sign-in (scrypt is slow by design):
 * a session row plus the cookie better-auth expects — the token signed with HMAC-SHA256 (base64).
 */
export async function sessionCookieFor(userId: string): Promise<string> {
  const token = randomBytes(24).toString("base64url");
  await db.insert(session).values({ id: randomUUID(), token, userId, expiresAt: new Date(Date.now() + DAY_MS), updatedAt: new Date() });
  const key = await crypto.subtle.importKey("raw", new TextEncoder().encode(process.env.BETTER_AUTH_SECRET!), { name: "HMAC", hash: "SHA-256" }, false, ["sign"]);
  const sig = Buffer.from(await crypto.subtle.sign("HMAC", key, new TextEncoder().encode(token))).toString("base64");
  return `better-auth.session_token=${encodeURIComponent(`${token}.${sig}`)}`;
}

/** A signed-in client for a fixture person (a session row, no password round trip). */
export async function clientOf(userId: string): Promise<Client> {
  const cookie = await sessionCookieFor(userId);
  const ip = freshIp();
  return {
    cookie,
    ip,
    fetch: (path, init = {}) => fetchFrom(ip, `${APP}${path}`, { redirect: "manual", ...init, headers: { origin: APP, cookie, ...(init.headers as Record<string, string> | undefined) } }),
  };
}

// ——— lessons: reading time and progress ———

const lessonIdsOf = async (moduleSlug: string) =>
  (
    await db
      .select({ id: catalogLesson.id })
      .from(catalogLesson)
      .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
      .where(eq(catalogModule.slug, moduleSlug))
      .orderBy(catalogLesson.position)
  ).map((r) => r.id);

/** Progress rows written directly (the board and records tests need history, not the reading rule). */
export async function lessonsDone(person: { id: string }, moduleSlug: string, count: number, at = daysFromNow(-5)) {
  const all = await lessonIdsOf(moduleSlug);
  const ids = all.slice(0, count);
  if (ids.length) await db.insert(lessonProgress).ignore().values(ids.map((lessonId) => ({ userId: person.id, lessonId, completedAt: at })));
  return all.length;
}

const THROW_AWAY = /@test\.example$/i;

/** Opens each lesson page as the person (200 expected): the server records the first open. */
export async function openLessons(client: Client, moduleSlug: string, lessons: string[]) {
  for (const l of lessons) {
    const res = await client.fetch(`/modules/${moduleSlug}/${l}`);
    await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`open ${moduleSlug}/${l}: expected 200, got ${res.status}`);
  }
}

/**
 * Reading lessons honestly: the server stamps a person's first open with its own clock; this moves
 * that stamp `minutes` back for throw-away test people only (refuses demo people), as if the reading
 * time had passed. The app offers no client-side way around the seat-time rule.
 */
export async function backdateOpens(userId: string, moduleSlug: string, minutes = 24 * 60) {
  const [p] = await db.select({ email: user.email }).from(user).where(eq(user.id, userId));
  if (!p || !THROW_AWAY.test(p.email)) throw new Error("backdateOpens is only for throw-away test people (@test.example)");
  const ids = await lessonIdsOf(moduleSlug);
  if (!ids.length) return;
  await db
    .update(lessonOpen)
    .set({ firstOpenedAt: sql`${lessonOpen.firstOpenedAt} - INTERVAL ${minutes} MINUTE` })
    .where(and(eq(lessonOpen.userId, userId), inArray(lessonOpen.lessonId, ids)));
}

/** Opens, lets the reading time pass (back-dated) and marks every given lesson complete through the API. */
export async function readAndComplete(client: Client, userId: string, moduleSlug: string, lessons: string[]) {
  await openLessons(client, moduleSlug, lessons);
  await backdateOpens(userId, moduleSlug);
  const results = [];
  for (const l of lessons) {
    const r = await postJson(client, "/api/progress", { module: moduleSlug, lesson: l });
    if (r.status !== 200) throw new Error(`complete ${moduleSlug}/${l}: expected 200, got ${r.status}: ${r.text}`);
    results.push(r);
  }
  return results;
}

// ——— quiz attempts, completions, certificates ———

/** A graded attempt, as grading leaves it. */
export async function gradedAttempt(person: { id: string; organizationId: string | null }, moduleSlug: string, passed: boolean, at = daysFromNow(-2), opts: { score?: number; seed?: number } = {}): Promise<string> {
  const id = randomUUID();
  await db.insert(quizAttempt).values({
    id,
    userId: person.id,
    organizationId: person.organizationId,
    moduleSlug,
    seed: opts.seed ?? randomInt(1, 2 ** 31),
    status: "graded",
    startedAt: new Date(at.getTime() - 20 * 60_000),
    submittedAt: at,
    score: opts.score ?? (passed ? 90 : 40),
    passed,
    passMark: 80,
  });
  return id;
}

/** A completion row for a passing attempt; returns its id. */
export async function completion(userId: string, moduleSlug: string, attemptId: string, completedAt: Date, note?: string): Promise<number> {
  const [r] = await db.insert(moduleCompletion).values({ userId, moduleSlug, attemptId, completedAt, ...(note ? { note } : {}) });
  return r.insertId;
}

/** A completion and its module certificate with the given expiry (serial reserved from the counter, as issuing does). */
export async function completedWithCertificate(person: FixturePerson, moduleSlug: string, opts: { completedAt: Date; expiresAt: Date; revoked?: boolean; holderName?: string }) {
  const attemptId = await gradedAttempt(person, moduleSlug, true, opts.completedAt);
  const completionId = await completion(person.id, moduleSlug, attemptId, opts.completedAt, "test fixture");
  const year = opts.completedAt.getUTCFullYear();
  const n = await db.transaction(async (tx) => {
    await tx.insert(certificateSerialCounter).ignore().values({ year, lastNumber: 0 });
    const [row] = await tx.select().from(certificateSerialCounter).where(eq(certificateSerialCounter.year, year)).for("update");
    await tx.update(certificateSerialCounter).set({ lastNumber: sql`${certificateSerialCounter.lastNumber} + 1` }).where(eq(certificateSerialCounter.year, year));
    return row!.lastNumber + 1;
  });
  const [mod] = await db.select({ title: catalogModule.title, ceHours: catalogModule.ceHours }).from(catalogModule).where(eq(catalogModule.slug, moduleSlug));
  await db.insert(certificate).values({
    serial: `RSR-${year}-${String(n).padStart(6, "0")}`,
    serialYear: year,
    serialNumber: n,
    verificationCode: randomBytes(18).toString("base64url"),
    userId: person.id,
    holderName: opts.holderName ?? person.name,
    organizationId: person.organizationId,
    organizationName: "fixture",
    kind: "module",
    subjectSlug: moduleSlug,
    subjectTitle: mod!.title,
    ceHours: mod!.ceHours,
    completionId,
    issuedAt: opts.completedAt,
    expiresAt: opts.expiresAt,
    revokedAt: opts.revoked ? new Date() : null,
  });
}
