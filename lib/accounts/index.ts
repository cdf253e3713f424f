import "server-only";
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { APIError } from "better-auth/api";
import { db } from "@/db/client";
import { organization, user } from "@/db/schema";
import { auth } from "@/lib/auth";
import { TRIAL } from "@/lib/billing";
import { signupContext, type SignupPlacement } from "@/lib/auth";
import type { SignUpInput } from "@/lib/auth";
import { addDays } from "@/lib/dates";

/** The trial allowance is set with the seat prices, in lib/billing/plans.ts. */
export const TRIAL_SEATS = TRIAL.seats;
export const TRIAL_DAYS = TRIAL.days;

type Outcome = { ok: true; userId: string } | { ok: false; message: string; fieldErrors?: Record<string, string[]> };

export async function emailTaken(email: string): Promise<boolean> {
  const rows = await db.select({ id: user.id }).from(user).where(eq(user.email, email.toLowerCase())).limit(1);
  return rows.length > 0;
}

/** Creates an account through better-auth, placed in an organization with a role. */
export async function createAccount(
  input: { name: string; email: string; password: string },
  placement: SignupPlacement,
  headers: Headers,
  callbackURL = "/sign-in?verified=1",
): Promise<Outcome> {
  if (await emailTaken(input.email)) {
    return { ok: false, message: "Some fields need attention.", fieldErrors: { email: ["An account with this e-mail exists. Sign in, or reset the password."] } };
  }
  try {
    const res = await signupContext.run(placement, () =>
      auth.api.signUpEmail({ body: { name: input.name, email: input.email, password: input.password, callbackURL }, headers }),
    );
    return { ok: true, userId: res.user.id };
  } catch (err) {
    if (err instanceof APIError) {
      const msg = err.body?.message ?? err.message;
      if (/already exists/i.test(msg)) return { ok: false, message: "Some fields need attention.", fieldErrors: { email: ["An account with this e-mail exists."] } };
      if (/password/i.test(msg)) return { ok: false, message: "Some fields need attention.", fieldErrors: { password: [msg] } };
      return { ok: false, message: msg };
    }
    throw err;
  }
}

/** Sign-up: a new organization on its trial allowance, and its first manager. Nothing remains if a step fails. */
export async function createOrganizationWithManager(input: SignUpInput, headers: Headers, language: "en" | "es" = "en"): Promise<Outcome> {
  if (await emailTaken(input.email)) {
    return { ok: false, message: "Some fields need attention.", fieldErrors: { email: ["An account with this e-mail exists. Sign in, or reset the password."] } };
  }
  const organizationId = randomUUID();
  await db.insert(organization).values({
    id: organizationId,
    name: input.organizationName,
    kind: "contractor",
    seats: TRIAL_SEATS,
    trialEndsAt: addDays(new Date(), TRIAL_DAYS),
    // invitations start in the language the company signed up in; the manager can change it
    defaultLanguage: language,
  });
  try {
    const result = await createAccount(input, { organizationId, teamId: null, role: "manager", language }, headers);
    if (!result.ok) await db.delete(organization).where(eq(organization.id, organizationId));
    return result;
  } catch (err) {
    await db.delete(organization).where(eq(organization.id, organizationId));
    throw err;
  }
}
