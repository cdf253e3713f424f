// Reminder jobs: overdue and due-soon mails to learners and a weekly digest to managers, run
// through POST /api/jobs/run (header x-jobs-secret) and directly; a second run in the same period
// sends nothing more (reminder_log claims), the next ISO week sends the overdue reminder again.
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { assignment, reminderLog, user } from "@/db/schema";
import { sendDueReminders, sendManagerDigests } from "@/lib/team/reminders";
import { anonymous, mailsTo, waitForMail } from "../helpers/http";
import { completedWithCertificate, daysFromNow, fixtureOrg, fixturePerson, type FixturePerson } from "../helpers/fixtures";

let learner: FixturePerson;
let done: FixturePerson;
let manager: FixturePerson;
let managerEs: FixturePerson;
let orgName = "";

beforeAll(async () => {
  const org = await fixtureOrg("Reminder Fixture Sprinklers", { teams: ["Night crew"] });
  orgName = org.name;
  manager = await fixturePerson(org, { name: "Perpetua Lom", role: "manager" });
  // a second manager who reads Spanish; both managers belong to no team
  managerEs = await fixturePerson(org, { name: "Casimira Lom", role: "manager" });
  await db.update(user).set({ language: "es" }).where(eq(user.id, managerEs.id));
  learner = await fixturePerson(org, { name: "Ulric Bode", teamId: org.teams["Night crew"] });
  done = await fixturePerson(org, { name: "Vera Bode", teamId: org.teams["Night crew"] });
  const base = { organizationId: org.id, createdBy: manager.id, createdAt: new Date() };
  await db.insert(assignment).values([
    // overdue for Ulric (direct)
    { ...base, kind: "module", targetSlug: "freeze-protection", userId: learner.id, targetKey: `u:${learner.id}`, dueAt: daysFromNow(-3) },
    // due in two days for the whole team
    { ...base, kind: "module", targetSlug: "how-systems-work", teamId: org.teams["Night crew"], targetKey: `t:${org.teams["Night crew"]}`, dueAt: daysFromNow(2) },
    // due in three weeks: no mail yet
    { ...base, kind: "path", targetSlug: "new-installer", userId: learner.id, targetKey: `u:${learner.id}`, dueAt: daysFromNow(21) },
  ]);
  // Vera has already passed the team's module: no reminder for her.
  await completedWithCertificate(done, "how-systems-work", { completedAt: daysFromNow(-5), expiresAt: daysFromNow(700) });
});
afterAll(() => pool.end());

const runJobs = (secret?: string) =>
  anonymous().fetch("/api/jobs/run?job=assignment-reminders&job=manager-digest", { method: "POST", headers: secret ? { "x-jobs-secret": secret } : {} });

describe("reminder jobs", () => {
  it("need the jobs secret", async () => {
    expect((await runJobs()).status).toBe(401);
    expect((await runJobs("wrong-secret-wrong-secret")).status).toBe(403);
  });

  it("mail once per period, however often they run", async () => {
    const secret = process.env.JOBS_SECRET!;
    const first = await runJobs(secret);
    expect(first.status).toBe(200);
    const body = await first.json();
    expect(body.results.map((r: { name: string; ok: boolean }) => [r.name, r.ok])).toEqual([
      ["assignment-reminders", true],
      ["manager-digest", true],
    ]);
    const overdue = await waitForMail(learner.email, /^Overdue training: Freeze protection/);
    expect(overdue.text).toContain("- Freeze protection (module), was due");
    expect(overdue.text).toContain("/modules/freeze-protection\n");
    const soon = await waitForMail(learner.email, /^Training due soon: How a home sprinkler system works/);
    expect(soon.text).toMatch(/due within 3 days/);
    const digest = await waitForMail(manager.email, /^Weekly training summary for Reminder Fixture/);
    expect(digest.text).toContain(`Where ${orgName} stands`);
    expect(digest.text).toMatch(/- Night crew: 2 people/);
    expect(digest.text).toMatch(/- No team: 2 people/);
    // the Spanish reader's digest names the same group in Spanish (messages/es/mail.json)
    const digestEs = await waitForMail(managerEs.email, /^Resumen semanal de capacitación de Reminder Fixture/);
    expect(digestEs.text).toMatch(/- Sin equipo: 2 personas/);
    expect(digestEs.text).not.toContain("No team");

    expect((await runJobs(secret)).status).toBe(200);
    await sendDueReminders();
    await sendManagerDigests();
    await new Promise((r) => setTimeout(r, 500));
    const toLearner = await mailsTo(learner.email);
    expect(toLearner.filter((m) => /^Overdue training/.test(m.subject))).toHaveLength(1);
    expect(toLearner.filter((m) => /^Training due soon/.test(m.subject))).toHaveLength(1);
    expect(toLearner.some((m) => /New installer/.test(m.subject + m.text))).toBe(false); // due in 3 weeks
    expect((await mailsTo(manager.email)).filter((m) => /^Weekly training summary/.test(m.subject))).toHaveLength(1);
    expect(await mailsTo(done.email)).toEqual([]);
    const claims = await db.select().from(reminderLog).where(eq(reminderLog.userId, learner.id));
    expect(claims.map((c) => c.kind).sort()).toEqual(["due-soon", "overdue"]);
  });

  it("send the overdue reminder again in the next week, and the digest once per week", async () => {
    const nextWeek = daysFromNow(7);
    await sendDueReminders({ now: nextWeek });
    await sendDueReminders({ now: nextWeek });
    await sendManagerDigests({ now: nextWeek });
    await new Promise((r) => setTimeout(r, 500));
    const overdue = (await mailsTo(learner.email)).filter((m) => /^Overdue training/.test(m.subject));
    // a week on, both items are overdue: one more overdue mail naming both
    expect(overdue).toHaveLength(2);
    expect(overdue.some((m) => /2 items/.test(m.subject))).toBe(true);
    expect((await mailsTo(manager.email)).filter((m) => /^Weekly training summary/.test(m.subject))).toHaveLength(2);
    const rows = await db.select().from(reminderLog).where(and(eq(reminderLog.userId, learner.id), eq(reminderLog.kind, "overdue")));
    expect(rows).toHaveLength(3); // freeze this week and next week, and the team module next week
  });
});
