import "server-only";
/**
 * Demo certificates (invented people of db/demo.ts), issued through the same function as real
 * completions, so the team board and the pages show every status:
 *   Kasimir Dunleavy — all six modules of "New installer" a few weeks ago → six valid module
 *                      certificates and the path certificate;
 *   Rafaela Quint    — "Freeze protection", expiring in 18 days (the reminder job will mail her);
 *   Callum Threlby   — "Hydraulics and the permit package", expired two months ago, and
 *                      "Fire and water officials", revoked by Maren Ostrowe with a reason.
 * Skipped when any certificate exists. Issue mails are not sent for demo rows.
 */
import { randomInt, randomUUID } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, certificate, lessonProgress, moduleCompletion, quizAttempt, user } from "@/db/schema";
import { findModule, loadCatalog } from "@/lib/content";
import { issueCertificateForCompletion } from "./issue";
import { revokeWithAudit } from "./revoke";
import { addMonthsUtc } from "./status";
import { DAY_MS } from "@/lib/dates";
import { log } from "@/lib/log";


async function completeModule(person: { id: string; organizationId: string | null }, moduleSlug: string, completedAt: Date) {
  const mod = findModule(moduleSlug);
  if (!mod) throw new Error(`demo module ${moduleSlug} is not in content/`);
  const attemptId = randomUUID();
  await db.insert(quizAttempt).values({
    id: attemptId,
    userId: person.id,
    organizationId: person.organizationId,
    moduleSlug,
    seed: randomInt(1, 2 ** 31),
    status: "graded",
    startedAt: new Date(completedAt.getTime() - 22 * 60 * 1000),
    submittedAt: completedAt,
    score: 90,
    passed: true,
    passMark: mod.meta.passMark,
  });
  const lessons = await db
    .select({ id: catalogLesson.id })
    .from(catalogLesson)
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(and(eq(catalogModule.slug, moduleSlug), inArray(catalogLesson.slug, mod.lessons.map((l) => l.slug))));
  if (lessons.length) {
    await db
      .insert(lessonProgress)
      .ignore()
      .values(lessons.map((l) => ({ userId: person.id, lessonId: l.id, completedAt: new Date(completedAt.getTime() - 60 * 60 * 1000) })));
  }
  const r = await db.insert(moduleCompletion).values({ userId: person.id, moduleSlug, attemptId, completedAt, note: "demo data" });
  return issueCertificateForCompletion(r[0].insertId, { notify: false });
}

export async function seedCertificates(now: Date = new Date()): Promise<void> {
  const [any] = await db.select({ id: certificate.id }).from(certificate).limit(1);
  if (any) {
    log().info("seed: certificates exist, left as they are");
    return;
  }
  const emails = ["kasimir@quillmoor.example", "rafaela@quillmoor.example", "callum@quillmoor.example", "maren@quillmoor.example"];
  const people = await db.select({ id: user.id, email: user.email, organizationId: user.organizationId }).from(user).where(inArray(user.email, emails));
  const by = (email: string) => people.find((p) => p.email === email);
  const [kasimir, rafaela, callum, maren] = emails.map(by);
  if (!kasimir || !rafaela || !callum || !maren) {
    log().info("seed: demo people missing, no demo certificates");
    return;
  }

  let count = 0;
  const installer = loadCatalog().paths.find((p) => p.slug === "new-installer");
  for (const [i, slug] of (installer?.modules ?? []).entries()) {
    count += (await completeModule(kasimir, slug, new Date(now.getTime() - (45 - i * 4) * DAY_MS))).length;
  }

  const freeze = findModule("freeze-protection")!;
  const expiringAt = new Date(now.getTime() + 18 * DAY_MS);
  count += (await completeModule(rafaela, "freeze-protection", addMonthsUtc(expiringAt, -freeze.meta.validityMonths))).length;

  const hydraulics = findModule("hydraulics-and-permits")!;
  const expiredAt = new Date(now.getTime() - 61 * DAY_MS);
  count += (await completeModule(callum, "hydraulics-and-permits", addMonthsUtc(expiredAt, -hydraulics.meta.validityMonths))).length;

  const [revoked] = await completeModule(callum, "fire-and-water-officials", new Date(now.getTime() - 70 * DAY_MS));
  if (revoked) {
    count++;
    await revokeWithAudit(
      { id: maren.id, email: maren.email },
      revoked.id,
      "Demo: the quiz was taken by someone else on Callum's account; he will retake it in person.",
      null,
      () => {},
    );
  }
  log().info(`seed: demo certificates: ${count} (valid, expiring, expired, revoked)`);
}
