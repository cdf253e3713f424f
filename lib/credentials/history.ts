import "server-only";
/**
 * One person's training history: every certificate and module completion with dates, status,
 * verification codes, and continuing-education hours per reporting period (./period) under their
 * organization's setting. Who may read it: the person, managers of the person's organization, admins.
 */
import { and, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { catalogLesson, catalogModule, certificate, creditReportingPeriod, lessonOpen, lessonProgress, moduleCompletion, organization, user } from "@/db/schema";
import { AccessError, canManageOrganization, type Viewer } from "@/lib/access";
import { certificatesOfHolder, formatVerificationCode, verificationUrl, type HolderCertificate } from "@/lib/certificates";
import { env } from "@/lib/env";
import { DomainError } from "@/lib/errors";
import { CALENDAR_YEARS, describeSetting, hoursByPeriod, periodOf, type Counting, type PeriodSetting, type PeriodTotal } from "./period";

export type HistoryCertificate = HolderCertificate & { counting: Counting; period: string; verifyUrl: string; codeShown: string };
export type HistoryCompletion = { moduleSlug: string; title: string; completedAt: Date; serial: string | null; seatMinutes: number | null };
export type TrainingHistory = {
  person: { id: string; name: string; organizationName: string | null };
  setting: PeriodSetting;
  settingText: string;
  totals: PeriodTotal[];
  certificates: HistoryCertificate[];
  completions: HistoryCompletion[];
  generatedAt: Date;
};

/**
 * Seat time per module: the reading time the server measured for each completed lesson (its own
 * first-open stamp to its own completion stamp, as lib/progress counts it), summed and given in
 * whole minutes. The time a phone reports for a mark made offline (device_reading_seconds) is never
 * used here: it is the device's claim, not a measurement.
 */
export async function seatMinutesByModule(userId: string): Promise<Map<string, number>> {
  const rows = await db
    .select({ module: catalogModule.slug, openedAt: lessonOpen.firstOpenedAt, completedAt: lessonProgress.completedAt })
    .from(lessonProgress)
    .innerJoin(lessonOpen, and(eq(lessonOpen.userId, lessonProgress.userId), eq(lessonOpen.lessonId, lessonProgress.lessonId)))
    .innerJoin(catalogLesson, eq(catalogLesson.id, lessonProgress.lessonId))
    .innerJoin(catalogModule, eq(catalogModule.id, catalogLesson.moduleId))
    .where(eq(lessonProgress.userId, userId));
  const seconds = new Map<string, number>();
  for (const r of rows) seconds.set(r.module, (seconds.get(r.module) ?? 0) + Math.max(0, (r.completedAt.getTime() - r.openedAt.getTime()) / 1000));
  return new Map([...seconds].map(([m, s]) => [m, Math.round(s / 60)]));
}

/** The organization's period setting; calendar years when it has none. */
export async function periodSettingOf(organizationId: string | null): Promise<PeriodSetting> {
  if (!organizationId) return CALENDAR_YEARS;
  const [row] = await db.select().from(creditReportingPeriod).where(eq(creditReportingPeriod.organizationId, organizationId));
  return row ? { startYear: row.startYear, startMonth: row.startMonth, lengthMonths: row.lengthMonths } : CALENDAR_YEARS;
}

/** The person whose history the viewer asks for: themselves, or someone they manage. 404 / 403 otherwise. */
export async function historyPersonFor(viewer: Viewer, personId: string) {
  const [p] = /^[A-Za-z0-9-]{1,36}$/.test(personId)
    ? await db
        .select({ id: user.id, name: user.name, organizationId: user.organizationId, organizationName: organization.name })
        .from(user)
        .leftJoin(organization, eq(organization.id, user.organizationId))
        .where(eq(user.id, personId))
    : [];
  if (!p) throw new DomainError("not-found", "No person with that id.");
  if (p.id !== viewer.id && !canManageOrganization(viewer, p.organizationId)) {
    throw new AccessError(403, "Only the person, their organization's managers and admins can download this training history.");
  }
  return p;
}

export async function trainingHistory(person: { id: string; name: string; organizationId: string | null; organizationName: string | null }, now = new Date()): Promise<TrainingHistory> {
  const [certs, setting, completions, seat] = await Promise.all([
    certificatesOfHolder(person.id, now),
    periodSettingOf(person.organizationId),
    db
      .select({ id: moduleCompletion.id, moduleSlug: moduleCompletion.moduleSlug, title: catalogModule.title, completedAt: moduleCompletion.completedAt, serial: certificate.serial })
      .from(moduleCompletion)
      .leftJoin(catalogModule, eq(catalogModule.slug, moduleCompletion.moduleSlug))
      .leftJoin(certificate, eq(certificate.completionId, moduleCompletion.id))
      .where(eq(moduleCompletion.userId, person.id))
      .orderBy(desc(moduleCompletion.completedAt)),
    seatMinutesByModule(person.id),
  ]);
  const { counting, totals } = hoursByPeriod(certs, setting);
  // a completion may have finished a path too: show the module's own certificate
  const byCompletion = new Map<number, HistoryCompletion>();
  for (const c of completions) {
    const known = byCompletion.get(c.id);
    const moduleSerial = certs.find((x) => x.serial === c.serial)?.kind === "module" ? c.serial : null;
    if (!known) byCompletion.set(c.id, { moduleSlug: c.moduleSlug, title: c.title ?? c.moduleSlug, completedAt: c.completedAt, serial: moduleSerial, seatMinutes: seat.get(c.moduleSlug) ?? null });
    else if (!known.serial && moduleSerial) known.serial = moduleSerial;
  }
  return {
    person: { id: person.id, name: person.name, organizationName: person.organizationName },
    setting,
    settingText: describeSetting(setting),
    totals,
    certificates: certs.map((c) => ({
      ...c,
      counting: counting.get(c) ?? "counted",
      period: periodOf(c.issuedAt, setting).label,
      verifyUrl: verificationUrl(env.APP_URL, c.verificationCode),
      codeShown: formatVerificationCode(c.verificationCode),
    })),
    completions: [...byCompletion.values()],
    generatedAt: now,
  };
}

export const historyFileName = (name: string, ext: "pdf" | "csv", at: Date) =>
  `riser-training-history-${name.normalize("NFKD").replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "person"}-${at.toISOString().slice(0, 10)}.${ext}`;
