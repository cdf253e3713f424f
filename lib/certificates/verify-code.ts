/**
 * Verification codes and what a person may type to check a certificate. Plain data (no server
 * code): the form, the page, the API and issuing share it.
 *
 * New codes (from this version on): 28 characters of Crockford's base32 alphabet
 * (0-9 A-Z without I, L, O, U: no letter that reads as a digit), 140 random bits, printed in
 * groups of four ("7KQ2-M9XD-…"). Typing is forgiving: case, spaces and dashes do not matter, and
 * O/I/L are read as 0/1/1, as Crockford's decoding rules say.
 * Old codes (24 characters of base64url, case-sensitive, sometimes ending in "-" or "_") still
 * verify, exactly as issued.
 * The certificate's serial ("RSR-2026-000123") is accepted too.
 */
export const CODE_ALPHABET = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";
export const CODE_LENGTH = 28; // 28 × 5 bits = 140 bits (≥ 128)
export const CODE_GROUP = 4;

const OLD_CODE_RE = /^[A-Za-z0-9_-]{24}$/;
const NEW_CODE_RE = new RegExp(`^[${CODE_ALPHABET}]{${CODE_LENGTH}}$`);
const SERIAL_INPUT_RE = /^RSR-(\d{4})-(\d{6,})$/;

/**
 * A fresh code in canonical form (no dashes) from a random-byte source (node:crypto's randomBytes
 * on the server). 256 is a multiple of 32, so `& 31` keeps every symbol equally likely.
 */
export function newVerificationCode(bytes: (n: number) => Uint8Array): string {
  const raw = bytes(CODE_LENGTH);
  let out = "";
  for (let i = 0; i < CODE_LENGTH; i++) out += CODE_ALPHABET[raw[i]! & 31];
  return out;
}

/** "7KQ2M9XD…" → "7KQ2-M9XD-…" for print and screen; old codes are shown as they are. */
export function formatVerificationCode(code: string): string {
  if (!NEW_CODE_RE.test(code)) return code;
  return code.match(new RegExp(`.{1,${CODE_GROUP}}`, "g"))!.join("-");
}

/** Typed text → canonical new code, or null. */
export function normalizeNewCode(input: string): string | null {
  const s = input
    .toUpperCase()
    .replace(/[\s\u2010-\u2015-]+/g, "")
    .replace(/O/g, "0")
    .replace(/[IL]/g, "1");
  return NEW_CODE_RE.test(s) ? s : null;
}

export type VerifyLookup = { kind: "code"; code: string } | { kind: "serial"; serial: string };

/** What was typed or pasted (a code, grouped or not; an old code; a whole link; a serial) → what to look up. */
export function parseVerifyInput(input: string): VerifyLookup | null {
  let s = input.trim();
  const fromUrl = /\/verify\/([^/?#\s]+)\/?(?:[?#].*)?$/.exec(s)?.[1];
  if (fromUrl) s = decodeURIComponent(fromUrl);
  const serial = SERIAL_INPUT_RE.exec(s.toUpperCase().replace(/\s+/g, ""));
  if (serial) return { kind: "serial", serial: `RSR-${serial[1]}-${serial[2]}` };
  if (OLD_CODE_RE.test(s)) return { kind: "code", code: s };
  const fresh = normalizeNewCode(s);
  return fresh ? { kind: "code", code: fresh } : null;
}

/** The path segment for a lookup: /verify/<this>. */
export const verifyPathSegment = (l: VerifyLookup) => (l.kind === "code" ? l.code : l.serial);

export const VERIFY_INPUT_HINT =
  "The verification code printed under the verification address on the certificate (groups of four letters and digits), or the certificate's serial (RSR-2026-000123). A pasted link works too.";
export const VERIFY_INPUT_ERROR = "That is neither a Riser verification code nor a certificate serial. Check it against the certificate: the code is printed under the verification address.";
