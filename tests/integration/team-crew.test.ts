// Running a crew through the real route handlers and MariaDB: teams (create, rename, archive),
// people (team, role, removal that frees the seat and keeps certificates verifiable), invitations
// (list with status, resend, revoke under concurrency), no cross-organization probing, and the
// roster-preview rate limit. Each change is checked with its audit row.
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { auditLog, certificate, invitation, session, team, user } from "@/db/schema";
import { anonymous, linkIn, mailsTo, postJson, uniqueEmail, waitForMail, type Client, getJson, uploadRoster } from "../helpers/http";
import { clientOf, completedWithCertificate, daysFromNow, fixtureOrg, fixturePerson, type FixtureOrg, type FixturePerson } from "../helpers/fixtures";

const PASSWORD = "crew-invitee-pass-77";
let org: FixtureOrg;
let other: FixtureOrg;
let manager: FixturePerson;
let otherManager: FixturePerson;
let mgr: Client;
let otherMgr: Client;

beforeAll(async () => {
  org = await fixtureOrg("Tallowmere Sprinkler", { seats: 20, teams: ["Rough-in crew"] });
  other = await fixtureOrg("Ferncastle Homes", { seats: 5, teams: ["Sales office"] });
  manager = await fixturePerson(org, { name: "Rosalind Ketter", role: "manager" });
  otherManager = await fixturePerson(other, { name: "Edmund Varle", role: "manager" });
  mgr = await clientOf(manager.id);
  otherMgr = await clientOf(otherManager.id);
});
afterAll(() => pool.end());

const auditRows = (action: string, targetId: string) => db.select().from(auditLog).where(and(eq(auditLog.action, action), eq(auditLog.targetId, targetId)));
const tokenOf = (link: string) => new URL(link).pathname.split("/").pop()!;

describe("teams", () => {
  it("a manager creates, renames and archives a team; names are unique; each change is audited", async () => {
    const created = await postJson(mgr, "/api/team/teams", { name: "Trim crew" });
    expect(created.status).toBe(201);
    const id = (created.json.team as { id: string }).id;
    expect((await auditRows("team.create", id)).length).toBe(1);

    const dup = await postJson(mgr, "/api/team/teams", { name: "Rough-in crew" });
    expect(dup.status).toBe(409);
    expect(dup.json.fieldErrors).toMatchObject({ name: ["Choose another name"] });

    const renamed = await postJson(mgr, `/api/team/teams/${id}`, { name: "Trim and finish crew" });
    expect(renamed.status).toBe(200);
    const [row] = await db.select().from(team).where(eq(team.id, id));
    expect(row!.name).toBe("Trim and finish crew");
    expect((await auditRows("team.rename", id))[0]!.details).toMatchObject({ from: "Trim crew", to: "Trim and finish crew" });

    // Another organization's manager can neither rename nor archive it.
    expect((await postJson(otherMgr, `/api/team/teams/${id}`, { name: "Taken over" })).status).toBe(403);
    expect((await postJson(otherMgr, `/api/team/teams/${id}`, { archived: true })).status).toBe(403);

    const archived = await postJson(mgr, `/api/team/teams/${id}`, { archived: true });
    expect(archived.status).toBe(200);
    expect((await db.select().from(team).where(eq(team.id, id)))[0]!.archivedAt).not.toBeNull();
    expect((await auditRows("team.archive", id)).length).toBe(1);
    // An archived team takes no new invitations.
    const inv = await postJson(mgr, "/api/team/invites", { email: uniqueEmail("arch"), role: "learner", teamId: id });
    expect(inv.status).toBe(400);
    const list = await getJson<{ teams: { id: string; archivedAt: string | null }[] }>(mgr, "/api/team/teams");
    expect(list.body.teams.find((t) => t.id === id)?.archivedAt).toBeTruthy();
    const otherList = await getJson<{ teams: { id: string }[] }>(otherMgr, "/api/team/teams");
    expect(otherList.body.teams.some((t) => t.id === id)).toBe(false);
  });
});

