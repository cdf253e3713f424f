// Certificate rules that need no server: status from dates with an injected clock, serial format,
// verification-code format (base64url alphabet of RFC 4648 §5) and calendar-month arithmetic.
import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import {
  addMonthsUtc,
  certificateFileName,
  certificateStatus,
  daysUntil,
  extractVerificationCode,
  formatCertificateDate,
  formatSerial,
  isExpiringSoon,
  isVerificationCode,
  parseSerial,
  VERIFICATION_CODE_BYTES,
} from "@/lib/certificates/status";
import { revokeInput, verifyCodeInput } from "@/lib/certificates/schemas";

const issued = new Date("2026-03-15T09:30:00.000Z");
const expires = new Date("2028-03-15T09:30:00.000Z");

describe("certificate status (computed at the moment someone looks)", () => {
  it("is valid before the expiry instant and expired from it on", () => {
    const cert = { expiresAt: expires, revokedAt: null };
    expect(certificateStatus(cert, new Date("2027-01-01T00:00:00Z"))).toBe("valid");
    expect(certificateStatus(cert, new Date(expires.getTime() - 1))).toBe("valid");
    expect(certificateStatus(cert, expires)).toBe("expired");
    expect(certificateStatus(cert, new Date("2030-01-01T00:00:00Z"))).toBe("expired");
  });

  it("is revoked whatever the dates say", () => {
    const revokedAt = new Date("2026-06-01T00:00:00Z");
    expect(certificateStatus({ expiresAt: expires, revokedAt }, new Date("2026-07-01T00:00:00Z"))).toBe("revoked");
    expect(certificateStatus({ expiresAt: expires, revokedAt }, new Date("2031-01-01T00:00:00Z"))).toBe("revoked");
  });

  it("flags expiring soon within 30 days of expiry, only while valid (Riser's reminder window)", () => {
    const cert = { expiresAt: expires, revokedAt: null };
    expect(isExpiringSoon(cert, new Date(expires.getTime() - 31 * 86_400_000))).toBe(false);
    expect(isExpiringSoon(cert, new Date(expires.getTime() - 30 * 86_400_000))).toBe(true);
    expect(isExpiringSoon(cert, new Date(expires.getTime() - 1000))).toBe(true);
    expect(isExpiringSoon(cert, expires)).toBe(false);
    expect(isExpiringSoon({ expiresAt: expires, revokedAt: issued }, new Date(expires.getTime() - 86_400_000))).toBe(false);
    expect(daysUntil(expires, new Date(expires.getTime() - 29.5 * 86_400_000))).toBe(30);
  });
});

describe("dates", () => {
  it("adds calendar months in UTC, clamping to the month's last day (Gregorian calendar)", () => {
    expect(addMonthsUtc(issued, 24).toISOString()).toBe(expires.toISOString());
    // 2028 is a leap year (divisible by 4, not a century): Feb 29 exists
    expect(addMonthsUtc(new Date("2026-01-31T12:00:00Z"), 25).toISOString()).toBe("2028-02-29T12:00:00.000Z");
    expect(addMonthsUtc(new Date("2026-01-31T12:00:00Z"), 13).toISOString()).toBe("2027-02-28T12:00:00.000Z");
    expect(addMonthsUtc(new Date("2026-12-15T00:00:00Z"), -26).toISOString()).toBe("2024-10-15T00:00:00.000Z");
  });
  it("prints dates in US English in UTC", () => {
    expect(formatCertificateDate(new Date("2026-12-01T23:30:00Z"))).toBe("December 1, 2026");
  });
});

describe("serials", () => {
  it("formats RSR-<year>-<six digits> and reads it back", () => {
    expect(formatSerial(2026, 123)).toBe("RSR-2026-000123");
    expect(formatSerial(2027, 1)).toBe("RSR-2027-000001");
    expect(formatSerial(2026, 1_234_567)).toBe("RSR-2026-1234567");
    expect(parseSerial("RSR-2026-000123")).toEqual({ year: 2026, n: 123 });
    expect(parseSerial("RSR-26-1")).toBeNull();
    expect(() => formatSerial(2026, 0)).toThrow(RangeError);
    expect(certificateFileName("RSR-2026-000123")).toBe("riser-certificate-RSR-2026-000123.pdf");
  });
});

describe("verification codes", () => {
  it("carry at least 128 bits and use only the URL-safe base64 alphabet (RFC 4648 §5)", () => {
    expect(VERIFICATION_CODE_BYTES * 8).toBeGreaterThanOrEqual(128);
    for (let i = 0; i < 200; i++) {
      const code = randomBytes(VERIFICATION_CODE_BYTES).toString("base64url");
      expect(code).toMatch(/^[A-Za-z0-9_-]+$/);
      expect(isVerificationCode(code)).toBe(true);
    }
  });
  it("rejects anything else, and finds a code inside a pasted link", () => {
    const code = "AbCdEfGhIjKlMnOpQrStUv_-";
    expect(isVerificationCode(code.slice(1))).toBe(false);
    expect(isVerificationCode(`${code}x`)).toBe(false);
    expect(isVerificationCode("AbCdEfGhIjKlMnOpQrStUv+/")).toBe(false); // standard base64, not base64url
    expect(extractVerificationCode(`  ${code} `)).toBe(code);
    expect(extractVerificationCode(`https://riser.example/verify/${code}`)).toBe(code);
    expect(extractVerificationCode(`https://riser.example/verify/${code}/?utm=x`)).toBe(code);
    expect(extractVerificationCode("https://riser.example/verify/short")).toBeNull();
    expect(verifyCodeInput.safeParse({ code: "nope" }).success).toBe(false);
    expect(verifyCodeInput.safeParse({ code }).success).toBe(true);
  });
  it("requires a revocation reason of real words", () => {
    expect(revokeInput.safeParse({}).success).toBe(false);
    expect(revokeInput.safeParse({ reason: "    " }).success).toBe(false);
    expect(revokeInput.safeParse({ reason: "Quiz taken by someone else" }).success).toBe(true);
  });
});
