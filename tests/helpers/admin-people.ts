/** Test people for the admin and account tests, created straight in the test database (verified e-mail, credential password), so that tests never change demo people. */
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { hashPassword } from "better-auth/crypto";
import { db } from "@/db/client";
import { account, organization, user } from "@/db/schema";
import { uniqueEmail } from "./http";

export const PERSON_PASSWORD = "test-person-pass-2026";

export async function orgIdByName(name: string): Promise<string> {
  const [o] = await db.select({ id: organization.id }).from(organization).where(eq(organization.name, name));
  if (!o) throw new Error(`no organization ${name}`);
  return o.id;
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
