// Setting up a real instance: demo data (people with a published password) refuses to load outside
// the local profiles, the content catalog is synced by the migration step any instance runs (no demo
// data needed), and `npm run admin:create` makes an administrator with no password and a
// one-time link where its owner chooses one.
import { spawnSync } from "node:child_process";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { DEMO_PASSWORD } from "@/db/demo";
import { account, catalogModule, user } from "@/db/schema";
import { anonymous, APP, fetchFrom, freshIp, postJson, signIn, uniqueEmail } from "../helpers/http";
import { codeForUri } from "../helpers/totp";

afterAll(() => pool.end());
const root = path.resolve(import.meta.dirname, "../..");
const tsx = (script: string, args: string[], env: NodeJS.ProcessEnv) =>
  spawnSync(path.join(root, "node_modules/.bin/tsx"), ["--conditions=react-server", path.join(root, script), ...args], { cwd: root, env, encoding: "utf8", timeout: 60_000 });

describe("demo data", () => {
  it("refuses to load without the local flag and writes nothing", async () => {
    // a hosted-like environment: the test database, no local conveniences
    const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "development" };
    for (const k of ["RISER_LOCAL", "MAIL_CATCHER_URL", "INSECURE_COOKIES", "STRIPE_API_HOST", "STRIPE_API_PORT", "STRIPE_API_PROTOCOL"]) delete env[k];
    const before = await db.select({ id: user.id }).from(user);
    const r = tsx("scripts/seed/seed.ts", [], env);
    expect(r.status, r.stdout + r.stderr).toBe(1);
    expect(r.stderr).toMatch(/Refused: demo data/);
    expect(r.stderr).toMatch(/admin:create/);
    expect((await db.select({ id: user.id }).from(user)).length).toBe(before.length);
  });
});

describe("catalog sync", () => {
  it("runs with the migrations on a hosted-like instance, without the demo data", async () => {
    const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "development" };
    for (const k of ["RISER_LOCAL", "MAIL_CATCHER_URL", "INSECURE_COOKIES", "STRIPE_API_HOST", "STRIPE_API_PORT", "STRIPE_API_PROTOCOL"]) delete env[k];
    const started = new Date(Date.now() - 1_000);
    const r = tsx("scripts/migrate.ts", [], env);
    expect(r.status, r.stdout + r.stderr).toBe(0);
    expect(r.stdout).toMatch(/catalog synced/);
    const rows = await db.select({ slug: catalogModule.slug, syncedAt: catalogModule.syncedAt, retiredAt: catalogModule.retiredAt }).from(catalogModule);
    // every module of content/modules was written by this run (the content folder is the outside reference)
    const { readdirSync } = await import("node:fs");
    const onDisk = readdirSync(path.join(root, "content/modules"), { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name);
    for (const slug of onDisk) {
      const row = rows.find((x) => x.slug === slug);
      expect(row, slug).toBeDefined();
      expect(row!.retiredAt, slug).toBeNull();
      expect(row!.syncedAt!.getTime(), slug).toBeGreaterThanOrEqual(started.getTime());
    }
  });
});

describe("admin:create", () => {
  it("creates an admin with no password and a one-time link to choose one", async () => {
    const email = uniqueEmail("firstadmin");
    const r = tsx("scripts/admin-create.ts", ["--email", email, "--name", "Ottoline Brisk"], process.env);
    expect(r.status, r.stdout + r.stderr).toBe(0);
    const link = r.stdout.match(/https?:\/\/\S+\/reset-password\?token=\S+/)?.[0];
    expect(link, r.stdout).toBeTruthy();
    const [row] = await db.select({ id: user.id, role: user.role, verified: user.emailVerified }).from(user).where(eq(user.email, email));
    expect(row).toMatchObject({ role: "admin", verified: true });
    expect(await db.select({ id: account.id }).from(account).where(eq(account.userId, row!.id))).toEqual([]);

    // nothing known signs in: not the demo password
    const demo = await fetchFrom(freshIp(), `${APP}/api/auth/sign-in/email`, { method: "POST", headers: { "content-type": "application/json", origin: APP }, body: JSON.stringify({ email, password: DEMO_PASSWORD }) });
    expect(demo.status).toBe(401);

    const token = new URL(link!).searchParams.get("token")!;
    const chosen = "first-admin-chooses-this-9";
    expect((await postJson(anonymous(), "/api/auth/reset-password", { newPassword: chosen, token })).status).toBe(200);
    // the link works once
    expect((await postJson(anonymous(), "/api/auth/reset-password", { newPassword: "another-try-at-it-10", token })).status).toBe(400);
    const admin = await signIn(email, chosen);
    // admins must use two-step sign-in: the console stays closed until the new admin enrols
    const closed = await admin.fetch("/api/admin/people");
    expect(closed.status).toBe(403);
    expect(((await closed.json()) as { code?: string }).code).toBe("SECOND_FACTOR_REQUIRED");
    const started = await postJson(admin, "/api/auth/two-factor/enable", { password: chosen });
    expect(started.status).toBe(200);
    const uri = started.json.totpURI as string;
    const verified = await fetchFrom(freshIp(), `${APP}/api/auth/two-factor/verify-totp`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: APP, cookie: admin.cookie },
      body: JSON.stringify({ code: codeForUri(uri) }),
    });
    expect(verified.status).toBe(200);
    // from now on the sign-in asks for the code (computed by otpauth from the enrolment URI)
    const enrolled = await signIn(email, chosen, freshIp(), () => codeForUri(uri));
    expect((await enrolled.fetch("/api/admin/people")).status).toBe(200);

    const again = tsx("scripts/admin-create.ts", ["--email", email], process.env);
    expect(again.status).toBe(1);
    expect(again.stderr).toMatch(/already has an account/);
  });
});
