// The admin console's route handlers against the running app and MariaDB: each admin action writes
// exactly one audit row naming the admin, the target and the client address; non-admins change
// nothing; a ban signs the person out and keeps them out until it is lifted.
import { and, eq, gt, max } from "drizzle-orm";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, organization, user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { APP, anonymous, fetchFrom, freshIp, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { createPerson, createTestOrganization, orgIdByName } from "../helpers/fixtures";

let admin: Client;
let adminId: string;
let quillmoor: string;
// the tests' own organizations: nobody is added to or moved into the demo organizations
let orgA: { id: string; name: string; teamId: string };
let orgB: { id: string; name: string; teamId: string };

beforeAll(async () => {
  admin = await signIn(demoByRole("admin").email);
  const [a] = await db.select({ id: user.id }).from(user).where(eq(user.email, demoByRole("admin").email));
  adminId = a!.id;
  quillmoor = await orgIdByName("Quillmoor Fire Protection");
  orgA = await createTestOrganization("Fenwick Ridge Sprinklers");
  orgB = await createTestOrganization("Tamsworth Builders", "builder");
});
afterAll(() => pool.end());

async function lastAuditId(): Promise<number> {
  const [r] = await db.select({ id: max(auditLog.id) }).from(auditLog);
  return r?.id ?? 0;
}

/** Audit rows written after `since` for one target. */
async function auditSince(since: number, targetId: string) {
  return db.select().from(auditLog).where(and(gt(auditLog.id, since), eq(auditLog.targetId, targetId)));
}

function expectOneRow(rows: (typeof auditLog.$inferSelect)[], action: string, client: Client) {
  expect(rows.map((r) => r.action)).toEqual([action]);
  const row = rows[0]!;
  expect(row.actorId).toBe(adminId);
  expect(row.actorEmail).toBe(demoByRole("admin").email);
  expect(row.ip).toBe(client.ip);
  return row;
}

async function sessionOf(client: Client) {
  return (await client.fetch("/api/auth/get-session")).json();
}

async function trySignIn(email: string, password: string) {
  return fetchFrom(freshIp(), `${APP}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP },
    body: JSON.stringify({ email, password }),
  });
}

describe("organizations", () => {
  it("create and rename each write one audit row; the list shows seats and people", async () => {
    const name = `Brackenridge Sprinkler ${Date.now().toString(36)}`;
    const since = await lastAuditId();
    const created = await postJson(admin, "/api/admin/organizations", { name, kind: "contractor", seats: 7 });
    expect(created.status).toBe(201);
    const id = created.json.id as string;
    const createRow = expectOneRow(await auditSince(since, id), "organization.create", admin);
    expect(createRow.targetType).toBe("organization");
    expect(createRow.organizationId).toBe(id);

    const list = await (await admin.fetch(`/api/admin/organizations?q=${encodeURIComponent(name)}`)).json();
    expect(list.rows).toEqual([expect.objectContaining({ id, name, seats: 7, members: 0, teams: 0 })]);

    // The demo contractor's member count is what the demo data holds (db/demo.ts: 9 people).
    const demo = await (await admin.fetch(`/api/admin/organizations?q=Quillmoor`)).json();
    const q = demo.rows.find((r: { id: string }) => r.id === quillmoor);
    const [{ n }] = (await pool.query("select count(*) as n from user where organization_id = ?", [quillmoor]))[0] as [{ n: number }];
    expect(q.members).toBe(Number(n));
    expect(q.members).toBeGreaterThanOrEqual(9);

    const since2 = await lastAuditId();
    const renamed = await postJson(admin, `/api/admin/organizations/${id}`, { name: `${name} West` });
    expect(renamed.status).toBe(200);
    const renameRow = expectOneRow(await auditSince(since2, id), "organization.rename", admin);
    expect(renameRow.details).toEqual({ from: name, to: `${name} West` });

    // A duplicate name is a field error and writes nothing.
    const since3 = await lastAuditId();
    const dup = await postJson(admin, `/api/admin/organizations/${id}`, { name: "Larkhaven Homes" });
    expect(dup.status).toBe(400);
    expect((dup.json.fieldErrors as Record<string, string[]>).name?.[0]).toMatch(/exists/);
    expect(await auditSince(since3, id)).toEqual([]);
  });

  it("refuses bad input with field errors", async () => {
    const res = await postJson(admin, "/api/admin/organizations", { name: "X", kind: "bank", seats: -1 });
    expect(res.status).toBe(400);
    const fe = res.json.fieldErrors as Record<string, string[]>;
    expect(Object.keys(fe).sort()).toEqual(["kind", "name", "seats"]);
  });
});

describe("people", () => {
  it("lists across organizations with search, role and organization filters, sorted and paged on the server", async () => {
    const r = await (await admin.fetch(`/api/admin/people?q=quillmoor.example&role=learner&organizationId=${quillmoor}&sort=email&dir=desc&pageSize=5`)).json();
    expect(r.total).toBeGreaterThanOrEqual(8); // db/demo.ts: eight Quillmoor learners
    expect(r.rows).toHaveLength(5);
    for (const p of r.rows) {
      expect(p.role).toBe("learner");
      expect(p.email).toContain("quillmoor.example");
      expect(p.organization).toBe("Quillmoor Fire Protection");
      expect(p).not.toHaveProperty("password");
    }
    const emails = r.rows.map((p: { email: string }) => p.email);
    expect(emails).toEqual([...emails].sort().reverse());
    const page2 = await (await admin.fetch(`/api/admin/people?q=quillmoor.example&role=learner&organizationId=${quillmoor}&sort=email&dir=desc&pageSize=5&page=2`)).json();
    expect(page2.rows.length).toBe(Math.min(5, r.total - 5));
    for (const p of page2.rows) expect(emails).not.toContain(p.email);
    expect(page2.rows[0].email < emails.at(-1)).toBe(true);
  });

  it("a role change needs a reason, goes through better-auth, and writes one audit row", async () => {
    const p = await createPerson({ tag: "role", organizationId: orgA.id });
    const person = await signIn(p.email, p.password);
    const since = await lastAuditId();
    const noReason = await postJson(admin, `/api/admin/people/${p.id}/role`, { role: "manager" });
    expect(noReason.status).toBe(400);
    expect((noReason.json.fieldErrors as Record<string, string[]>).reason?.[0]).toMatch(/reason/i);
    expect(await auditSince(since, p.id)).toEqual([]);

    const ok = await postJson(admin, `/api/admin/people/${p.id}/role`, { role: "manager", reason: "Leads the South crew from January" });
    expect(ok.status).toBe(200);
    const row = expectOneRow(await auditSince(since, p.id), "user.role", admin);
    expect(row).toMatchObject({ targetType: "user", organizationId: orgA.id, reason: "Leads the South crew from January", details: { from: "learner", to: "manager" } });
    // The person's own session sees the new role at once.
    expect((await sessionOf(person)).user.role).toBe("manager");
    // An unknown role is refused.
    expect((await postJson(admin, `/api/admin/people/${p.id}/role`, { role: "owner", reason: "Not a role" })).status).toBe(400);
  });

  it("a change whose audit row cannot be written is not applied: both commit or neither (one transaction)", async () => {
    // The audit row is made to fail in the database itself (an address longer than audit_log.ip's
    // varchar(64), refused by MariaDB's strict mode); the role change before it must roll back.
    const { changeRole } = await import("@/lib/admin");
    const p = await createPerson({ tag: "role-atomic", organizationId: orgA.id });
    const since = await lastAuditId();
    await expect(changeRole({ id: adminId, email: demoByRole("admin").email }, p.id, "manager", "Audit row fails on purpose", { headers: new Headers(), ip: "9".repeat(200) })).rejects.toThrow();
    const [row] = await db.select({ role: user.role }).from(user).where(eq(user.id, p.id));
    expect(row!.role).toBe("learner");
    expect(await auditSince(since, p.id)).toEqual([]);
    // the same change with a writable audit row goes through, with its row
    await changeRole({ id: adminId, email: demoByRole("admin").email }, p.id, "manager", "Audit row fine", { headers: new Headers(), ip: "127.0.0.1" });
    expect((await db.select({ role: user.role }).from(user).where(eq(user.id, p.id)))[0]!.role).toBe("manager");
    expect(await auditSince(since, p.id)).toHaveLength(1);
  });

  it("an admin cannot change their own role", async () => {
    const res = await postJson(admin, `/api/admin/people/${adminId}/role`, { role: "learner", reason: "Trying to lock myself out" });
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/own role/);
  });

  it("moving a person to another organization clears their team and writes one audit row", async () => {
    const p = await createPerson({ tag: "move", organizationId: orgA.id });
    await db.update(user).set({ teamId: orgA.teamId }).where(eq(user.id, p.id));
    const since = await lastAuditId();
    const res = await postJson(admin, `/api/admin/people/${p.id}/organization`, { organizationId: orgB.id, reason: "Joined the builder's sales office" });
    expect(res.status).toBe(200);
    const [after] = await db.select({ org: user.organizationId, team: user.teamId }).from(user).where(eq(user.id, p.id));
    expect(after).toEqual({ org: orgB.id, team: null });
    const row = expectOneRow(await auditSince(since, p.id), "user.move", admin);
    expect(row.details).toMatchObject({ from: orgA.id, to: orgB.id, teamCleared: orgA.teamId });
    expect((await postJson(admin, `/api/admin/people/${p.id}/organization`, { organizationId: "no-such-org" })).status).toBe(400);
  });

  it("a ban signs the person out and keeps them out; lifted, they can sign in again", async () => {
    const p = await createPerson({ tag: "ban", organizationId: orgA.id });
    const person = await signIn(p.email, p.password);
    expect((await sessionOf(person))?.user.email).toBe(p.email);

    const since = await lastAuditId();
    expect((await postJson(admin, `/api/admin/people/${p.id}/ban`, {})).status).toBe(400); // reason required
    const ban = await postJson(admin, `/api/admin/people/${p.id}/ban`, { reason: "Shared the account with a subcontractor" });
    expect(ban.status).toBe(200);
    expectOneRow(await auditSince(since, p.id), "user.ban", admin);

    expect(await sessionOf(person)).toBeNull();
    expect((await person.fetch("/api/account/sessions")).status).toBe(401);
    const refused = await trySignIn(p.email, p.password);
    expect(refused.status).toBe(403);
    expect((await refused.json()).code).toBe("BANNED_USER");
    const banned = await (await admin.fetch(`/api/admin/people?status=banned&q=${encodeURIComponent(p.email)}`)).json();
    expect(banned.rows).toEqual([expect.objectContaining({ id: p.id, banned: true, banReason: "Shared the account with a subcontractor" })]);

    const since2 = await lastAuditId();
    const unban = await postJson(admin, `/api/admin/people/${p.id}/unban`, { reason: "Spoke with the manager" });
    expect(unban.status).toBe(200);
    expectOneRow(await auditSince(since2, p.id), "user.unban", admin);
    expect((await trySignIn(p.email, p.password)).status).toBe(200);
  });

  it("force sign-out ends every session of the person and writes one audit row", async () => {
    const p = await createPerson({ tag: "signout", organizationId: orgB.id, role: "sales" });
    const phone = await signIn(p.email, p.password);
    const laptop = await signIn(p.email, p.password);
    const since = await lastAuditId();
    const res = await postJson(admin, `/api/admin/people/${p.id}/sign-out`, { reason: "Lost phone" });
    expect(res.status).toBe(200);
    expect(res.json.sessionsEnded).toBe(2);
    const row = expectOneRow(await auditSince(since, p.id), "user.sign-out", admin);
    expect(row.details).toEqual({ sessionsEnded: 2 });
    expect(await sessionOf(phone)).toBeNull();
    expect(await sessionOf(laptop)).toBeNull();
  });

  it("non-admins are refused and nothing changes or is recorded", async () => {
    const p = await createPerson({ tag: "notadmin", organizationId: orgA.id });
    const manager = await signIn(demoByRole("manager", "quillmoor").email);
    const learner = await signIn(demoByRole("learner").email);
    const since = await lastAuditId();
    for (const client of [manager, learner]) {
      expect((await postJson(client, `/api/admin/people/${p.id}/ban`, { reason: "Trying without the admin role" })).status).toBe(403);
      expect((await postJson(client, `/api/admin/people/${p.id}/role`, { role: "admin", reason: "Trying to promote" })).status).toBe(403);
    }
    expect((await postJson(anonymous(), `/api/admin/people/${p.id}/ban`, { reason: "Anonymous try" })).status).toBe(401);
    const [after] = await db.select({ role: user.role, banned: user.banned }).from(user).where(eq(user.id, p.id));
    expect(after).toEqual({ role: "learner", banned: false });
    expect(await auditSince(since, p.id)).toEqual([]);
  });

  it("better-auth's own admin endpoints are not reachable over HTTP, not even for an admin (no unaudited path)", async () => {
    const p = await createPerson({ tag: "rawadmin", organizationId: orgA.id });
    const since = await lastAuditId();
    for (const [path, body] of [
      ["/api/auth/admin/ban-user", { userId: p.id }],
      ["/api/auth/admin/set-role", { userId: p.id, role: "admin" }],
      ["/api/auth/admin/impersonate-user", { userId: p.id }],
      ["/api/auth/admin/remove-user", { userId: p.id }],
    ] as const) {
      expect((await postJson(admin, path, body)).status, path).toBe(404);
    }
    expect((await admin.fetch(`/api/auth/admin/list-users`)).status).toBe(404);
    const [after] = await db.select({ role: user.role, banned: user.banned }).from(user).where(eq(user.id, p.id));
    expect(after).toEqual({ role: "learner", banned: false });
    expect(await auditSince(since, p.id)).toEqual([]);
  });

  it("refuses a change sent from another site's page", async () => {
    const p = await createPerson({ tag: "csrf", organizationId: orgA.id });
    const res = await admin.fetch(`/api/admin/people/${p.id}/ban`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "https://elsewhere.example" },
      body: JSON.stringify({ reason: "Forged from another site" }),
    });
    expect(res.status).toBe(403);
    const [after] = await db.select({ banned: user.banned }).from(user).where(eq(user.id, p.id));
    expect(after?.banned).toBe(false);
  });
});

describe("content", () => {
  it("shows synced counts and retired items; sync now writes one content.sync row", async () => {
    const status = await (await admin.fetch("/api/admin/content")).json();
    expect(status.repository.ok).toBe(true);
    expect(status.database.modules.live).toBe(status.repository.counts.modules);
    expect(status.database.lessons.live).toBe(status.repository.counts.lessons);
    expect(status.database.cards.live).toBe(status.repository.counts.cards);
    expect(status.lastSync).not.toBeNull();

    const since = await lastAuditId();
    const res = await postJson(admin, "/api/admin/content/sync", {});
    expect(res.status).toBe(200);
    expect(res.json.counts).toMatchObject({ modules: status.repository.counts.modules, lessons: status.repository.counts.lessons });
    const rows = (await db.select().from(auditLog).where(and(gt(auditLog.id, since), eq(auditLog.action, "content.sync")))).filter((r) => r.ip === admin.ip);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ actorId: adminId, targetType: "content", targetId: "catalog" });
    const after = await (await admin.fetch("/api/admin/content")).json();
    expect(new Date(after.lastSync.at).getTime()).toBeGreaterThan(new Date(status.lastSync.at).getTime());
  });
});

describe("mail log", () => {
  it("lists recipient, subject, status and time, with bodies (links removed) on a test instance", async () => {
    const p = await createPerson({ tag: "maillog", organizationId: orgA.id });
    const r = await postJson(anonymous(), "/api/auth/request-password-reset", { email: p.email, redirectTo: "/reset-password" });
    expect(r.status).toBe(200);
    await waitForMail(p.email, /reset/i);
    const log = await (await admin.fetch(`/api/admin/mail?q=${encodeURIComponent(p.email)}`)).json();
    expect(log.rows).toEqual([expect.objectContaining({ to: p.email, subject: "Reset your Riser password", status: "sent", kind: "password-reset" })]);
    // scripts/test.mjs runs a local instance (RISER_LOCAL=1, loopback APP_URL), so bodies are kept,
    // but the log never hands out the reset link itself (lib/admin/mail.ts).
    expect(log.bodiesVisible).toBe(true);
    expect(log.rows[0].body).toMatch(/Someone asked to reset the password/);
    expect(log.rows[0].body).toContain("[link removed]");
    expect(log.rows[0].body).not.toMatch(/https?:\/\/|token=/);
  });
});

describe("audit log", () => {
  it("filters by action, actor, organization and date range", async () => {
    const p = await createPerson({ tag: "auditfilter", organizationId: orgA.id });
    expect((await postJson(admin, `/api/admin/people/${p.id}/role`, { role: "sales", reason: "Moved to the showroom desk" })).status).toBe(200);
    const today = new Date().toISOString().slice(0, 10);
    const r = await (await admin.fetch(`/api/admin/audit?action=user.role&actor=admin@riser&organizationId=${orgA.id}&from=${today}&to=${today}`)).json();
    expect(r.total).toBeGreaterThanOrEqual(1);
    for (const row of r.rows) {
      expect(row.action).toBe("user.role");
      expect(row.actorEmail).toContain("admin@riser");
      expect(row.organizationId).toBe(orgA.id);
      expect(row.at.slice(0, 10)).toBe(today);
    }
    expect(r.rows.map((row: { targetId: string }) => row.targetId)).toContain(p.id);
    expect(r.actions).toEqual(expect.arrayContaining(["organization.create", "user.ban", "user.role"]));
    const past = await (await admin.fetch(`/api/admin/audit?action=user.role&from=2001-01-01&to=2001-01-02`)).json();
    expect(past.total).toBe(0);
  });

  it("exports CSV with formula cells neutralised (OWASP CSV Injection) and records the export", async () => {
    const evil = `=HYPERLINK("http://elsewhere.invalid","open") ${Date.now().toString(36)}`;
    const created = await postJson(admin, "/api/admin/organizations", { name: evil, kind: "builder", seats: 1 });
    expect(created.status).toBe(201);
    const since = await lastAuditId();
    const res = await admin.fetch(`/api/admin/audit/export?action=organization.create`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="riser-audit-log-\d{4}-\d{2}-\d{2}\.csv"/);
    const text = (await res.text()).replace(/^\uFEFF/, "");
    const rows = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
    expect(rows.every((r) => r.action === "organization.create")).toBe(true);
    const mine = rows.find((r) => r.target_id === created.json.id);
    expect(mine?.target).toBe(`'${evil}`);
    expect(mine?.organization).toBe(`'${evil}`);
    const exportRows = await db.select().from(auditLog).where(and(gt(auditLog.id, since), eq(auditLog.action, "audit.export"), eq(auditLog.actorId, adminId)));
    expect(exportRows).toHaveLength(1);
    // and no other organization got renamed or created by the export
    expect((await db.select({ id: organization.id }).from(organization).where(eq(organization.name, evil))).length).toBe(1);
  });
});

describe("account e-mail change goes out as mail the admin can see", () => {
  it("logs the verification mail to the new address", async () => {
    const p = await createPerson({ tag: "mailchange", organizationId: orgA.id });
    const client = await signIn(p.email, p.password);
    const next = uniqueEmail("mailchange-new");
    // an e-mail change needs the current password (lib/auth/guards.ts)
    expect((await postJson(client, "/api/auth/change-email", { newEmail: next, callbackURL: "/account?email=changed", password: p.password })).status).toBe(200);
    await waitForMail(next, /new e-mail/i);
    const log = await (await admin.fetch(`/api/admin/mail?q=${encodeURIComponent(next)}`)).json();
    expect(log.rows[0]).toMatchObject({ to: next, kind: "change-email", status: "sent" });
  });
});
