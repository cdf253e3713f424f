import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, certificate, lessonProgress, organization, quizAttempt, team, user } from "@/db/schema";
import { canManageOrganization, type Viewer } from "@/lib/access";
import { certificateStatus } from "@/lib/certificates";
import type { Person } from "./board";
import { isExpiring } from "@/lib/expiring";

/** A person as the board sees them, or null. */
export async function personById(id: string): Promise<(Person & { orgName: string }) | null> {
  if (!/^[A-Za-z0-9-]{1,36}$/.test(id)) return null;
  const [p] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, teamId: user.teamId, team: team.name, organizationId: user.organizationId, orgName: organization.name })
    .from(user)
    .leftJoin(team, eq(team.id, user.teamId))
    .leftJoin(organization, eq(organization.id, user.organizationId))
    .where(eq(user.id, id));
  if (!p || !p.organizationId) return null;
  return { ...p, team: p.team ?? null, organizationId: p.organizationId, orgName: p.orgName ?? "" };
}

/** unknown → "missing"; another organization's person for a manager → "forbidden". */
export async function personForViewer(viewer: Viewer, id: string) {
  const p = await personById(id);
  if (!p) return { state: "missing" as const };
  if (!canManageOrganization(viewer, p.organizationId)) return { state: "forbidden" as const };
  return { state: "ok" as const, person: p };
}

export async function personHistory(personId: string, now = new Date()) {
  const [attempts, lessons, certs] = await Promise.all([
    db
      .select({
        id: quizAttempt.id,
        module: quizAttempt.moduleSlug,
        title: catalogModule.title,
        status: quizAttempt.status,
        startedAt: quizAttempt.startedAt,
        submittedAt: quizAttempt.submittedAt,
        score: quizAttempt.score,
        passMark: quizAttempt.passMark,
        passed: quizAttempt.passed,
      })
      .from(quizAttempt)
      .leftJoin(catalogModule, eq(catalogModule.slug, quizAttempt.moduleSlug))
      .where(eq(quizAttempt.userId, personId))
      .orderBy(desc(quizAttempt.startedAt))
      .limit(100),
    db
      .select({
        module: catalogModule.slug,
        moduleTitle: catalogModule.title,
        lesson: catalogLesson.title,
        position: catalogLesson.position,
        completedAt: lessonProgress.completedAt,
        deviceReadingSeconds: lessonProgress.deviceReadingSeconds,
      })
      .from(lessonProgress)
      .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
      .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
      .where(eq(lessonProgress.userId, personId))
      .orderBy(asc(catalogModule.position), asc(catalogLesson.position)),
    db
      .select({
        id: certificate.id,
        serial: certificate.serial,
        kind: certificate.kind,
        title: certificate.subjectTitle,
        ceHours: certificate.ceHours,
        issuedAt: certificate.issuedAt,
        expiresAt: certificate.expiresAt,
        revokedAt: certificate.revokedAt,
        code: certificate.verificationCode,
      })
      .from(certificate)
      .where(eq(certificate.userId, personId))
      .orderBy(desc(certificate.issuedAt))
      .limit(100),
  ]);
  return {
    attempts,
    lessons,
    certificates: certs.map((c) => {
      const status = certificateStatus(c, now);
      return { ...c, status: status === "valid" && isExpiring(c.expiresAt, now) ? ("expiring" as const) : status };
    }),
  };
}
