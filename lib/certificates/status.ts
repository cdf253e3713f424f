/**
 * Pure certificate rules shared by the server, the pages and the tests (no server code here):
 * status computed from dates, serial format, verification-code format, dates and file names.
 */

import { addMonthsUtc, daysUntil, longDate } from "@/lib/dates";
import { EXPIRING_DAYS, isExpiring } from "@/lib/expiring";

export { addMonthsUtc, daysUntil };

export type CertificateStatus = "valid" | "expired" | "revoked";
export type CertificateKind = "module" | "path";

/** The expiry reminder goes out this many days before a certificate expires: the "expiring" window (lib/expiring). */
export const EXPIRY_REMINDER_DAYS = EXPIRING_DAYS;

/**
 * valid / expired / revoked at `now`. Revocation wins over expiry; a certificate is expired from
 * its expiry instant on. Computed on every look, so nothing has to flip a stored flag.
 */
export function certificateStatus(cert: { expiresAt: Date; revokedAt: Date | null }, now: Date = new Date()): CertificateStatus {
  if (cert.revokedAt) return "revoked";
  return cert.expiresAt.getTime() <= now.getTime() ? "expired" : "valid";
}

/** Valid now, and expiring within the reminder window. */
export function isExpiringSoon(cert: { expiresAt: Date; revokedAt: Date | null }, now: Date = new Date()): boolean {
  return certificateStatus(cert, now) === "valid" && isExpiring(cert.expiresAt, now);
}

export const SERIAL_PREFIX = "RSR";
export const SERIAL_RE = /^RSR-(\d{4})-(\d{6,})$/;

/** RSR-2026-000123: year of issue, then the number within that year, at least six digits. */
export function formatSerial(year: number, n: number): string {
  if (!Number.isInteger(year) || year < 1000 || year > 9999) throw new RangeError(`bad serial year ${year}`);
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`bad serial number ${n}`);
  return `${SERIAL_PREFIX}-${year}-${String(n).padStart(6, "0")}`;
}

export function parseSerial(serial: string): { year: number; n: number } | null {
  const m = SERIAL_RE.exec(serial);
  return m ? { year: Number(m[1]), n: Number(m[2]) } : null;
}

/** Verification codes: 18 random bytes as base64url = 24 characters, 144 bits. */
export const VERIFICATION_CODE_BYTES = 18;
export const VERIFICATION_CODE_RE = /^[A-Za-z0-9_-]{24}$/;
export const isVerificationCode = (s: string) => VERIFICATION_CODE_RE.test(s);

/**
 * Pulls a code out of what someone typed or pasted: the bare code, or a whole verification link.
 * Returns null when nothing code-shaped is there.
 */
export function extractVerificationCode(input: string): string | null {
  const s = input.trim();
  const fromUrl = /\/verify\/([A-Za-z0-9_-]+)\/?(?:[?#].*)?$/.exec(s)?.[1];
  const code = fromUrl ?? s;
  return isVerificationCode(code) ? code : null;
}

/** "December 1, 2026" in UTC, the way dates are printed on certificates and pages. */
export function formatCertificateDate(date: Date): string {
  return longDate(date);
}

/** Hours as printed: "1.5", "2", "8.25". */
export function formatHours(hours: number): string {
  return String(Math.round(hours * 100) / 100);
}

export function verificationUrl(appUrl: string, code: string): string {
  return `${appUrl.replace(/\/+$/, "")}/verify/${code}`;
}

export function certificateFileName(serial: string): string {
  return `riser-certificate-${serial}.pdf`;
}

export const STATUS_LABEL: Record<CertificateStatus, string> = { valid: "Valid", expired: "Expired", revoked: "Revoked" };
export const KIND_LABEL: Record<CertificateKind, string> = { module: "Module", path: "Learning path" };
