// Work assigned at invite time is applied on acceptance; people are told once when work is
// assigned; the assign page explains why an invitee is not in the people list yet.
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { assignment, invitation, user } from "@/db/schema";
import { anonymous, linkIn, mailsTo, postJson, uniqueEmail, waitForMail, type Client } from "../helpers/http";
import { clientOf, daysFromNow, fixtureOrg, fixturePerson, type FixtureOrg } from "../helpers/fixtures";

const PASSWORD = "assigned-at-invite-55";
let org: FixtureOrg;
let mgr: Client;
const day = (n: number) => daysFromNow(n).toISOString().slice(0, 10);
const tokenOf = (link: string) => new URL(link).pathname.split("/").pop()!;

beforeAll(async () => {
  org = await fixtureOrg("Quorley Sprinkler", { seats: 10, teams: ["Rough-in crew"] });
  const manager = await fixturePerson(org, { name: "Hester Vayle", role: "manager" });
  mgr = await clientOf(manager.id);
});
afterAll(() => pool.end());

async function settle(email: string, subject: RegExp, n: number) {
  for (let i = 0; i < 30; i++) {
    const m = (await mailsTo(email)).filter((x) => subject.test(x.subject));
    if (m.length >= n) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  await new Promise((r) => setTimeout(r, 800)); // room for a wrong extra mail to arrive
  return (await mailsTo(email)).filter((x) => subject.test(x.subject));
}

describe("assign at invite time", () => {
  it("an invitation carries a module with a due date; accepting makes it the person's assignment and mails them once", async () => {
    const email = uniqueEmail("carry");
    const res = await postJson(mgr, "/api/team/invites", { email, role: "learner", assign: [{ kind: "module", slug: "freeze-protection", dueAt: day(14) }] });
    expect(res.status).toBe(201);
    const bad = await postJson(mgr, "/api/team/invites", { email: uniqueEmail("bad"), role: "learner", assign: [{ kind: "module", slug: "no-such-module", dueAt: day(14) }] });
    expect(bad.status).toBe(400);

    // Attach a path afterwards from the assign page's invitee list.
    const [row] = await db.select().from(invitation).where(and(eq(invitation.organizationId, org.id), eq(invitation.email, email)));
    const more = await postJson(mgr, `/api/team/invites/${row!.id}/assign`, { items: [{ kind: "path", slug: "new-installer", dueAt: day(30) }] });
    expect(more.status).toBe(200);
    const page = await (await mgr.fetch("/team/assign")).text();
    expect(page).toContain("Invited, not joined yet");
    expect(page).toContain(email);

    const token = tokenOf(linkIn((await waitForMail(email, /invited to train/)).text));
    expect((await postJson(anonymous(), "/api/invite/accept", { token, name: "Lorcan Pettifer", password: PASSWORD, confirm: PASSWORD })).status).toBe(201);
    const [u] = await db.select().from(user).where(eq(user.email, email));
    const rows = await db.select().from(assignment).where(eq(assignment.userId, u!.id));
    expect(rows.map((r) => `${r.kind}:${r.targetSlug}:${r.dueAt.toISOString().slice(0, 10)}`).sort()).toEqual([`module:freeze-protection:${day(14)}`, `path:new-installer:${day(30)}`]);
    expect(await settle(email, /^New training for you/, 2)).toHaveLength(2);
  });

  it("assigning work mails each person once, not again when the due date changes", async () => {
    const p = await fixturePerson(org, { name: "Ambrose Tilly", teamId: org.teams["Rough-in crew"] });
    expect((await postJson(mgr, "/api/team/assignments", { kind: "module", slug: "how-systems-work", userIds: [p.id], dueAt: day(10) })).status).toBeLessThan(300);
    const first = await settle(p.email, /^New training for you: /, 1);
    expect(first).toHaveLength(1);
    expect(first[0]!.text).toContain("/modules/how-systems-work");
    expect((await postJson(mgr, "/api/team/assignments", { kind: "module", slug: "how-systems-work", userIds: [p.id], dueAt: day(20) })).status).toBeLessThan(300);
    // A whole-team assignment reaches the team's people too, once.
    expect((await postJson(mgr, "/api/team/assignments", { kind: "module", slug: "pipe-and-joining", teamIds: [org.teams["Rough-in crew"]!], dueAt: day(20) })).status).toBeLessThan(300);
    const all = await settle(p.email, /^New training for you: /, 2);
    expect(all.map((m) => m.subject).sort()).toEqual(["New training for you: How a home sprinkler system works", "New training for you: Pipe materials and joining"].sort());
  });
});
