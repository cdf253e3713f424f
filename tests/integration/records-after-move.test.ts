// The rule for records after an admin moves a person to another organization (README, "Security
// model"): the records belong to the person; the organization they left keeps read-only sight of
// what was earned while they were its member (up to the move), and can no longer act on them; the
// new organization sees what happens from the move onward, plus every certificate of the person;
// the old organization's assignments end.
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { assignment, certificate, user } from "@/db/schema";
import { demoByRole } from "@/db/demo";
import { postJson, signIn } from "../helpers/http";
import { clientOf, completedWithCertificate, daysFromNow, fixtureOrg, fixturePerson, gradedAttempt } from "../helpers/fixtures";

afterAll(() => pool.end());

const serialsOf = async (userId: string) => (await db.select({ serial: certificate.serial, issuedAt: certificate.issuedAt }).from(certificate).where(eq(certificate.userId, userId))).sort((a, b) => +a.issuedAt - +b.issuedAt).map((c) => c.serial);

describe("records after a move between organizations", () => {
  it("old organization: read-only, pre-move records only; new organization: records from the move plus all certificates", async () => {
    const oldOrg = await fixtureOrg("Move-from contractor", { teams: ["Crew"] });
    const newOrg = await fixtureOrg("Move-to contractor", { teams: ["Crew"] });
    const oldMgr = await fixturePerson(oldOrg, { name: "Oda Leftfield", role: "manager" });
    const newMgr = await fixturePerson(newOrg, { name: "Nils Rightway", role: "manager" });
    const person = await fixturePerson(oldOrg, { name: "Mira Moving", teamId: oldOrg.teams.Crew });

    // earned in the old organization, before the move
    await completedWithCertificate(person, "freeze-protection", { completedAt: daysFromNow(-20), expiresAt: daysFromNow(700) });
    await gradedAttempt(person, "freeze-protection", false, daysFromNow(-25), { score: 37 });
    const oldClient = await clientOf(oldMgr.id);
    expect((await postJson(oldClient, "/api/team/assignments", { kind: "module", slug: "how-systems-work", userIds: [person.id], dueAt: daysFromNow(10).toISOString().slice(0, 10) })).status).toBeLessThan(300);
    expect(await db.select({ id: assignment.id }).from(assignment).where(eq(assignment.userId, person.id))).toHaveLength(1);

    // the admin moves the person
    const admin = await signIn(demoByRole("admin").email);
    expect((await postJson(admin, `/api/admin/people/${person.id}/organization`, { organizationId: newOrg.id, reason: "Changed employer" })).status).toBe(200);
    const [moved] = await db.select({ org: user.organizationId, since: user.organizationSince }).from(user).where(eq(user.id, person.id));
    expect(moved!.org).toBe(newOrg.id);
    expect(moved!.since).toBeTruthy();
    // the old organization's assignments to the person end with the move
    expect(await db.select({ id: assignment.id }).from(assignment).where(eq(assignment.userId, person.id))).toEqual([]);

    // earned in the new organization, after the move
    const after = { ...person, organizationId: newOrg.id };
    await new Promise((r) => setTimeout(r, 20));
    await completedWithCertificate(after, "pipe-and-joining", { completedAt: new Date(), expiresAt: daysFromNow(700) });
    await gradedAttempt(after, "pipe-and-joining", false, new Date(), { score: 41 });
    const [before, later] = (await serialsOf(person.id)) as [string, string];

    // old organization: the pre-move certificate, read only; nothing from after the move
    const oldPage = await oldClient.fetch(`/team/people/${person.id}`);
    expect(oldPage.status).toBe(200);
    const oldHtml = await oldPage.text();
    expect(oldHtml).toContain(before);
    expect(oldHtml).not.toContain(later);
    expect(oldHtml).toContain("37%");
    expect(oldHtml).not.toContain("41%");
    expect(oldHtml).toMatch(/left this organization/i);
    // and it cannot act on the person
    expect((await postJson(oldClient, `/api/team/people/${person.id}`, { teamId: oldOrg.teams.Crew })).status).toBe(403);
    expect((await postJson(oldClient, "/api/team/assignments", { kind: "module", slug: "how-systems-work", userIds: [person.id], dueAt: daysFromNow(10).toISOString().slice(0, 10) })).status).toBeGreaterThanOrEqual(400);
    const [oldCert] = await db.select({ id: certificate.id }).from(certificate).where(eq(certificate.serial, before));
    expect((await postJson(oldClient, `/api/certificates/${oldCert!.id}/revoke`, { reason: "Trying after the move" })).status).toBe(403);

    // new organization: both certificates (as certificates), the attempt after the move, not the old one's attempts
    const newClient = await clientOf(newMgr.id);
    const newHtml = await (await newClient.fetch(`/team/people/${person.id}`)).text();
    expect(newHtml).toContain(before);
    expect(newHtml).toContain(later);
    expect(newHtml).toContain("41%");
    expect(newHtml).not.toContain("37%"); // the attempt history before the move stays with the old organization's record

    // someone who was never a member sees nothing
    const stranger = await fixturePerson(await fixtureOrg("Unrelated contractor"), { name: "Una Related", role: "manager" });
    expect((await (await clientOf(stranger.id)).fetch(`/team/people/${person.id}`)).status).toBe(403);
  });
});
