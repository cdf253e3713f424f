/**
 * Test organizations and people created straight in the test database (verified e-mail, credential
 * password), used by the quiz tests.
 */
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { db } from "@/db/client";
import { account, organization, team, user } from "@/db/schema";
import { uniqueEmail } from "./http";

export const TEST_PASSWORD = "test-people-pass-2026";

/** A contractor organization with one team; the name gets a unique suffix so that runs do not collide. */
export async function createOrganization(name: string, seats = 1000): Promise<{ id: string; teamId: string }> {
  const id = randomUUID();
  const teamId = randomUUID();
  await db.insert(organization).values({ id, name: `${name} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`, kind: "contractor", seats });
  await db.insert(team).values({ id: teamId, organizationId: id, name: "Test crew" });
  return { id, teamId };
}

export type TestPerson = { id: string; name: string; email: string };

/** `count` people in one organization (one password hash for all: hashing is slow on purpose). */
export async function createPeople(
  count: number,
  opts: { organizationId: string; teamId?: string | null; role?: "learner" | "sales" | "manager" | "admin"; tag?: string },
): Promise<TestPerson[]> {
  const hash = await hashPassword(TEST_PASSWORD);
  const people: TestPerson[] = Array.from({ length: count }, (_, i) => ({ id: randomUUID(), name: `Test ${opts.tag ?? "person"} ${i + 1}`, email: uniqueEmail(opts.tag ?? "person") }));
  for (let i = 0; i < people.length; i += 100) {
    const batch = people.slice(i, i + 100);
    await db.insert(user).values(
      batch.map((p) => ({ id: p.id, name: p.name, email: p.email, emailVerified: true, role: opts.role ?? "learner", organizationId: opts.organizationId, teamId: opts.teamId ?? null })),
    );
    await db.insert(account).values(batch.map((p) => ({ id: randomUUID(), accountId: p.id, providerId: "credential", userId: p.id, password: hash })));
  }
  return people;
}

/**
 * A session for a person created above, without a password sign-in (scrypt is slow by design):
 * a session row plus the cookie better-auth expects — the token signed with HMAC-SHA256 (base64).
 */
export async function sessionCookieFor(userId: string): Promise<string> {
  const { randomBytes } = await import("node:crypto");
  const { session } = await import("@/db/schema");
  const token = randomBytes(24).toString("base64url");
  await db.insert(session).values({ id: randomUUID(), token, userId, expiresAt: new Date(Date.now() + 86_400_000), updatedAt: new Date() });
  const key = await crypto.subtle.importKey("raw", new TextEncoder().encode(process.env.BETTER_AUTH_SECRET!), { name: "HMAC", hash: "SHA-256" }, false, ["sign"]);
  const sig = Buffer.from(await crypto.subtle.sign("HMAC", key, new TextEncoder().encode(token))).toString("base64");
  return `better-auth.session_token=${encodeURIComponent(`${token}.${sig}`)}`;
}
