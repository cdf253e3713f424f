import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, certificate, lessonProgress, organization, quizAttempt, team, user } from "@/db/schema";
import { inWindow, recordWindow, type RecordWindow, type Viewer } from "@/lib/access";
import { certificateStatus } from "@/lib/certificates";
import type { Person } from "./board";
import { isExpiring } from "@/lib/expiring";

/** A person as the board sees them, or null. */
export async function personById(id: string): Promise<(Person & { orgName: string; organizationSince: Date | null }) | null> {
  if (!/^[A-Za-z0-9-]{1,36}$/.test(id)) return null;
  const [p] = await db
    .select({ id: user.id, name: user.name, email: user.email, role: user.role, teamId: user.teamId, team: team.name, organizationId: user.organizationId, orgName: organization.name, organizationSince: user.organizationSince, language: user.language })
    .from(user)
    .leftJoin(team, eq(team.id, user.teamId))
    .leftJoin(organization, eq(organization.id, user.organizationId))
    .where(eq(user.id, id));
  if (!p || !p.organizationId) return null;
  return { ...p, team: p.team ?? null, organizationId: p.organizationId, orgName: p.orgName ?? "" };
}

/**
 * unknown → "missing"; a person of the viewer's organization (or any, for an admin) → "ok"; a person
 * who was moved away from the viewer's organization → "former" (read only, records up to the move);
 * anyone else's → "forbidden". The window says which records the viewer sees (lib/access/records.ts).
 */
export async function personForViewer(viewer: Viewer, id: string) {
  const p = await personById(id);
  if (!p) return { state: "missing" as const };
  const window = await recordWindow(viewer, p);
  if (!window) return { state: "forbidden" as const };
  return { state: window.current ? ("ok" as const) : ("former" as const), person: p, window };
}

const EVERYTHING: RecordWindow = { current: true, from: null, until: null, allCertificates: true };

export async function personHistory(personId: string, now = new Date(), window: RecordWindow = EVERYTHING) {
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
    // an attempt counts when it was graded (where the person belonged then), or started if never submitted
    attempts: attempts.filter((a) => inWindow(window, a.submittedAt ?? a.startedAt)),
    lessons: lessons.filter((l) => inWindow(window, l.completedAt)),
    certificates: certs.filter((c) => window.allCertificates || inWindow(window, c.issuedAt)).map((c) => {
      const status = certificateStatus(c, now);
      return { ...c, status: status === "valid" && isExpiring(c.expiresAt, now) ? ("expiring" as const) : status };
    }),
  };
}
