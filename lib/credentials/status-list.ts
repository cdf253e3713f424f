/**
 * W3C Bitstring Status List v1.0 (Recommendation, 2025) encoding: the bitstring (index 0 is the
 * left-most bit of the first byte, §3.1), GZIP-compressed, then multibase base64url without padding
 * (prefix "u"). Lists hold STATUS_LIST_SIZE entries (131 072 bits = 16 KB, the minimum of §2.1).
 */
import { gzipSync } from "node:zlib";
import { VC_CONTEXT_V2, STATUS_LIST_SIZE } from "./urls";

export function encodeStatusList(setIndexes: Iterable<number>, size = STATUS_LIST_SIZE): string {
  const bytes = new Uint8Array(Math.ceil(size / 8));
  for (const i of setIndexes) {
    if (!Number.isInteger(i) || i < 0 || i >= size) throw new RangeError(`status index ${i} is outside the list`);
    bytes[i >> 3]! |= 0x80 >> (i & 7);
  }
  return `u${gzipSync(bytes).toString("base64url")}`;
}

/** The unsigned BitstringStatusListCredential (§2.2) for revocation. */
export function buildStatusListCredential(listUrl: string, issuer: string, encodedList: string, validFrom: Date) {
  return {
    "@context": [VC_CONTEXT_V2],
    id: listUrl,
    type: ["VerifiableCredential", "BitstringStatusListCredential"],
    issuer,
    validFrom: validFrom.toISOString().replace(/\.\d{3}Z$/, "Z"),
    credentialSubject: { id: `${listUrl}#list`, type: "BitstringStatusList", statusPurpose: "revocation", encodedList },
  };
}
