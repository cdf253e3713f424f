/**
 * Fixtures for the team-management tests, written straight into the test database: a fresh
 * organization with named teams, people with a known password, sessions without a password
 * sign-in, and certificates with serials reserved from the shared counter (as issuing does).
 */
import { randomBytes, randomInt, randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { account, catalogLesson, catalogModule, certificate, certificateSerialCounter, lessonProgress, moduleCompletion, organization, quizAttempt, team, user } from "@/db/schema";
import { APP, fetchFrom, freshIp, type Client } from "./http";
import { sessionCookieFor } from "./people";

export const FIXTURE_PASSWORD = "team-fixture-pass-2026";
const DAY = 86_400_000;
export const daysFromNow = (n: number) => new Date(Date.now() + n * DAY);

let hash: Promise<string> | null = null;
const passwordHash = () => (hash ??= hashPassword(FIXTURE_PASSWORD));

const suffix = () => `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

export type FixtureOrg = { id: string; name: string; teams: Record<string, string> };

export async function fixtureOrg(name: string, opts: { seats?: number; teams?: string[] } = {}): Promise<FixtureOrg> {
  const id = randomUUID();
  const full = `${name} ${suffix()}`;
  await db.insert(organization).values({ id, name: full, kind: "contractor", seats: opts.seats ?? 100 });
  const teams: Record<string, string> = {};
  for (const t of opts.teams ?? []) {
    teams[t] = randomUUID();
    await db.insert(team).values({ id: teams[t]!, organizationId: id, name: t });
  }
  return { id, name: full, teams };
}

export type FixturePerson = { id: string; name: string; email: string; organizationId: string; teamId: string | null };

export async function fixturePerson(org: { id: string }, p: { name: string; email?: string; role?: "learner" | "sales" | "manager"; teamId?: string | null }): Promise<FixturePerson> {
  const id = randomUUID();
  const email = p.email ?? `${p.name.toLowerCase().replace(/[^a-z]+/g, ".")}.${suffix()}@team-fixture.example`;
  await db.insert(user).values({ id, name: p.name, email, emailVerified: true, role: p.role ?? "learner", organizationId: org.id, teamId: p.teamId ?? null });
  await db.insert(account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: await passwordHash() });
  return { id, name: p.name, email, organizationId: org.id, teamId: p.teamId ?? null };
}

/** A signed-in client for a fixture person (a session row, no password round trip). */
export async function clientOf(userId: string): Promise<Client> {
  const cookie = await sessionCookieFor(userId);
  const ip = freshIp();
  return {
    cookie,
    ip,
    fetch: (path, init = {}) =>
      fetchFrom(ip, `${APP}${path}`, { redirect: "manual", ...init, headers: { origin: APP, cookie, ...(init.headers as Record<string, string> | undefined) } }),
  };
}

export async function lessonsDone(person: FixturePerson, moduleSlug: string, count: number, at = daysFromNow(-5)) {
  const rows = await db
    .select({ id: catalogLesson.id })
    .from(catalogLesson)
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(eq(catalogModule.slug, moduleSlug))
    .orderBy(catalogLesson.position);
  const ids = rows.slice(0, count).map((r) => r.id);
  if (ids.length) await db.insert(lessonProgress).ignore().values(ids.map((lessonId) => ({ userId: person.id, lessonId, completedAt: at })));
  return rows.length;
}

export async function gradedAttempt(person: FixturePerson, moduleSlug: string, passed: boolean, at = daysFromNow(-2)): Promise<string> {
  const id = randomUUID();
  await db.insert(quizAttempt).values({
    id,
    userId: person.id,
    organizationId: person.organizationId,
    moduleSlug,
    seed: randomInt(1, 2 ** 31),
    status: "graded",
    startedAt: new Date(at.getTime() - 20 * 60_000),
    submittedAt: at,
    score: passed ? 90 : 40,
    passed,
    passMark: 80,
  });
  return id;
}

/** A completion and its module certificate with the given expiry (serial reserved from the counter). */
export async function completedWithCertificate(person: FixturePerson, moduleSlug: string, opts: { completedAt: Date; expiresAt: Date; revoked?: boolean; holderName?: string }) {
  const attemptId = await gradedAttempt(person, moduleSlug, true, opts.completedAt);
  const [c] = await db.insert(moduleCompletion).values({ userId: person.id, moduleSlug, attemptId, completedAt: opts.completedAt, note: "test fixture" });
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
    completionId: c.insertId,
    issuedAt: opts.completedAt,
    expiresAt: opts.expiresAt,
    revokedAt: opts.revoked ? new Date() : null,
  });
}

export async function getJson<T = Record<string, unknown>>(client: Client, path: string): Promise<{ status: number; body: T }> {
  const res = await client.fetch(path);
  const text = await res.text();
  let body: unknown = null;
  try {
    body = JSON.parse(text);
  } catch {
    body = text;
  }
  return { status: res.status, body: body as T };
}

export async function uploadRoster(client: Client, path: string, bytes: Uint8Array | string, fileName = "roster.csv", fields: Record<string, string> = {}) {
  const form = new FormData();
  const data = typeof bytes === "string" ? new TextEncoder().encode(bytes) : bytes;
  form.set("file", new Blob([Uint8Array.from(data)], { type: "text/csv" }), fileName);
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  const res = await client.fetch(path, { method: "POST", body: form });
  return { status: res.status, json: (await res.json().catch(() => ({}))) as Record<string, unknown> };
}
