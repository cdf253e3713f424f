// Verification codes that are easy to type: Crockford's base32 alphabet (Douglas Crockford,
// "Base32", crockford.com/base32.html: 0-9 A-Z without I L O U; decoding reads O as 0 and I, L
// as 1), grouped by four, no trailing punctuation; old base64url codes and serials still accepted.
import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { CODE_ALPHABET, CODE_LENGTH, formatVerificationCode, newVerificationCode, parseVerifyInput } from "@/lib/certificates/verify-code";

describe("new verification codes", () => {
  it("carry at least 128 bits, use only unambiguous symbols and never end in punctuation", () => {
    expect(CODE_ALPHABET).toHaveLength(32);
    expect(CODE_LENGTH * Math.log2(CODE_ALPHABET.length)).toBeGreaterThanOrEqual(128);
    expect(CODE_ALPHABET).not.toMatch(/[ILOU]/);
    for (let i = 0; i < 500; i++) {
      const code = newVerificationCode(randomBytes);
      expect(code).toMatch(/^[0-9A-HJKMNP-TV-Z]{28}$/);
      const shown = formatVerificationCode(code);
      expect(shown).toMatch(/^([0-9A-Z]{4}-){6}[0-9A-Z]{4}$/);
      expect(shown).not.toMatch(/[-_]$/);
    }
  });
  it("reads what a person types: any case, spaces or dashes, O for 0, I and L for 1", () => {
    const code = "7KQ2M9XD0A1BCDEF2GHJ3KMN4PQR";
    expect(parseVerifyInput(formatVerificationCode(code))).toEqual({ kind: "code", code });
    expect(parseVerifyInput("7kq2 m9xd oa1b cdef 2ghj 3kmn 4pqr")).toEqual({ kind: "code", code });
    expect(parseVerifyInput("7KQ2-M9XD-0AIB-CDEF-2GHJ-3KMN-4PQR")).toEqual({ kind: "code", code });
    expect(parseVerifyInput(`https://riser.example/verify/${code}`)).toEqual({ kind: "code", code });
  });
});

describe("old codes and serials", () => {
  it("keeps old base64url codes exactly as issued, including a trailing dash", () => {
    const old = "AbCdEfGhIjKlMnOpQrStUv_-";
    expect(parseVerifyInput(old)).toEqual({ kind: "code", code: old });
    expect(parseVerifyInput(`https://riser.example/verify/${old}`)).toEqual({ kind: "code", code: old });
  });
  it("accepts the certificate's serial, and refuses anything else", () => {
    expect(parseVerifyInput("RSR-2026-000123")).toEqual({ kind: "serial", serial: "RSR-2026-000123" });
    expect(parseVerifyInput(" rsr-2026-000123 ")).toEqual({ kind: "serial", serial: "RSR-2026-000123" });
    expect(parseVerifyInput("nope")).toBeNull();
    expect(parseVerifyInput("RSR-26-1")).toBeNull();
  });
});
