/** Test people for the admin and account tests, created straight in the test database (verified e-mail, credential password), so that tests never change demo people. */
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { hashPassword } from "better-auth/crypto";
import { db } from "@/db/client";
import { account, organization, team, user } from "@/db/schema";
import { uniqueEmail } from "./http";

export const PERSON_PASSWORD = "test-person-pass-2026";

export async function orgIdByName(name: string): Promise<string> {
  const [o] = await db.select({ id: organization.id }).from(organization).where(eq(organization.name, name));
  if (!o) throw new Error(`no organization ${name}`);
  return o.id;
}

/** An organization of the test's own with one team, so that tests never add people to the demo organizations. */
export async function createTestOrganization(name: string, kind: "contractor" | "builder" = "contractor") {
  const id = randomUUID();
  const teamId = randomUUID();
  const fullName = `${name} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
  await db.insert(organization).values({ id, name: fullName, kind, seats: 50 });
  await db.insert(team).values({ id: teamId, organizationId: id, name: "Test crew" });
  return { id, name: fullName, teamId };
}

export async function createPerson(opts: { tag: string; role?: "learner" | "sales" | "manager" | "admin"; organizationId?: string | null; name?: string; password?: string }) {
  const id = randomUUID();
  const email = uniqueEmail(opts.tag);
  const password = opts.password ?? PERSON_PASSWORD;
  await db.insert(user).values({
    id,
    name: opts.name ?? `Test ${opts.tag}`,
    email,
    emailVerified: true,
    role: opts.role ?? "learner",
    organizationId: opts.organizationId ?? null,
  });
  await db.insert(account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: await hashPassword(password) });
  return { id, email, password };
}
