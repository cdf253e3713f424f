import "server-only";
/**
 * The hook for portable credentials (lib/credentials): every certificate gets its status-list
 * position and the salted hash of its holder's e-mail in the transaction that issues it (a row in
 * `credential_status_entry`; the auto-increment id is the position, so two issues never share one).
 * Certificates issued before this existed get theirs on first request (`ensureCredentialEntry`).
 */
import { randomBytes } from "node:crypto";
import { eq } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { certificate, credentialStatusEntry, user } from "@/db/schema";
import { identityHashOf } from "./identity-hash";

export { identityHashOf };

export const newIdentitySalt = () => randomBytes(16).toString("hex");

/** Inside the issuing transaction: the certificate's entry (once; a repeat is ignored). */
export async function addCredentialEntry(tx: Tx, certificateId: number, email: string): Promise<void> {
  const salt = newIdentitySalt();
  await tx.insert(credentialStatusEntry).ignore().values({ certificateId, salt, identityHash: identityHashOf(email, salt) });
}

export type CredentialEntry = { position: number; salt: string; identityHash: string };

/**
 * The entry of one certificate, made now if it has none (older certificates). Null when the holder's
 * account is gone and the certificate never had an entry: there is no address left to hash.
 */
export async function ensureCredentialEntry(certificateId: number): Promise<CredentialEntry | null> {
  const read = async () => {
    const [row] = await db.select().from(credentialStatusEntry).where(eq(credentialStatusEntry.certificateId, certificateId));
    return row ? { position: row.id, salt: row.salt, identityHash: row.identityHash } : null;
  };
  const found = await read();
  if (found) return found;
  const [holder] = await db
    .select({ email: user.email })
    .from(certificate)
    .innerJoin(user, eq(user.id, certificate.userId))
    .where(eq(certificate.id, certificateId));
  if (!holder) return null;
  const salt = newIdentitySalt();
  // INSERT IGNORE on the unique certificate id: a concurrent first request keeps the other's row
  await db.insert(credentialStatusEntry).ignore().values({ certificateId, salt, identityHash: identityHashOf(holder.email, salt) });
  return read();
}
