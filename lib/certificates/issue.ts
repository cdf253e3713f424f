import "server-only";
import { randomBytes } from "node:crypto";
import { newVerificationCode as newCode } from "./verify-code";
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { catalogModule, certificate, certificateSerialCounter, moduleCompletion, organization, quizAttempt, user, type Certificate } from "@/db/schema";
import { findModule, loadCatalog } from "@/lib/content";
import { env } from "@/lib/env";
import { log } from "@/lib/log";
import { sendMail } from "@/lib/mail";
import { greeting, mailDate, mailTranslator } from "@/lib/mail";
import { metrics } from "@/lib/metrics";
import { addMonthsUtc, certificateStatus, formatSerial, verificationUrl } from "./status";
import { addCredentialEntry } from "./credential-entry";

export type IssuedCertificate = Pick<Certificate, "id" | "serial" | "kind" | "subjectSlug" | "subjectTitle" | "verificationCode" | "expiresAt">;

// New codes: Crockford base32, grouped when shown (lib/certificates/verify-code.ts); old codes still verify.
const newVerificationCode = () => newCode(randomBytes);

/**
 * `count` consecutive serials of `year`, taken under the counter row's lock, which the transaction
 * holds until it commits: callers take it last, right before their inserts, to hold it briefly.
 */
async function takeSerials(tx: Tx, year: number, count: number): Promise<{ serial: string; serialYear: number; serialNumber: number }[]> {
  const [row] = await tx
    .select({ lastNumber: certificateSerialCounter.lastNumber })
    .from(certificateSerialCounter)
    .where(eq(certificateSerialCounter.year, year))
    .for("update");
  if (!row) throw new Error(`serial counter for ${year} is missing`);
  await tx.update(certificateSerialCounter).set({ lastNumber: row.lastNumber + count }).where(eq(certificateSerialCounter.year, year));
  return Array.from({ length: count }, (_, i) => {
    const n = row.lastNumber + 1 + i;
    return { serial: formatSerial(year, n), serialYear: year, serialNumber: n };
  });
}

/** The counter row exists before any transaction locks it (its own statement, so no lock upgrade). */
async function ensureCounter(year: number) {
  await db.insert(certificateSerialCounter).ignore().values({ year, lastNumber: 0 });
}

function moduleFacts(slug: string, fallback: { title: string; ceHours: string; validityMonths: number } | undefined) {
  const m = findModule(slug);
  if (m) return { title: m.meta.title, ceHours: m.meta.ceHours, validityMonths: m.meta.validityMonths };
  if (fallback) return { title: fallback.title, ceHours: Number(fallback.ceHours), validityMonths: fallback.validityMonths };
  return null;
}

const DEADLOCK = new Set(["ER_LOCK_DEADLOCK", "ER_LOCK_WAIT_TIMEOUT"]);
function isRetryable(err: unknown): boolean {
  for (let e: unknown = err; e && typeof e === "object"; e = (e as { cause?: unknown }).cause) {
    if (DEADLOCK.has((e as { code?: string }).code ?? "")) return true;
  }
  return false;
}

/**
 * Issues the certificate for one module completion, and a learning-path certificate for every path
 * that this completion finishes. Idempotent: a completion gets its module certificate once (unique
 * key on completion, kind and subject), and concurrent calls for one person are serialized by a lock
 * on the person's row. Serials come from a per-year counter row locked in the same transaction, so
 * they are unique and gapless (a rolled-back issue also rolls back its number).
 *
 * Dates follow the completion: issued at its time, expiring after the module's validity. A later
 * completion of the same module is a renewal: a new certificate linked to the previous one.
 * Queues a mail to the learner for each new certificate (same transaction) unless `notify` is false.
 */
export async function issueCertificateForCompletion(completionId: number, opts: { notify?: boolean } = {}): Promise<IssuedCertificate[]> {
  const [completion] = await db.select().from(moduleCompletion).where(eq(moduleCompletion.id, completionId));
  if (!completion) throw new Error(`no module completion ${completionId}`);
  const at = completion.completedAt;
  const year = at.getUTCFullYear();
  await ensureCounter(year);

  let result: { issued: IssuedCertificate[]; email: string | null; holderName: string } = { issued: [], email: null, holderName: "" };
  for (let attempt = 1; ; attempt++) {
    try {
      result = await db.transaction((tx) => issueInTransaction(tx, completion, year, opts.notify !== false), { isolationLevel: "read committed" });
      break;
    } catch (err) {
      if (attempt >= 5 || !isRetryable(err)) throw err;
      await new Promise((r) => setTimeout(r, 20 * attempt + Math.random() * 30));
    }
  }
  for (const c of result.issued) {
    metrics.certificatesIssued.inc({ kind: c.kind });
    log().info({ certificateId: c.id, serial: c.serial, kind: c.kind, personId: completion.userId }, "certificate issued");
  }
  return result.issued;
}

