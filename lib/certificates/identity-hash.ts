/** The holder hash inside portable credentials (pure; see ./credential-entry). */
import { createHash } from "node:crypto";

/**
 * Open Badges 3.0 IdentityHash: "sha256$" + lowercase hex SHA-256 of the UTF-8 identifier with the
 * salt appended (OB 3.0 §B.1 IdentityObject / IdentityHash). The address is trimmed and lower-cased
 * first, so that a verifier who types it with capitals gets the same hash.
 */
export function identityHashOf(email: string, salt: string): string {
  return `sha256$${createHash("sha256").update(`${email.trim().toLowerCase()}${salt}`, "utf8").digest("hex")}`;
}

