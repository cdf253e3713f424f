import "server-only";
/**
 * The revocation status lists, built from the certificates as they stand at each request: a
 * manager's revocation (lib/certificates, revokeWithAudit) sets the bit the moment it commits, and
 * the public verification page, /api/verify and the list all read the same `revoked_at`.
 */
import { and, between, eq, isNotNull, max } from "drizzle-orm";
import { db } from "@/db/client";
import { certificate, credentialStatusEntry } from "@/db/schema";
import { env } from "@/lib/env";
import { DomainError } from "@/lib/errors";
import { signCredential } from "./keyring";
import { keyRing } from "./keys";
import { buildStatusListCredential, encodeStatusList } from "./status-list";
import { issuerUrl, listRange, statusListUrl, statusSlot } from "./urls";

/** "1", "2" … → the list number; anything else is a 400, a list past the last one a 404. */
export async function parseListNumber(raw: string): Promise<number> {
  if (!/^[1-9]\d{0,5}$/.test(raw)) throw new DomainError("invalid", "A status list is named by its number, for example /api/credentials/status/1.");
  const list = Number(raw);
  const [row] = await db.select({ last: max(credentialStatusEntry.id) }).from(credentialStatusEntry);
  const lists = row?.last ? statusSlot(row.last).list : 1;
  if (list > lists) throw new DomainError("not-found", `There is no status list ${list}: this instance has ${lists}.`);
  return list;
}

/** Indexes of revoked certificates in one list. */
export async function revokedIndexes(list: number): Promise<number[]> {
  const { first, last } = listRange(list);
  const rows = await db
    .select({ position: credentialStatusEntry.id })
    .from(credentialStatusEntry)
    .innerJoin(certificate, eq(certificate.id, credentialStatusEntry.certificateId))
    .where(and(between(credentialStatusEntry.id, first, last), isNotNull(certificate.revokedAt)));
  return rows.map((r) => statusSlot(r.position).index);
}

/** The signed BitstringStatusListCredential of one list (VC-JWT, like the credentials it serves). */
export async function signedStatusList(list: number, now: Date = new Date()): Promise<string> {
  const url = statusListUrl(env.APP_URL, list);
  const credential = buildStatusListCredential(url, issuerUrl(env.APP_URL), encodeStatusList(await revokedIndexes(list)), now);
  return signCredential(await keyRing(), credential);
}
