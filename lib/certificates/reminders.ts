import "server-only";
import { and, eq, gt, isNull, lte, notExists, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import { certificate, user } from "@/db/schema";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail";
import { greeting, mailDate, mailTranslator } from "@/lib/mail";
import { expiringHorizon } from "@/lib/expiring";
import { daysUntil } from "./status";

export type ReminderRun = { due: number; sent: number; failed: number; skipped: number };

const renewal = alias(certificate, "renewal");

/**
 * Mails each holder once, 30 days before a certificate expires. Safe to run twice or on two servers
 * at once: a row is claimed with `UPDATE … WHERE reminder_sent_at IS NULL` before its mail goes out,
 * and only the run whose update changed the row sends. A mail that fails releases its claim so that
 * the next run tries again. Skips revoked certificates and ones already renewed.
 */
export async function sendExpiryReminders(opts: { now?: Date; limit?: number } = {}): Promise<ReminderRun> {
  const now = opts.now ?? new Date();
  const horizon = expiringHorizon(now);
  const due = await db
    .select({
      id: certificate.id,
      serial: certificate.serial,
      kind: certificate.kind,
      subjectSlug: certificate.subjectSlug,
      subjectTitle: certificate.subjectTitle,
      holderName: certificate.holderName,
      expiresAt: certificate.expiresAt,
      email: user.email,
      language: user.language,
    })
    .from(certificate)
    .leftJoin(user, eq(user.id, certificate.userId))
    .where(
      and(
        isNull(certificate.reminderSentAt),
        isNull(certificate.revokedAt),
        gt(certificate.expiresAt, now),
        lte(certificate.expiresAt, horizon),
        notExists(db.select({ one: sql`1` }).from(renewal).where(and(eq(renewal.renewsCertificateId, certificate.id), isNull(renewal.revokedAt)))),
      ),
    )
    .orderBy(certificate.expiresAt)
    .limit(opts.limit ?? 500);

  const run: ReminderRun = { due: due.length, sent: 0, failed: 0, skipped: 0 };
  const base = env.APP_URL.replace(/\/+$/, "");
  for (const c of due) {
    const claimedAt = new Date();
    const claim = await db
      .update(certificate)
      .set({ reminderSentAt: claimedAt })
      .where(and(eq(certificate.id, c.id), isNull(certificate.reminderSentAt)));
    if (claim[0].affectedRows !== 1) {
      run.skipped++; // another run claimed it first
      continue;
    }
    if (!c.email) {
      run.skipped++; // the account is gone; the claim stays so nobody retries
      continue;
    }
    const t = mailTranslator(c.language);
    const renewHow =
      c.kind === "module"
        ? t("certificate.renewModule", { link: `${base}/modules/${c.subjectSlug}` })
        : t("certificate.renewPath", { link: `${base}/certificates` });
    const days = daysUntil(c.expiresAt, now);
    const { ok } = await sendMail({
      to: c.email,
      kind: "certificate.expiry-reminder",
      subject: t("certificate.expirySubject", { days, title: c.subjectTitle }),
      text: [
        greeting(t, c.holderName),
        "",
        t("certificate.expiryBody", { serial: c.serial, title: c.subjectTitle, date: mailDate(c.language, c.expiresAt) }),
        renewHow,
        "",
        t("certificate.onlyReminder"),
        "",
        t("signature"),
      ].join("\n"),
    });
    if (ok) run.sent++;
    else {
      run.failed++;
      await db
        .update(certificate)
        .set({ reminderSentAt: null })
        .where(and(eq(certificate.id, c.id), eq(certificate.reminderSentAt, claimedAt)));
    }
  }
  return run;
}
