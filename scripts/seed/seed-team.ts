/**
 * Demo data for the team pages (invented people of db/demo.ts): assignments with due dates for the
 * Quillmoor crews and the Larkhaven sales office — some overdue, some due within three days — and
 * lesson progress and quiz attempts for a few learners, so that the board shows every status.
 * (Certificates of Kasimir, Rafaela and Callum come from lib/certificates/seed.ts.)
 * Skipped when the demo organizations already have assignments.
 */
import { randomInt, randomUUID } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { assignment, catalogLesson, catalogModule, lessonProgress, moduleCompletion, organization, quizAttempt, team, user } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { findModule } from "@/lib/content";

const DAY = 86_400_000;

function dueIn(days: number, now: Date): Date {
  const d = new Date(now.getTime() + days * DAY);
  d.setUTCHours(23, 59, 59, 0);
  return d;
}

async function lessonIds(moduleSlug: string): Promise<number[]> {
  const rows = await db
    .select({ id: catalogLesson.id })
    .from(catalogLesson)
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(eq(catalogModule.slug, moduleSlug))
    .orderBy(catalogLesson.position);
  return rows.map((r) => r.id);
}

type P = { id: string; organizationId: string | null };

async function lessons(p: P, moduleSlug: string, count: number, at: Date) {
  const ids = (await lessonIds(moduleSlug)).slice(0, count);
  if (ids.length) await db.insert(lessonProgress).ignore().values(ids.map((lessonId, i) => ({ userId: p.id, lessonId, completedAt: new Date(at.getTime() + i * 3_600_000) })));
}

async function attempt(p: P, moduleSlug: string, score: number, at: Date): Promise<string> {
  const mod = findModule(moduleSlug)!;
  const id = randomUUID();
  await db.insert(quizAttempt).values({
    id,
    userId: p.id,
    organizationId: p.organizationId,
    moduleSlug,
    seed: randomInt(1, 2 ** 31),
    status: "graded",
    startedAt: new Date(at.getTime() - 25 * 60_000),
    submittedAt: at,
    score,
    passed: score >= mod.meta.passMark,
    passMark: mod.meta.passMark,
  });
  return id;
}

export async function seedTeamDemo(now = new Date()): Promise<void> {
  const orgs = await db.select({ id: organization.id, name: organization.name }).from(organization).where(inArray(organization.name, ["Quillmoor Fire Protection", "Larkhaven Homes"]));
  const quillmoor = orgs.find((o) => o.name === "Quillmoor Fire Protection");
  const larkhaven = orgs.find((o) => o.name === "Larkhaven Homes");
  if (!quillmoor || !larkhaven) {
    console.log("[seed] demo organizations missing: no team demo data");
    return;
  }
  const [existing] = await db.select({ id: assignment.id }).from(assignment).where(inArray(assignment.organizationId, [quillmoor.id, larkhaven.id])).limit(1);
  if (existing) {
    console.log("[seed] demo assignments exist: left as they are");
    return;
  }
  const teams = await db.select({ id: team.id, name: team.name, org: team.organizationId }).from(team).where(inArray(team.organizationId, [quillmoor.id, larkhaven.id]));
  const teamId = (name: string) => teams.find((t) => t.name === name)!.id;
  const people = await db.select({ id: user.id, email: user.email, organizationId: user.organizationId }).from(user).where(inArray(user.organizationId, [quillmoor.id, larkhaven.id]));
  const who = (name: string) => people.find((p) => p.email === `${name}`)!;
  const maren = who("maren@quillmoor.example");
  const hollis = who("hollis@larkhaven.example");

  const rows: (typeof assignment.$inferInsert)[] = [];
  const add = (org: string, by: string, kind: "module" | "path", slug: string, target: { userId?: string; teamId?: string }, days: number) =>
    rows.push({
      organizationId: org,
      kind,
      targetSlug: slug,
      userId: target.userId ?? null,
      teamId: target.teamId ?? null,
      targetKey: target.userId ? `u:${target.userId}` : `t:${target.teamId}`,
      dueAt: dueIn(days, now),
      createdBy: by,
      createdAt: new Date(now.getTime() - 20 * DAY),
    });
  add(quillmoor.id, maren.id, "path", "new-installer", { teamId: teamId("North crew") }, 21);
  add(quillmoor.id, maren.id, "module", "freeze-protection", { teamId: teamId("North crew") }, -4); // overdue
  add(quillmoor.id, maren.id, "module", "how-systems-work", { teamId: teamId("South crew") }, 2); // due soon
  add(quillmoor.id, maren.id, "module", "working-with-trades", { teamId: teamId("South crew") }, 30);
  add(quillmoor.id, maren.id, "module", "hydraulics-and-permits", { userId: who("callum@quillmoor.example").id }, -3); // overdue (his certificate expired)
  add(quillmoor.id, maren.id, "path", "design-and-permits", { userId: who("callum@quillmoor.example").id }, 45);
  add(larkhaven.id, hollis.id, "path", "builder-sales", { teamId: teamId("Juniper Flats sales office") }, 10);
  add(larkhaven.id, hollis.id, "module", "talking-with-homebuyers", { teamId: teamId("Juniper Flats sales office") }, 1); // due soon
  await db.insert(assignment).values(rows);

  // Dario: "How a home sprinkler system works" passed 10 days ago; "Freeze protection" half done (and overdue).
  const dario = who("dario@quillmoor.example");
  const passedAt = new Date(now.getTime() - 10 * DAY);
  await lessons(dario, "how-systems-work", 99, new Date(passedAt.getTime() - 2 * DAY));
  const pass = await attempt(dario, "how-systems-work", 90, passedAt);
  const done = await db.insert(moduleCompletion).values({ userId: dario.id, moduleSlug: "how-systems-work", attemptId: pass, completedAt: passedAt, note: "demo data" });
  await issueCertificateForCompletion(done[0].insertId, { notify: false });
  await lessons(dario, "freeze-protection", 2, new Date(now.getTime() - 6 * DAY));
  // (Ines and Tobin keep no progress: other tests start from their empty record.)
  // Odette: one lesson of the module due soon. Wendell: all lessons, quiz failed.
  await lessons(who("odette@quillmoor.example"), "how-systems-work", 1, new Date(now.getTime() - 3 * DAY));
  const wendell = who("wendell@quillmoor.example");
  await lessons(wendell, "how-systems-work", 99, new Date(now.getTime() - 4 * DAY));
  await attempt(wendell, "how-systems-work", 60, new Date(now.getTime() - 1 * DAY));
  // Nadia (Larkhaven sales): two lessons of the first module of her path.
  await lessons(who("nadia@larkhaven.example"), "how-systems-work", 2, new Date(now.getTime() - 2 * DAY));
  const check = await db.select({ id: assignment.id }).from(assignment).where(and(eq(assignment.organizationId, quillmoor.id)));
  console.log(`[seed] team demo: ${rows.length} assignments (${check.length} at Quillmoor), progress and attempts for 4 learners`);
}