async function issueInTransaction(tx: Tx, completion: typeof moduleCompletion.$inferSelect, year: number, notify: boolean) {
  const at = completion.completedAt;
  // One issuer at a time per person: path checks below see every certificate committed before.
  const [holder] = await tx
    .select({ id: user.id, name: user.name, email: user.email, organizationId: user.organizationId, language: user.language })
    .from(user)
    .where(eq(user.id, completion.userId))
    .for("update");
  if (!holder) return { issued: [], email: null, holderName: "" };

  const [already] = await tx
    .select({ id: certificate.id })
    .from(certificate)
    .where(and(eq(certificate.completionId, completion.id), eq(certificate.kind, "module"), eq(certificate.subjectSlug, completion.moduleSlug)));
  if (already) return { issued: [], email: holder.email, holderName: holder.name };

  const [org] = holder.organizationId
    ? await tx.select({ name: organization.name }).from(organization).where(eq(organization.id, holder.organizationId))
    : [];
  const [catalogRow] = await tx
    .select({ title: catalogModule.title, ceHours: catalogModule.ceHours, validityMonths: catalogModule.validityMonths })
    .from(catalogModule)
    .where(eq(catalogModule.slug, completion.moduleSlug));
  const facts = moduleFacts(completion.moduleSlug, catalogRow);
  // the edition the passing attempt was drawn for (the organization's default edition then)
  const [taught] = await tx.select({ edition: quizAttempt.edition }).from(quizAttempt).where(eq(quizAttempt.id, completion.attemptId));
  if (!facts) throw new Error(`module ${completion.moduleSlug} of completion ${completion.id} is not in the catalog`);

  const base = {
    userId: holder.id,
    holderName: holder.name,
    organizationId: holder.organizationId,
    organizationName: org?.name ?? null,
    completionId: completion.id,
    issuedAt: at,
  };
  type Planned = Omit<typeof certificate.$inferInsert, "serial" | "serialYear" | "serialNumber" | "verificationCode">;
  const planned: Planned[] = [];
  const moduleExpiresAt = addMonthsUtc(at, facts.validityMonths);
  const previous = await latestCertificate(tx, holder.id, "module", completion.moduleSlug);
  planned.push({
    ...base,
    kind: "module",
    subjectSlug: completion.moduleSlug,
    subjectTitle: facts.title,
    ceHours: facts.ceHours.toFixed(2),
    edition: taught?.edition ?? null,
    expiresAt: moduleExpiresAt,
    renewsCertificateId: previous?.id ?? null,
  });

  // Learning paths this module belongs to: a path certificate when every module of the path has a
  // valid certificate now (this completion's included). It expires at the path's validity or the
  // first module certificate's expiry, whichever comes first, so it never claims more than the
  // modules behind it. Issued again only when that would extend what the person already holds
  // (a renewal, linked to the last one).
  for (const p of loadCatalog().paths.filter((lp) => lp.modules.includes(completion.moduleSlug))) {
    const moduleCerts = await Promise.all(
      p.modules.map((slug) =>
        slug === completion.moduleSlug ? { expiresAt: moduleExpiresAt, ceHours: facts.ceHours.toFixed(2) } : latestValidCertificate(tx, holder.id, "module", slug, at),
      ),
    );
    if (moduleCerts.some((c) => !c)) continue;
    const certs = moduleCerts as { expiresAt: Date; ceHours: string }[];
    const firstExpiry = Math.min(...certs.map((c) => c.expiresAt.getTime()));
    const expiresAt = new Date(Math.min(addMonthsUtc(at, p.validityMonths).getTime(), firstExpiry));
    const held = await latestValidCertificate(tx, holder.id, "path", p.slug, at);
    if (held && held.expiresAt.getTime() >= expiresAt.getTime()) continue;
    const previousPath = await latestCertificate(tx, holder.id, "path", p.slug);
    planned.push({
      ...base,
      kind: "path",
      subjectSlug: p.slug,
      subjectTitle: p.title,
      ceHours: certs.reduce((sum, c) => sum + Number(c.ceHours), 0).toFixed(2),
      expiresAt,
      renewsCertificateId: previousPath?.id ?? null,
    });
  }

  // numbers last: the counter lock is held only for these inserts and the commit
  const serials = await takeSerials(tx, year, planned.length);
  const issued: IssuedCertificate[] = [];
  for (const [i, values] of planned.entries()) {
    const serial = serials[i]!;
    const verificationCode = newVerificationCode();
    const [{ id }] = (await tx
      .insert(certificate)
      .values({ ...values, ...serial, verificationCode })
      .$returningId()) as [{ id: number }];
    // its status-list position and holder hash for the portable credential (lib/credentials)
    await addCredentialEntry(tx, id, holder.email);
    issued.push({ id, serial: serial.serial, kind: values.kind, subjectSlug: values.subjectSlug, subjectTitle: values.subjectTitle, verificationCode, expiresAt: values.expiresAt });
  }
  // the mails are queued in this transaction: each exists exactly when its certificate does
  if (notify) for (const c of issued) await mailIssued(tx, holder.email, holder.name, c, holder.language);
  return { issued, email: holder.email, holderName: holder.name };
}

