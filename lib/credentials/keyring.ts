/**
 * The credential signing keys (no configuration read here: ./keys does that).
 * CREDENTIAL_SIGNING_KEY is the current Ed25519 private key (PKCS#8 PEM
 * or JWK); CREDENTIAL_RETIRED_KEYS lists earlier public keys. Every key is published (JWK Set and
 * did:web document) under the id `<did>#<RFC 7638 thumbprint>`, and that id travels in each JWT's
 * `kid` header, so a credential signed by a retired key still verifies after a rotation.
 */
import { createPrivateKey, createPublicKey, type KeyObject } from "node:crypto";
import { calculateJwkThumbprint, SignJWT, type JWK } from "jose";
import { didWebOf } from "./urls";

export type PublishedKey = { kty: "OKP"; crv: "Ed25519"; x: string; kid: string; alg: "EdDSA"; use: "sig" };
export type KeyRing = { did: string; kid: string; privateKey: KeyObject; keys: PublishedKey[] };

function privateKeyOf(value: string): KeyObject {
  const v = value.trim();
  const key = v.startsWith("-----BEGIN") ? createPrivateKey(v) : createPrivateKey({ key: JSON.parse(v) as import("node:crypto").JsonWebKey, format: "jwk" });
  if (key.asymmetricKeyType !== "ed25519") throw new Error(`CREDENTIAL_SIGNING_KEY: must be an Ed25519 key, not ${key.asymmetricKeyType}`);
  return key;
}

async function publish(jwk: { x: string; kid?: unknown }, did: string): Promise<PublishedKey> {
  const bare = { kty: "OKP" as const, crv: "Ed25519" as const, x: jwk.x };
  const kid = typeof jwk.kid === "string" && jwk.kid ? jwk.kid : `${did}#${await calculateJwkThumbprint(bare, "sha256")}`;
  return { ...bare, kid, alg: "EdDSA", use: "sig" };
}

/** Builds the ring from the two settings (tests call it with their own keys). Current key first. */
export async function buildKeyRing(signingKey: string, retiredKeys: { x: string; kid?: unknown }[], appUrl: string): Promise<KeyRing> {
  const did = didWebOf(appUrl);
  const privateKey = privateKeyOf(signingKey);
  const pub = createPublicKey(privateKey).export({ format: "jwk" }) as { x: string };
  const current = await publish({ x: pub.x }, did);
  const older = await Promise.all(retiredKeys.map((k) => publish(k, did)));
  return { did, kid: current.kid, privateKey, keys: [current, ...older.filter((k) => k.x !== current.x)] };
}

export const jwks = (ring: KeyRing): { keys: JWK[] } => ({ keys: ring.keys });

/** The did:web document (W3C DID Core 1.0 §5): every published key may assert credentials. */
export function didDocument(ring: KeyRing) {
  const methods = ring.keys.map((k) => ({ id: k.kid, type: "JsonWebKey2020", controller: ring.did, publicKeyJwk: { kty: k.kty, crv: k.crv, x: k.x } }));
  return {
    "@context": ["https://www.w3.org/ns/did/v1", "https://w3id.org/security/suites/jws-2020/v1"],
    id: ring.did,
    verificationMethod: methods,
    assertionMethod: methods.map((m) => m.id),
  };
}

/**
 * Signs a credential as a VC-JWT (OB 3.0 §8.2 JSON Web Token Proof Format): the payload is the
 * credential itself plus the registered claims iss (issuer id), jti (credential id), nbf (validFrom)
 * and exp (validUntil, when it has one); EdDSA (RFC 8037) with the current key, its id in `kid`.
 */
export async function signCredential(ring: KeyRing, credential: { id: string; issuer: string | { id: string }; validFrom: string; validUntil?: string }): Promise<string> {
  const iss = typeof credential.issuer === "string" ? credential.issuer : credential.issuer.id;
  let jwt = new SignJWT({ ...credential })
    .setProtectedHeader({ alg: "EdDSA", kid: ring.kid, typ: "JWT" })
    .setIssuer(iss)
    .setJti(credential.id)
    .setNotBefore(new Date(credential.validFrom));
  if (credential.validUntil) jwt = jwt.setExpirationTime(new Date(credential.validUntil));
  return jwt.sign(ring.privateKey);
}
