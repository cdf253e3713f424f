#!/usr/bin/env node
// Credential signing keys for a hosted instance (local profiles get theirs from scripts/lib/config.mjs):
//   node scripts/credential-key.mjs generate          → a new Ed25519 private key (PKCS#8 PEM) on stdout
//   node scripts/credential-key.mjs public < key.pem  → its public JWK, for CREDENTIAL_RETIRED_KEYS after a rotation
import { createPrivateKey, createPublicKey, generateKeyPairSync } from "node:crypto";
import { readFileSync } from "node:fs";

const [command] = process.argv.slice(2);
if (command === "generate") {
  process.stdout.write(generateKeyPairSync("ed25519").privateKey.export({ format: "pem", type: "pkcs8" }));
} else if (command === "public") {
  const text = readFileSync(0, "utf8").trim();
  const key = text.startsWith("-----BEGIN") ? createPrivateKey(text) : createPrivateKey({ key: JSON.parse(text), format: "jwk" });
  if (key.asymmetricKeyType !== "ed25519") {
    console.error(`not an Ed25519 key (${key.asymmetricKeyType})`);
    process.exit(1);
  }
  const { kty, crv, x } = createPublicKey(key).export({ format: "jwk" });
  process.stdout.write(`${JSON.stringify({ kty, crv, x })}\n`);
} else {
  console.error("usage: node scripts/credential-key.mjs generate | public < key.pem");
  process.exit(2);
}