describe("people", () => {
  it("changes team and role (never admin), audited in the same change; refuses another organization", async () => {
    const p = await fixturePerson(org, { name: "Lucan Merriby", teamId: org.teams["Rough-in crew"] });
    const newTeam = await postJson(mgr, "/api/team/teams", { name: `Service crew ${Date.now()}` });
    const teamId = (newTeam.json.team as { id: string }).id;
    const res = await postJson(mgr, `/api/team/people/${p.id}`, { teamId, role: "sales" });
    expect(res.status).toBe(200);
    const [u] = await db.select().from(user).where(eq(user.id, p.id));
    expect(u).toMatchObject({ teamId, role: "sales", organizationId: org.id });
    const [a] = await auditRows("person.update", p.id);
    expect(a).toMatchObject({ actorId: manager.id, organizationId: org.id });
    expect(a!.details).toMatchObject({ team: { from: org.teams["Rough-in crew"], to: teamId }, role: { from: "learner", to: "sales" } });

    const admin = await postJson(mgr, `/api/team/people/${p.id}`, { role: "admin" });
    expect(admin.status).toBe(400);
    expect((await db.select().from(user).where(eq(user.id, p.id)))[0]!.role).toBe("sales");

    // Another organization's team, or another organization's manager: refused, nothing changes.
    expect((await postJson(mgr, `/api/team/people/${p.id}`, { teamId: other.teams["Sales office"] })).status).toBe(400);
    expect((await postJson(otherMgr, `/api/team/people/${p.id}`, { role: "manager" })).status).toBe(403);
    expect((await postJson(otherMgr, `/api/team/people/${p.id}/remove`, {})).status).toBe(403);
    expect((await db.select().from(user).where(eq(user.id, p.id)))[0]).toMatchObject({ role: "sales", organizationId: org.id });
    // A manager cannot change their own role (no lock-out) nor remove themselves.
    expect((await postJson(mgr, `/api/team/people/${manager.id}`, { role: "learner" })).status).toBe(400);
    expect((await postJson(mgr, `/api/team/people/${manager.id}/remove`, {})).status).toBe(400);
  });

  it("removing a person frees the seat, ends their sessions and keeps their certificate verifiable", async () => {
    const small = await fixtureOrg("Pellworth Fire", { seats: 2 });
    const boss = await fixturePerson(small, { name: "Agnes Thorley", role: "manager" });
    const leaver = await fixturePerson(small, { name: "Barnaby Quell" });
    await completedWithCertificate(leaver, "freeze-protection", { completedAt: daysFromNow(-30), expiresAt: daysFromNow(300) });
    const [cert] = await db.select().from(certificate).where(eq(certificate.userId, leaver.id));
    const leaverClient = await clientOf(leaver.id);
    const bossClient = await clientOf(boss.id);

    // Full: 2 seats, 2 members.
    const full = await postJson(bossClient, "/api/team/invites", { email: uniqueEmail("full"), role: "learner" });
    expect(full.status).toBe(409);

    const removed = await postJson(bossClient, `/api/team/people/${leaver.id}/remove`, {});
    expect(removed.status).toBe(200);
    const [u] = await db.select().from(user).where(eq(user.id, leaver.id));
    expect(u).toMatchObject({ organizationId: null, teamId: null, role: "learner" });
    expect(await db.select().from(session).where(eq(session.userId, leaver.id))).toEqual([]);
    expect((await leaverClient.fetch("/api/team/summary")).status).toBe(401);
    expect((await auditRows("person.remove", leaver.id))[0]).toMatchObject({ actorId: boss.id, organizationId: small.id });

    // The seat is free at once.
    expect((await postJson(bossClient, "/api/team/invites", { email: uniqueEmail("freed"), role: "learner" })).status).toBe(201);
    // The certificate still verifies, in the holder's name.
    const v = await getJson<{ serial: string; holderName: string; status: string }>(anonymous(), `/api/verify/${cert!.verificationCode}`);
    expect(v.status).toBe(200);
    expect(v.body).toMatchObject({ serial: cert!.serial, holderName: "Barnaby Quell", status: "valid" });
  });
});

