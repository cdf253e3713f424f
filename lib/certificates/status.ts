/**
 * Pure certificate rules shared by the server, the pages and the tests (no server code here):
 * status computed from dates, serial format, verification-code format, dates and file names.
 */

export type CertificateStatus = "valid" | "expired" | "revoked";
export type CertificateKind = "module" | "path";

/** The expiry reminder goes out this many days before a certificate expires (Riser's own choice). */
export const EXPIRY_REMINDER_DAYS = 30;
const DAY_MS = 24 * 60 * 60 * 1000;

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
  return certificateStatus(cert, now) === "valid" && cert.expiresAt.getTime() - now.getTime() <= EXPIRY_REMINDER_DAYS * DAY_MS;
}

/** Whole days from `now` until `date` (rounded up; 0 or less once it has passed). */
export function daysUntil(date: Date, now: Date = new Date()): number {
  return Math.ceil((date.getTime() - now.getTime()) / DAY_MS);
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

/** `date` plus whole calendar months in UTC; the day is clamped (Jan 31 + 1 month = Feb 28/29). */
export function addMonthsUtc(date: Date, months: number): Date {
  const y = date.getUTCFullYear();
  const m = date.getUTCMonth() + months;
  const target = new Date(Date.UTC(y, m, 1, date.getUTCHours(), date.getUTCMinutes(), date.getUTCSeconds(), date.getUTCMilliseconds()));
  const lastDay = new Date(Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0)).getUTCDate();
  target.setUTCDate(Math.min(date.getUTCDate(), lastDay));
  return target;
}

/** "December 1, 2026" in UTC, the way dates are printed on certificates and pages. */
const dateFormat = new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" });
export function formatCertificateDate(date: Date): string {
  return dateFormat.format(date);
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
