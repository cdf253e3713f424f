import "server-only";
import { and, desc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { certificate, type Certificate } from "@/db/schema";
import { loadCatalog, subjectTitle, type ContentLocale } from "@/lib/content";
import { parseVerifyInput } from "./verify-code";
import { certificateStatus, isExpiringSoon, type CertificateKind, type CertificateStatus } from "./status";
import { subjectTitleIn } from "./subject-title";
import type { Locale } from "@/lib/i18n/browser";

/** What the holder's own list shows (no verification secrets of others, no audit detail). */
export type HolderCertificate = {
  id: number;
  serial: string;
  kind: CertificateKind;
  subjectSlug: string;
  subjectTitle: string;
  ceHours: number;
  issuedAt: Date;
  expiresAt: Date;
  status: CertificateStatus;
  expiringSoon: boolean;
  verificationCode: string;
  revokedAt: Date | null;
  renewsSerial: string | null;
  renewedBySerial: string | null;
};

/**
 * A person's certificates, newest first, with status computed at `now`. Renewals are always the same
 * person's. `locale`: the language the subject is named in (the stored title when the slug is gone).
 */
export async function certificatesOfHolder(userId: string, now: Date = new Date(), locale: ContentLocale = "en"): Promise<HolderCertificate[]> {
  const catalog = loadCatalog();
  const known = (kind: string, slug: string) => (kind === "module" ? catalog.modules : catalog.paths).some((x) => x.slug === slug);
  const rows = await db.select().from(certificate).where(eq(certificate.userId, userId)).orderBy(desc(certificate.issuedAt), desc(certificate.id));
  const serialById = new Map(rows.map((c) => [c.id, c.serial]));
  const renewedBy = new Map<number, string>();
  for (const c of [...rows].reverse()) if (c.renewsCertificateId !== null) renewedBy.set(c.renewsCertificateId, c.serial);
  return rows.map((c) => ({
    id: c.id,
    serial: c.serial,
    kind: c.kind,
    subjectSlug: c.subjectSlug,
    subjectTitle: locale !== "en" && known(c.kind, c.subjectSlug) ? subjectTitle(c.kind, c.subjectSlug, locale, catalog) : c.subjectTitle,
    ceHours: Number(c.ceHours),
    issuedAt: c.issuedAt,
    expiresAt: c.expiresAt,
    status: certificateStatus(c, now),
    expiringSoon: isExpiringSoon(c, now),
    verificationCode: c.verificationCode,
    revokedAt: c.revokedAt,
    renewsSerial: c.renewsCertificateId !== null ? (serialById.get(c.renewsCertificateId) ?? null) : null,
    renewedBySerial: renewedBy.get(c.id) ?? null,
  }));
}

/**
 * The public verification record: exactly these fields and nothing else (no e-mail, no ids, no
 * organization, no other certificates, no revocation reason).
 */
export type PublicVerification = {
  serial: string;
  holderName: string;
  title: string;
  kind: CertificateKind;
  ceHours: number;
  issuedAt: string;
  expiresAt: string;
  status: CertificateStatus;
};

/** `locale`: the viewer's language, in which the module or path is named (the same slug in every language). */
export async function verificationByCode(input: string, now: Date = new Date(), locale: Locale = "en"): Promise<PublicVerification | null> {
  // A code (new grouped form, old base64url form, or a pasted link) or the certificate's serial.
  const lookup = parseVerifyInput(input);
  if (!lookup) return null;
  const [c] = await db
    .select({
      serial: certificate.serial,
      holderName: certificate.holderName,
      title: certificate.subjectTitle,
      slug: certificate.subjectSlug,
      kind: certificate.kind,
      ceHours: certificate.ceHours,
      issuedAt: certificate.issuedAt,
      expiresAt: certificate.expiresAt,
      revokedAt: certificate.revokedAt,
      code: certificate.verificationCode,
    })
    .from(certificate)
    .where(lookup.kind === "code" ? eq(certificate.verificationCode, lookup.code) : eq(certificate.serial, lookup.serial))
    .limit(1);
  if (!c || (lookup.kind === "code" && c.code !== lookup.code)) return null;
  return {
    serial: c.serial,
    holderName: c.holderName,
    title: subjectTitleIn(c.kind, c.slug, c.title, locale),
    kind: c.kind,
    ceHours: Number(c.ceHours),
    issuedAt: c.issuedAt.toISOString(),
    expiresAt: c.expiresAt.toISOString(),
    status: certificateStatus(c, now),
  };
}

export async function certificateById(id: number): Promise<Certificate | null> {
  const [c] = await db.select().from(certificate).where(eq(certificate.id, id));
  return c ?? null;
}

export async function serialOf(id: number | null): Promise<string | null> {
  if (id === null) return null;
  const [c] = await db.select({ serial: certificate.serial }).from(certificate).where(eq(certificate.id, id));
  return c?.serial ?? null;
}

export type OrganizationCertificate = {
  id: number;
  serial: string;
  holderName: string;
  organizationName: string | null;
  kind: CertificateKind;
  subjectTitle: string;
  issuedAt: Date;
  expiresAt: Date;
  status: CertificateStatus;
  expiringSoon: boolean;
};

/**
 * Certificates of one organization (or of all, for `null` — admins only; callers check access),
 * newest first. Team figures read `status` and `expiringSoon`.
 */
export async function certificatesOfOrganization(organizationId: string | null, opts: { limit?: number; onlyUnrevoked?: boolean; now?: Date } = {}): Promise<OrganizationCertificate[]> {
  const now = opts.now ?? new Date();
  const rows = await db
    .select()
    .from(certificate)
    .where(and(organizationId ? eq(certificate.organizationId, organizationId) : undefined, opts.onlyUnrevoked ? isNull(certificate.revokedAt) : undefined))
    .orderBy(desc(certificate.issuedAt), desc(certificate.id))
    .limit(opts.limit ?? 200);
  return rows.map((c) => ({
    id: c.id,
    serial: c.serial,
    holderName: c.holderName,
    organizationName: c.organizationName,
    kind: c.kind,
    subjectTitle: c.subjectTitle,
    issuedAt: c.issuedAt,
    expiresAt: c.expiresAt,
    status: certificateStatus(c, now),
    expiringSoon: isExpiringSoon(c, now),
  }));
}
