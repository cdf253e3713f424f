/**
 * Test organizations and people created straight in the test database (verified e-mail, credential
 * password), used by the quiz tests.
 *
 * NOTE: reconstructed from its call sites in tests/integration/quiz.test.ts after this file was
 * overwritten by mistake; the quiz area's author should check it against their original.
 */
import { randomUUID } from "node:crypto";
import { hashPassword } from "better-auth/crypto";
import { db } from "@/db/client";
import { account, organization, team, user } from "@/db/schema";
import { uniqueEmail } from "./http";

export const TEST_PASSWORD = "test-people-pass-2026";

/** A contractor organization with one team; the name gets a unique suffix so that runs do not collide. */
export async function createOrganization(name: string): Promise<{ id: string; teamId: string }> {
  const id = randomUUID();
  const teamId = randomUUID();
  await db.insert(organization).values({ id, name: `${name} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`, kind: "contractor", seats: 1000 });
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
