// Demo data: `npm run db:seed` (skips when the database already holds organizations). Local
// profiles only: the demo people share one published password, so the seed refuses to run unless
// RISER_LOCAL=1 on a loopback APP_URL (what scripts/ set). The content catalog is synced by
// scripts/migrate.ts on every instance; a real instance gets its first admin from `npm run admin:create`.
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { hashPassword, symmetricEncrypt } from "better-auth/crypto";
import { db, pool } from "@/db/client";
import { account, organization, team, twoFactor, user } from "@/db/schema";
import { isLocalInstance } from "@/lib/env";
import { seedCertificates } from "@/lib/certificates";
import { seedSignOffs } from "@/lib/signoffs";
import { DEMO_ADMIN_TOTP_SECRET, DEMO_ORGS, DEMO_PASSWORD, DEMO_PEOPLE, demoByRole } from "@/db/demo";
import { seedTeamDemo } from "./seed-team";

if (!isLocalInstance({ RISER_LOCAL: process.env.RISER_LOCAL === "1" ? "1" : "0", APP_URL: process.env.APP_URL ?? "" })) {
  console.error(
    "[seed] Refused: demo data (people with a published password) loads only on a local profile (RISER_LOCAL=1 and a loopback APP_URL).\n" +
      "  For a real instance: npm run db:migrate, then npm run admin:create -- --email you@company.com (README, \"Run Riser for real\").",
  );
  process.exit(1);
}

async function seedDemo() {
  const existing = await db.select({ id: organization.id }).from(organization).limit(1);
  if (existing.length) {
    console.log("[seed] organizations exist: demo data left as it is");
    return;
  }
  const hash = await hashPassword(DEMO_PASSWORD);
  const orgIds: Record<string, string> = {};
  const teamIds: Record<string, string> = {};
  await db.transaction(async (tx) => {
    for (const o of DEMO_ORGS) {
      const id = randomUUID();
      orgIds[o.key] = id;
      await tx.insert(organization).values({ id, name: o.name, kind: o.kind, seats: o.seats });
      for (const t of o.teams) {
        const tid = randomUUID();
        teamIds[`${o.key}/${t}`] = tid;
        await tx.insert(team).values({ id: tid, organizationId: id, name: t });
      }
    }
    for (const p of DEMO_PEOPLE) {
      const id = randomUUID();
      await tx.insert(user).values({
        id,
        name: p.name,
        email: p.email,
        emailVerified: true,
        role: p.role,
        organizationId: p.org ? orgIds[p.org]! : null,
        teamId: p.org && p.team ? teamIds[`${p.org}/${p.team}`]! : null,
        language: p.language ?? "en",
      });
      await tx.insert(account).values({ id: randomUUID(), accountId: id, providerId: "credential", userId: id, password: hash });
    }
  });
  console.log(`[seed] demo: ${DEMO_ORGS.length} organizations, ${DEMO_PEOPLE.length} people`);
}

/**
 * Admins must use two-step sign-in (lib/access), so the demo admin is enrolled with the published demo
 * authenticator key (db/demo.ts; README). The secret is stored the way better-auth's twoFactor plugin
 * stores it (encrypted with BETTER_AUTH_SECRET). Runs on every seed; enrols only once.
 */
async function seedDemoSecondFactor() {
  const [admin] = await db.select({ id: user.id, on: user.twoFactorEnabled }).from(user).where(eq(user.email, demoByRole("admin").email));
  if (!admin || admin.on) return;
  const key = process.env.BETTER_AUTH_SECRET!;
  const backupCodes = await symmetricEncrypt({ key, data: JSON.stringify([]) });
  await db.transaction(async (tx) => {
    await tx.delete(twoFactor).where(eq(twoFactor.userId, admin.id));
    await tx.insert(twoFactor).values({ id: randomUUID(), userId: admin.id, secret: await symmetricEncrypt({ key, data: DEMO_ADMIN_TOTP_SECRET }), backupCodes, verified: true });
    await tx.update(user).set({ twoFactorEnabled: true }).where(eq(user.id, admin.id));
  });
  console.log("[seed] demo admin: two-step sign-in with the demo authenticator key");
}

try {
  await seedDemo();
  await seedDemoSecondFactor();
  await seedCertificates();
  await seedSignOffs();
  await seedTeamDemo();
} finally {
  await pool.end();
}
