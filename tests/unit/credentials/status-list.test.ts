// Bitstring Status List encoding read back with Node's own zlib, independent of the encoder:
// W3C Bitstring Status List v1.0 — §2.1 (at least 131,072 entries, 16 KB), §3.1 (GZIP, multibase
// base64url "u" prefix; index 0 is the left-most bit of the first byte).
import { gunzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { buildStatusListCredential, encodeStatusList } from "@/lib/credentials/status-list";
import { listRange, STATUS_LIST_SIZE, statusSlot } from "@/lib/credentials/urls";

const decode = (encoded: string) => {
  expect(encoded.startsWith("u")).toBe(true);
  return gunzipSync(Buffer.from(encoded.slice(1), "base64url"));
};
const bit = (bytes: Buffer, i: number) => (bytes[Math.floor(i / 8)]! >> (7 - (i % 8))) & 1;

describe("bitstring status list", () => {
  it("is 16 KB of bits (131,072 entries), all 0 when nothing is revoked", () => {
    expect(STATUS_LIST_SIZE).toBe(131_072);
    const bytes = decode(encodeStatusList([]));
    expect(bytes.length).toBe(16_384);
    expect(bytes.every((b) => b === 0)).toBe(true);
  });

  it("sets exactly the given bits, left-most bit first", () => {
    const set = [0, 7, 8, 1000, 131_071];
    const bytes = decode(encodeStatusList(set));
    expect(bytes[0]).toBe(0b1000_0001); // indexes 0 and 7
    expect(bytes[1]).toBe(0b1000_0000); // index 8
    for (let i = 0; i < STATUS_LIST_SIZE; i += 997) expect(bit(bytes, i), `bit ${i}`).toBe(set.includes(i) ? 1 : 0);
    for (const i of set) expect(bit(bytes, i)).toBe(1);
    expect(bytes.reduce((n, b) => n + b.toString(2).replaceAll("0", "").length, 0)).toBe(set.length);
  });

  it("uses base64url without padding and refuses an index outside the list", () => {
    expect(encodeStatusList([5, 99])).toMatch(/^u[A-Za-z0-9_-]+$/);
    expect(() => encodeStatusList([STATUS_LIST_SIZE])).toThrow(RangeError);
    expect(() => encodeStatusList([-1])).toThrow(RangeError);
  });

  it("maps positions to lists and indexes without overlap", () => {
    expect(statusSlot(1)).toEqual({ list: 1, index: 0 });
    expect(statusSlot(STATUS_LIST_SIZE)).toEqual({ list: 1, index: STATUS_LIST_SIZE - 1 });
    expect(statusSlot(STATUS_LIST_SIZE + 1)).toEqual({ list: 2, index: 0 });
    expect(listRange(2)).toEqual({ first: STATUS_LIST_SIZE + 1, last: 2 * STATUS_LIST_SIZE });
  });

  it("is carried by a BitstringStatusListCredential for revocation (§2.2)", () => {
    const c = buildStatusListCredential("https://r.example/api/credentials/status/1", "https://r.example/api/credentials/issuer", "uABC", new Date("2026-12-02T08:00:00.500Z"));
    expect(c.type).toEqual(["VerifiableCredential", "BitstringStatusListCredential"]);
    expect(c.credentialSubject).toEqual({ id: "https://r.example/api/credentials/status/1#list", type: "BitstringStatusList", statusPurpose: "revocation", encodedList: "uABC" });
    expect(c.validFrom).toBe("2026-12-02T08:00:00Z");
  });
});
