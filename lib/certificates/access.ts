import "server-only";
/**
 * Certificate actions that depend on who is asking: downloading the PDF (holder, a manager of the
 * certificate's organization, admins) and revoking (a manager of that organization or an admin).
 */
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { user, type Certificate } from "@/db/schema";
import { AccessError, canManageOrganization, organizationFilter, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { loadCatalog } from "@/lib/content";
import { env } from "@/lib/env";
import { isLocale, type Locale } from "@/lib/i18n/browser";
import { renderCertificatePdf } from "./pdf";
import { certificateById, certificatesOfOrganization, serialOf } from "./queries";
import { revokeWithAudit } from "./revoke";
import { certificateFileName, verificationUrl } from "./status";
import { subjectTitleIn } from "./subject-title";

/** Route ids are positive integers; anything else is simply not found. */
export function parseCertificateId(raw: string): number | null {
  return /^[1-9]\d{0,9}$/.test(raw) && Number(raw) <= 2_147_483_647 ? Number(raw) : null;
}

export function canSeeCertificate(viewer: Viewer, cert: Pick<Certificate, "userId" | "organizationId">): boolean {
  return cert.userId === viewer.id || canManageOrganization(viewer, cert.organizationId);
}

/** The certificate if this viewer may download it; 404 when there is none, 403 when it is someone else's. */
export async function certificateForViewer(viewer: Viewer, rawId: string): Promise<Certificate> {
  const id = parseCertificateId(rawId);
  const cert = id === null ? null : await certificateById(id);
  if (!cert) throw new DomainError("not-found", "No certificate with that number.");
  if (!canSeeCertificate(viewer, cert)) throw new AccessError(403, "Only the holder, their organization's managers and admins can download this certificate.");
  return cert;
}

/** The PDF of a certificate as it stands now (a revoked one carries a revoked stamp). */
export async function certificatePdf(cert: Certificate, generatedAt: Date = new Date()): Promise<{ bytes: Uint8Array; fileName: string }> {
  // issued in the holder's language, whoever downloads it (a manager, an admin)
  const [holder] = await db.select({ language: user.language }).from(user).where(eq(user.id, cert.userId));
  const locale: Locale = isLocale(holder?.language) ? holder.language : "en";
  const parts =
    cert.kind === "path"
      ? (() => {
          const catalog = loadCatalog();
          const p = catalog.paths.find((x) => x.slug === cert.subjectSlug);
          return p?.modules.map((slug) => subjectTitleIn("module", slug, catalog.modules.find((m) => m.slug === slug)?.meta.title ?? slug, locale));
        })()
      : undefined;
  const bytes = await renderCertificatePdf(
    {
      serial: cert.serial,
      holderName: cert.holderName,
      organizationName: cert.organizationName,
      kind: cert.kind,
      subjectTitle: subjectTitleIn(cert.kind, cert.subjectSlug, cert.subjectTitle, locale),
      ceHours: Number(cert.ceHours),
      issuedAt: cert.issuedAt,
      expiresAt: cert.expiresAt,
      verificationCode: cert.verificationCode,
      revokedAt: cert.revokedAt,
      renewsSerial: await serialOf(cert.renewsCertificateId),
      parts,
      edition: cert.edition,
    },
    { verifyUrl: verificationUrl(env.APP_URL, cert.verificationCode), generatedAt, locale },
  );
  return { bytes, fileName: certificateFileName(cert.serial) };
}

/**
 * Revokes a certificate with a reason, and writes the audit row in the same transaction.
 * 404 unknown, 403 not the viewer's organization, 409 already revoked.
 */
export async function revokeCertificate(viewer: Viewer, rawId: string, reason: string, ip: string | null): Promise<{ id: number; serial: string; revokedAt: Date }> {
  const id = parseCertificateId(rawId);
  if (id === null) throw new DomainError("not-found", "No certificate with that number.");
  const r = await revokeWithAudit(viewer, id, reason, ip, async (cert) => {
    if (!canManageOrganization(viewer, cert.organizationId)) {
      throw new AccessError(403, "Only a manager of the holder's organization or an admin can revoke this certificate.");
    }
    // an organization the holder has left (moved by an admin) keeps read-only sight, no actions
    if (viewer.role !== "admin") {
      const [holder] = await db.select({ organizationId: user.organizationId }).from(user).where(eq(user.id, cert.userId));
      if (holder?.organizationId !== viewer.organizationId) {
        throw new AccessError(403, "The holder has moved to another organization; only an admin can revoke this certificate now.");
      }
    }
  });
  if (!r.ok) throw r.problem === "not-found" ? new DomainError("not-found", "No certificate with that number.") : new DomainError("conflict", `Certificate ${r.serial} was already revoked.`);
  return r;
}

/** Certificates a manager (own organization) or an admin (all) may revoke; empty for everyone else. */
export async function revocableCertificates(viewer: Viewer, now: Date = new Date()) {
  const scope = organizationFilter(viewer);
  return scope === undefined ? [] : certificatesOfOrganization(scope, { onlyUnrevoked: true, now, limit: 100 });
}