describe("invitations", () => {
  it("lists invitations with status; resend issues a new link and the old one stops working", async () => {
    const email = uniqueEmail("resend");
    expect((await postJson(mgr, "/api/team/invites", { email, role: "learner" })).status).toBe(201);
    const first = tokenOf(linkIn((await waitForMail(email, /invited to train/)).text));
    const [row] = await db.select().from(invitation).where(and(eq(invitation.organizationId, org.id), eq(invitation.email, email)));
    const list = await getJson<{ invitations: { id: string; status: string }[] }>(mgr, "/api/team/invites");
    expect(list.body.invitations.find((i) => i.id === row!.id)?.status).toBe("pending");

    const again = await postJson(mgr, `/api/team/invites/${row!.id}/resend`, {});
    expect(again.status).toBe(200);
    const mails = await (async () => {
      for (let i = 0; i < 50; i++) {
        const m = await mailsTo(email);
        if (m.length >= 2) return m;
        await new Promise((r) => setTimeout(r, 100));
      }
      return mailsTo(email);
    })();
    const tokens = mails.map((m) => tokenOf(linkIn(m.text)));
    expect(new Set(tokens).size).toBe(2); // a fresh link, not the old one again
    const second = tokens.find((t) => t !== first)!;
    expect((await postJson(anonymous(), "/api/invite/accept", { token: first, name: "Old Link", password: PASSWORD, confirm: PASSWORD })).status).toBe(410);
    expect((await auditRows("invite.resend", row!.id)).length).toBe(1);
    expect((await postJson(otherMgr, `/api/team/invites/${row!.id}/resend`, {})).status).toBe(403);
    expect((await postJson(otherMgr, `/api/team/invites/${row!.id}/revoke`, {})).status).toBe(403);

    // Accepting sends no needless "Confirm your e-mail" message.
    expect((await postJson(anonymous(), "/api/invite/accept", { token: second, name: "Resent Person", password: PASSWORD, confirm: PASSWORD })).status).toBe(201);
    await new Promise((r) => setTimeout(r, 1500));
    expect((await mailsTo(email)).filter((m) => /Confirm your e-mail/.test(m.subject))).toEqual([]);
    const after = await getJson<{ invitations: { id: string; status: string }[] }>(mgr, "/api/team/invites");
    expect(after.body.invitations.find((i) => i.id === row!.id)?.status).toBe("accepted");
  });

  it("revoking frees the seat at once; revoke and accept at the same moment: exactly one wins", async () => {
    const tight = await fixtureOrg("Hobbleford Sprinkler", { seats: 2 });
    const boss = await fixturePerson(tight, { name: "Imogen Pardew", role: "manager" });
    const bossClient = await clientOf(boss.id);
    for (let round = 0; round < 4; round++) {
      const email = uniqueEmail(`race${round}`);
      expect((await postJson(bossClient, "/api/team/invites", { email, role: "learner" })).status).toBe(201);
      const token = tokenOf(linkIn((await waitForMail(email, /invited to train/)).text));
      const [row] = await db.select().from(invitation).where(and(eq(invitation.organizationId, tight.id), eq(invitation.email, email)));
      // Full now: a third person cannot be invited.
      expect((await postJson(bossClient, "/api/team/invites", { email: uniqueEmail("over"), role: "learner" })).status).toBe(409);
      const [revoke, accept] = await Promise.all([
        postJson(bossClient, `/api/team/invites/${row!.id}/revoke`, {}),
        postJson(anonymous(), "/api/invite/accept", { token, name: "Racing Person", password: PASSWORD, confirm: PASSWORD }),
      ]);
      const wins = [revoke.status === 200, accept.status === 201].filter(Boolean).length;
      expect(wins, `revoke ${revoke.status}, accept ${accept.status}`).toBe(1);
      const [fresh] = await db.select().from(invitation).where(eq(invitation.id, row!.id));
      expect(Boolean(fresh!.acceptedAt) !== Boolean(fresh!.revokedAt)).toBe(true);
      if (revoke.status === 200) {
        expect(await db.select().from(user).where(eq(user.email, email))).toEqual([]);
        expect((await auditRows("invite.revoke", row!.id)).length).toBe(1);
        // The seat is free at once: the next invitation fits; then withdraw it again for the next round.
        const next = await postJson(bossClient, "/api/team/invites", { email: uniqueEmail("next"), role: "learner" });
        expect(next.status).toBe(201);
        expect((await postJson(bossClient, `/api/team/invites/${next.json.id as string}/revoke`, {})).status).toBe(200);
      } else {
        expect(revoke.status).toBe(409);
        // Accepted: a member now; remove them to free the seat for the next round.
        const [u] = await db.select().from(user).where(eq(user.email, email));
        expect((await postJson(bossClient, `/api/team/people/${u!.id}/remove`, {})).status).toBe(200);
      }
    }
  });

  it("never tells a manager that an address has an account in another organization; acceptance resolves it", async () => {
    const outsider = await fixturePerson(other, { name: "Perpetua Snell" });
    const unknown = uniqueEmail("unknown");
    const a = await postJson(mgr, "/api/team/invites", { email: outsider.email, role: "learner" });
    const b = await postJson(mgr, "/api/team/invites", { email: unknown, role: "learner" });
    expect(a.status).toBe(201);
    expect(b.status).toBe(201);
    expect(String(a.json.message).replace(outsider.email, "X")).toBe(String(b.json.message).replace(unknown, "X"));

    const csv = `email,name,role,team\r\n${outsider.email},Perpetua Snell,learner,\r\n${uniqueEmail("csv")},New Person,learner,\r\n`;
    const preview = await uploadRoster(mgr, "/api/team/invites/preview", csv);
    expect(preview.status).toBe(200);
    const rows = preview.json.rows as { problems: string[]; notes: string[] }[];
    expect(rows.map((r) => r.problems)).toEqual([[], []]);
    expect(JSON.stringify(preview.json)).not.toMatch(/another organization|has a Riser account/i);

    // The owner of the address learns it from their own link; their account stays where it is.
    const token = tokenOf(linkIn((await waitForMail(outsider.email, /invited to train/)).text));
    const accept = await postJson(anonymous(), "/api/invite/accept", { token, name: "Perpetua Snell", password: PASSWORD, confirm: PASSWORD });
    expect(accept.status).toBe(409);
    expect(accept.json.error).toMatch(/already has a Riser account/);
    expect((await db.select().from(user).where(eq(user.id, outsider.id)))[0]!.organizationId).toBe(other.id);
  });

  it("limits roster previews per manager (counted in the database)", async () => {
    const busy = await fixturePerson(org, { name: "Quentin Harrowby", role: "manager" });
    const client = await clientOf(busy.id);
    const csv = `email\r\n${uniqueEmail("rl")}\r\n`;
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++) statuses.push((await uploadRoster(client, "/api/team/invites/preview", csv)).status);
    expect(statuses.slice(0, 20).every((s) => s === 200)).toBe(true);
    expect(statuses[20]).toBe(429);
  });
});

describe("first day", () => {
  it("a new manager with no team lands on the checklist, not an empty “My training”", async () => {
    const fresh = await fixtureOrg("Nettlecombe Fire");
    const boss = await fixturePerson(fresh, { name: "Ottoline Brack", role: "manager" });
    const html = await (await (await clientOf(boss.id)).fetch("/learn")).text();
    expect(html).toContain("Get your crew started");
    for (const step of ["Create your teams", "Invite your people", "Assign work", "Watch the board"]) expect(html).toContain(step);
    // A learner never sees it.
    const learner = await fixturePerson(fresh, { name: "Piers Lumley" });
    // the checklist's own section (the page also carries the message catalog, so not its heading's words)
    expect(await (await (await clientOf(learner.id)).fetch("/learn")).text()).not.toContain('data-testid="first-day"');
  });
});
