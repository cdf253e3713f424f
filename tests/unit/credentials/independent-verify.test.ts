// A certificate's signed credential checked by a verifier that shares no code with the signer:
// lib/credentials signs with jose; here the VC-JWT is taken apart by hand (RFC 7515 §5.2 JWS
// validation: the signature covers ASCII(BASE64URL(header) "." BASE64URL(payload))) and the EdDSA
// signature (RFC 8037 §3.1, Ed25519) is checked with Node's own crypto (OpenSSL), using only the public
// keys as published in the JWK Set. Changing the credential's name, the achievement's name, the hours
// or a date breaks it; a credential signed before a key rotation still verifies once the old key is
// published as retired.
import { createPublicKey, generateKeyPairSync, verify } from "node:crypto";
import { describe, expect, it } from "vitest";
import { identityHashOf } from "@/lib/certificates/identity-hash";
import { buildOpenBadgeCredential, criteriaNarrative } from "@/lib/credentials/badge";
import { buildKeyRing, jwks, signCredential } from "@/lib/credentials/keyring";

const APP = "https://training.riser.example";
const pem = (key = generateKeyPairSync("ed25519").privateKey) => key.export({ format: "pem", type: "pkcs8" }).toString();
const salt = "0f1e2d3c4b5a69788796a5b4c3d2e1f0";
const credential = () =>
  buildOpenBadgeCredential(
    APP,
    {
      serial: "RSR-2026-000456",
      kind: "module",
      subjectSlug: "pipe-and-joining",
      subjectTitle: "Pipe and joining",
      ceHours: 2,
      issuedAt: new Date("2026-04-10T09:30:00Z"),
      expiresAt: new Date("2028-04-10T09:30:00Z"),
      verificationCode: "9XD3HTVA8RWEC6N4JPB5GFZ7KQ2M",
    },
    { description: "Joining methods for the pipe materials of home systems.", criteria: criteriaNarrative("module", { passMark: 80 }) },
    { position: 7, salt, identityHash: identityHashOf("nell.arbogast@quillmoor.example", salt) },
  );

type Jwk = { kid: string; kty: string; crv: string; x: string };

/** RFC 7515 §5.2 by hand: the key named by the header's kid in the published set, then Ed25519 over the signing input. */
function independentlyVerified(jwt: string, published: { keys: unknown[] }): Record<string, unknown> | null {
  const parts = jwt.split(".");
  if (parts.length !== 3) return null;
  const [h, p, s] = parts as [string, string, string];
  const header = JSON.parse(Buffer.from(h, "base64url").toString("utf8")) as { alg?: string; kid?: string };
  if (header.alg !== "EdDSA") return null;
  const jwk = (published.keys as Jwk[]).find((k) => k.kid === header.kid);
  if (!jwk || jwk.kty !== "OKP" || jwk.crv !== "Ed25519") return null;
  const key = createPublicKey({ key: { kty: "OKP", crv: "Ed25519", x: jwk.x }, format: "jwk" });
  const ok = verify(null, Buffer.from(`${h}.${p}`, "ascii"), key, Buffer.from(s, "base64url"));
  return ok ? (JSON.parse(Buffer.from(p, "base64url").toString("utf8")) as Record<string, unknown>) : null;
}

type Payload = { name: string; validFrom: string; validUntil: string; exp: number; credentialSubject: { creditsEarned: number; achievement: { name: string; creditsAvailable: number } } };

/** The same JWT with its payload changed and the original signature kept. */
function tampered(jwt: string, change: (payload: Payload) => void): string {
  const [h, p, s] = jwt.split(".") as [string, string, string];
  const payload = JSON.parse(Buffer.from(p, "base64url").toString("utf8")) as Payload;
  change(payload);
  return `${h}.${Buffer.from(JSON.stringify(payload)).toString("base64url")}.${s}`;
}

describe("the signed credential, verified without jose", () => {
  it("verifies with the published public key and carries the credential unchanged", async () => {
    const ring = await buildKeyRing(pem(), [], APP);
    const c = credential();
    const payload = independentlyVerified(await signCredential(ring, c), JSON.parse(JSON.stringify(jwks(ring))));
    expect(payload).not.toBeNull();
    expect(payload!.credentialSubject).toEqual(JSON.parse(JSON.stringify(c.credentialSubject)));
    expect(payload!.name).toBe(c.name);
  });

  it("fails once the name, the achievement's name, the hours or a date is changed", async () => {
    const ring = await buildKeyRing(pem(), [], APP);
    const jwt = await signCredential(ring, credential());
    const published = JSON.parse(JSON.stringify(jwks(ring))) as { keys: unknown[] };
    const changes: [string, (p: Payload) => void][] = [
      ["credential name", (p) => (p.name = "Pipe and joining (Riser certificate RSR-2026-000999)")],
      ["achievement name", (p) => (p.credentialSubject.achievement.name = "Hydraulic design")],
      ["hours earned", (p) => (p.credentialSubject.creditsEarned = 20)],
      ["hours available", (p) => (p.credentialSubject.achievement.creditsAvailable = 20)],
      ["validFrom", (p) => (p.validFrom = "2025-04-10T09:30:00Z")],
      ["validUntil and exp", (p) => ((p.validUntil = "2031-04-10T09:30:00Z"), (p.exp = Date.parse("2031-04-10T09:30:00Z") / 1000))],
    ];
    for (const [what, change] of changes) expect(independentlyVerified(tampered(jwt, change), published), what).toBeNull();
  });

  it("a credential signed with a rotated-out key verifies against the set published after the rotation; without the retired key it does not", async () => {
    const old = generateKeyPairSync("ed25519");
    const before = await buildKeyRing(pem(old.privateKey), [], APP);
    const oldJwt = await signCredential(before, credential());

    const after = await buildKeyRing(pem(), [old.publicKey.export({ format: "jwk" }) as { x: string }], APP);
    const newJwt = await signCredential(after, credential());
    const published = JSON.parse(JSON.stringify(jwks(after))) as { keys: unknown[] };
    expect(independentlyVerified(oldJwt, published)).not.toBeNull();
    expect(independentlyVerified(newJwt, published)).not.toBeNull();

    const withoutRetired = JSON.parse(JSON.stringify(jwks(await buildKeyRing(pem(), [], APP)))) as { keys: unknown[] };
    expect(independentlyVerified(oldJwt, withoutRetired)).toBeNull();
  });
});
