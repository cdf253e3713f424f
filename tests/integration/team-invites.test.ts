// Invitations end to end through the real route handlers, MariaDB and the local mail catcher:
// invite → mail → /invite/[token] → account inside the organization → sign-in; a used, replaced
// or expired link is refused with its reason; re-inviting a member changes nothing; the seat rule.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, invitation, user } from "@/db/schema";
import { APP, anonymous, linkIn, mailsTo, postJson, signIn, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { clientOf, fixtureOrg, fixturePerson, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";

const PASSWORD = "joined-by-invite-42";
let org: FixtureOrg;
let manager: FixturePerson;
let mgr: Client;

beforeAll(async () => {
  org = await fixtureOrg("Brindlecote Sprinkler Co", { seats: 10, teams: ["Rough-in crew", "Trim crew"] });
  manager = await fixturePerson(org, { name: "Wilhelmina Sarrow", role: "manager" });
  mgr = await clientOf(manager.id);
});
afterAll(() => pool.end());

const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");
const tokenOf = (link: string) => new URL(link).pathname.split("/").pop()!;

async function pageText(path: string) {
  const res = await anonymous().fetch(path);
  return { status: res.status, html: await res.text() };
}

describe("invite one person", () => {
  it("runs end to end: mail, single-use link, account in the organization, verified, signed in", async () => {
    const email = uniqueEmail("invitee");
    const res = await postJson(mgr, "/api/team/invites", { email, name: "Ottilie Brask", role: "learner", teamId: org.teams["Trim crew"] });
    expect(res.status).toBe(201);
    expect(res.json.message).toMatch(/Invitation sent/);

    const mail = await waitForMail(email, /invited to train with Brindlecote/);
    expect(mail.text).toContain("Wilhelmina Sarrow");
    expect(mail.text).toMatch(/expires on .*\(7 days\)/);
    const link = linkIn(mail.text);
    expect(link.startsWith(`${APP}/invite/`)).toBe(true);
    const token = tokenOf(link);
    expect(token.length).toBeGreaterThanOrEqual(43); // 32 random bytes, base64url = 256 bits (≥ 128 asked)

    // Only the hash is stored, and it expires 7 days after sending.
    const [row] = await db.select().from(invitation).where(and(eq(invitation.organizationId, org.id), eq(invitation.email, email)));
    expect(row!.tokenHash).toBe(sha256(token));
    expect(JSON.stringify(row)).not.toContain(token);
    expect(Math.round((row!.expiresAt.getTime() - row!.createdAt.getTime()) / 86_400_000)).toBe(7);
    const [sent] = await db.select().from(auditLog).where(and(eq(auditLog.action, "invite.send"), eq(auditLog.targetId, row!.id)));
    expect(sent?.actorId).toBe(manager.id);

    const page = await pageText(`/invite/${token}`);
    expect(page.status).toBe(200);
    expect(page.html).toContain("Join Brindlecote");
    expect(page.html).toContain(email);
    expect(page.html).toMatch(/autocomplete="new-password"/i); // the account form (its password field)

    const accepted = await postJson(anonymous(), "/api/invite/accept", { token, name: "Ottilie Brask", password: PASSWORD, confirm: PASSWORD });
    expect(accepted.status).toBe(201);
    const [u] = await db.select().from(user).where(eq(user.email, email));
    expect(u).toMatchObject({ organizationId: org.id, teamId: org.teams["Trim crew"], role: "learner", emailVerified: true, name: "Ottilie Brask" });
    const [acc] = await db.select().from(auditLog).where(and(eq(auditLog.action, "invite.accept"), eq(auditLog.targetId, row!.id)));
    expect(acc?.actorId).toBe(u!.id);

    // Verified by the invitation: sign-in works at once.
    const client = await signIn(email, PASSWORD);
    const session = await (await client.fetch("/api/auth/get-session")).json();
    expect(session.user).toMatchObject({ email, organizationId: org.id, role: "learner" });

    // The link is single-use.
    const again = await postJson(anonymous(), "/api/invite/accept", { token, name: "Someone Else", password: PASSWORD, confirm: PASSWORD });
    expect(again.status).toBe(410);
    expect(again.json.error).toMatch(/already created with this link/);
    const reused = await pageText(`/invite/${token}`);
    expect(reused.html).toContain("This invitation has been used");
    // no account form: the page carries the message catalog for its client parts, so the check is on
    // the form's own password field, not on the button's words
    expect(reused.html).not.toMatch(/autocomplete="new-password"/i);
  });

  it("refuses an expired link clearly and creates nothing", async () => {
    const token = randomBytes(32).toString("base64url");
    const email = uniqueEmail("expired");
    await db.insert(invitation).values({
      id: randomUUID(),
      organizationId: org.id,
      email,
      role: "learner",
      tokenHash: sha256(token),
      invitedBy: manager.id,
      createdAt: new Date(Date.now() - 8 * 86_400_000),
      expiresAt: new Date(Date.now() - 86_400_000),
    });
    const page = await pageText(`/invite/${token}`);
    expect(page.status).toBe(200);
    expect(page.html).toContain("This invitation has expired");
    expect(page.html).toMatch(/invitation links work for 7 days/);
    const res = await postJson(anonymous(), "/api/invite/accept", { token, name: "Late Comer", password: PASSWORD, confirm: PASSWORD });
    expect(res.status).toBe(410);
    expect(res.json.error).toMatch(/expired/);
    expect(await db.select().from(user).where(eq(user.email, email))).toEqual([]);
  });

  it("refuses an unknown link without saying whose it might be", async () => {
    const page = await pageText(`/invite/${randomBytes(32).toString("base64url")}`);
    expect(page.html).toContain("This invitation link is not valid");
  });

  it("re-inviting a pending address replaces the link; the old one is refused as replaced", async () => {
    const email = uniqueEmail("twice");
    expect((await postJson(mgr, "/api/team/invites", { email, role: "sales" })).status).toBe(201);
    const first = tokenOf(linkIn((await waitForMail(email, /invited/)).text));
    const second = await postJson(mgr, "/api/team/invites", { email, role: "sales" });
    expect(second.status).toBe(201);
    expect(second.json.message).toMatch(/earlier link no longer works/);
    const page = await pageText(`/invite/${first}`);
    expect(page.html).toContain("This invitation was replaced");
    const open = await db.select().from(invitation).where(and(eq(invitation.organizationId, org.id), eq(invitation.email, email)));
    expect(open.filter((i) => !i.revokedAt && !i.acceptedAt)).toHaveLength(1);
  });

  it("re-inviting an existing member does nothing harmful and says so", async () => {
    const member = await fixturePerson(org, { name: "Kaspar Ludd", teamId: org.teams["Rough-in crew"] });
    const before = (await mailsTo(member.email)).length;
    const res = await postJson(mgr, "/api/team/invites", { email: member.email, role: "manager", teamId: org.teams["Trim crew"] });
    expect(res.status).toBe(409);
    expect(res.json.error).toBe(`Kaspar Ludd (${member.email}) is already a member of ${org.name}. Nothing was sent and nothing changed.`);
    const [u] = await db.select().from(user).where(eq(user.id, member.id));
    expect(u).toMatchObject({ role: "learner", teamId: org.teams["Rough-in crew"] });
    expect(await db.select().from(invitation).where(eq(invitation.email, member.email))).toEqual([]);
    await new Promise((r) => setTimeout(r, 300));
    expect((await mailsTo(member.email)).length).toBe(before);
  });

  it("names bad fields and refuses another organization's team", async () => {
    const bad = await postJson(mgr, "/api/team/invites", { email: "nope", role: "boss" });
    expect(bad.status).toBe(400);
    const fe = bad.json.fieldErrors as Record<string, string[]>;
    expect(fe.email?.[0]).toMatch(/e-mail/i);
    expect(fe.role?.[0]).toMatch(/learner, sales or manager/);
    const other = await fixtureOrg("Other Sprinkler Co", { teams: ["Theirs"] });
    const res = await postJson(mgr, "/api/team/invites", { email: uniqueEmail("x"), role: "learner", teamId: other.teams.Theirs });
    expect(res.status).toBe(400);
    expect((res.json.fieldErrors as Record<string, string[]>).teamId?.[0]).toMatch(/your organization's teams/);
  });

  it("learners cannot invite", async () => {
    const learner = await fixturePerson(org, { name: "Ida Pennock" });
    const res = await postJson(await clientOf(learner.id), "/api/team/invites", { email: uniqueEmail("x"), role: "learner" });
    expect(res.status).toBe(403);
  });
});

describe("seats", () => {
  it("active members + open invitations may not pass organization.seats; the refusal names the billing page", async () => {
    const small = await fixtureOrg("Tiny Sprinkler Co", { seats: 3 });
    const boss = await fixturePerson(small, { name: "Rollo Vane", role: "manager" });
    const client = await clientOf(boss.id);
    await fixturePerson(small, { name: "Mira Vane" });
    expect((await postJson(client, "/api/team/invites", { email: uniqueEmail("seat"), role: "learner" })).status).toBe(201); // 3 of 3
    const full = await postJson(client, "/api/team/invites", { email: uniqueEmail("seat"), role: "learner" });
    expect(full.status).toBe(409);
    expect(full.json.error).toBe("Your organization has 3 seats; buy more on the billing page.");
    expect(full.json.billingUrl).toBe("/team/billing");
    expect((await db.select().from(invitation).where(eq(invitation.organizationId, small.id))).length).toBe(1);
  });
});
