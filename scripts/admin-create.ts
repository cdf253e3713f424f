// The first administrator of a real instance (README, "Run Riser for real"):
//   npm run admin:create -- --email you@company.com [--name "Your Name"]
// Creates the account with no password and prints a one-time link (valid 24 hours) where its owner
// chooses one; nothing known to anyone else is ever planted. Refuses an address already in use.
import { randomBytes, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db, pool } from "@/db/client";
import { user, verification } from "@/db/schema";
import { audit } from "@/lib/audit";
import { email as emailSchema, personName } from "@/lib/auth/browser";
import { env } from "@/lib/env";

const LINK_HOURS = 24;

function arg(name: string): string | undefined {
  const argv = process.argv.slice(2);
  const i = argv.indexOf(`--${name}`);
  if (i >= 0) return argv[i + 1];
  return argv.find((a) => a.startsWith(`--${name}=`))?.slice(name.length + 3);
}

function fail(message: string): never {
  console.error(`[admin:create] ${message}`);
  process.exit(1);
}

const parsedEmail = emailSchema.safeParse(arg("email") ?? "");
if (!parsedEmail.success) fail(`Give the administrator's e-mail: npm run admin:create -- --email you@company.com (${z.prettifyError(parsedEmail.error)})`);
const email = parsedEmail.data;
const parsedName = personName.safeParse(arg("name") ?? email.split("@")[0]!);
if (!parsedName.success) fail(`--name: ${z.prettifyError(parsedName.error)}`);
const name = parsedName.data;

try {
  const [existing] = await db.select({ id: user.id, role: user.role }).from(user).where(eq(user.email, email));
  if (existing) fail(`${email} already has an account (role ${existing.role}). Choose another address, or change roles on the admin screen.`);
  const id = randomUUID();
  const token = randomBytes(24).toString("base64url");
  await db.transaction(async (tx) => {
    await tx.insert(user).values({ id, name, email, emailVerified: true, role: "admin", organizationId: null, teamId: null });
    // better-auth's own reset token: /reset-password?token=… sets the first password (and creates the credential)
    await tx.insert(verification).values({ id: randomUUID(), identifier: `reset-password:${token}`, value: id, expiresAt: new Date(Date.now() + LINK_HOURS * 3_600_000) });
    await audit({ actor: null, organizationId: null, action: "user.create-admin", targetType: "user", targetId: id, ip: null, details: { email, via: "admin:create" } }, tx);
  });
  const link = `${env.APP_URL}/reset-password?token=${encodeURIComponent(token)}`;
  console.log(`[admin:create] Administrator ${name} <${email}> created. It has no password yet.\n\n  Open this link within ${LINK_HOURS} hours to choose one (it works once):\n  ${link}\n\n  Keep it private: whoever opens it first sets the password.`);
} finally {
  await pool.end();
}