async function latestCertificate(tx: Tx, userId: string, kind: "module" | "path", slug: string) {
  const [row] = await tx
    .select({ id: certificate.id })
    .from(certificate)
    .where(and(eq(certificate.userId, userId), eq(certificate.kind, kind), eq(certificate.subjectSlug, slug)))
    .orderBy(desc(certificate.issuedAt), desc(certificate.id))
    .limit(1);
  return row ?? null;
}

/** The person's certificate for this module or path that is valid at `at` and lasts longest. */
async function latestValidCertificate(tx: Tx, userId: string, kind: "module" | "path", slug: string, at: Date) {
  const [row] = await tx
    .select({ id: certificate.id, expiresAt: certificate.expiresAt, revokedAt: certificate.revokedAt, ceHours: certificate.ceHours })
    .from(certificate)
    .where(
      and(
        eq(certificate.userId, userId),
        eq(certificate.kind, kind),
        eq(certificate.subjectSlug, slug),
        isNull(certificate.revokedAt),
        sql`${certificate.issuedAt} <= ${at}`,
        sql`${certificate.expiresAt} > ${at}`,
      ),
    )
    .orderBy(desc(certificate.expiresAt))
    .limit(1);
  return row && certificateStatus(row, at) === "valid" ? row : null;
}

async function mailIssued(tx: Tx, to: string, holderName: string, c: IssuedCertificate, language: string) {
  const link = verificationUrl(env.APP_URL, c.verificationCode);
  const t = mailTranslator(language);
  await sendMail({
    to,
    key: `certificate.issued:${c.id}`,
    kind: "certificate.issued",
    subject: t("certificate.issuedSubject", { title: c.subjectTitle }),
    text: [
      greeting(t, holderName),
      "",
      t("certificate.issuedBody", {
        kind: c.kind,
        title: c.subjectTitle,
        serial: c.serial,
        date: mailDate(language, c.expiresAt),
        link,
        certificates: `${env.APP_URL.replace(/\/+$/, "")}/certificates`,
      }),
      "",
      t("signature"),
    ].join("\n"),
  }, tx);
}

/**
 * Repair job: issues the certificate of any completion that has none (an issue that failed after its
 * completion was recorded is otherwise never retried). Idempotent like the issue itself.
 */
export async function issueMissingCertificates(limit = 200): Promise<{ checked: number; issued: number }> {
  const missing = await db
    .select({ id: moduleCompletion.id })
    .from(moduleCompletion)
    .leftJoin(certificate, and(eq(certificate.completionId, moduleCompletion.id), eq(certificate.kind, "module"), eq(certificate.subjectSlug, moduleCompletion.moduleSlug)))
    .where(isNull(certificate.id))
    .orderBy(moduleCompletion.id)
    .limit(limit);
  let issued = 0;
  for (const m of missing) issued += (await issueCertificateForCompletion(m.id)).length;
  return { checked: missing.length, issued };
}
