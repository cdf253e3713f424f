// Portable credentials against the running app: the Open Badges 3.0 credential of a real issued
// certificate (checked against the standard's schema in ../shared/standards/openbadges-3.0/,
// achievementcredential.schema.json), its VC-JWT verified with jose against the keys the app
// publishes, and the revocation status list decoded here with zlib (W3C Bitstring Status List §3.1),
// agreeing with /verify and /api/verify before and after a manager revokes.
import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";
import { gunzipSync } from "node:zlib";
import Ajv2019 from "ajv/dist/2019";
import addFormats from "ajv-formats";
import { eq } from "drizzle-orm";
import { createLocalJWKSet, decodeProtectedHeader, importJWK, jwtVerify, type JWK } from "jose";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { certificate, credentialStatusEntry } from "@/db/schema";
import { issueCertificateForCompletion } from "@/lib/certificates";
import { APP, anonymous, postJson, type Client } from "../helpers/http";
import { clientOf, completedWithCertificate, completion, daysFromNow, fixtureOrg, fixturePerson, gradedAttempt, type FixturePerson } from "../helpers/fixtures";

const schema = JSON.parse(readFileSync(path.resolve("../shared/standards/openbadges-3.0/achievementcredential.schema.json"), "utf8")) as object;
const validate = addFormats(new Ajv2019({ strict: false, allErrors: true })).compile(schema);

type Credential = {
  id: string;
  validFrom: string;
  validUntil: string;
  issuer: { id: string };
  credentialSubject: { identifier: { identityHash: string; salt: string }[]; creditsEarned: number; achievement: { name: string; creditsAvailable: number } };
  credentialStatus: { statusListIndex: string; statusListCredential: string; statusPurpose: string };
};

let learner: FixturePerson;
let manager: Client;
let code: string;
let certId: number;
let keys: ReturnType<typeof createLocalJWKSet>;
const visitor = anonymous();

async function issue(person: FixturePerson, moduleSlug: string, at: Date) {
  const attemptId = await gradedAttempt(person, moduleSlug, true, at);
  const [c] = await issueCertificateForCompletion(await completion(person.id, moduleSlug, attemptId, at), { notify: false });
  return c!;
}

async function statusBit(listUrl: string, index: number): Promise<number> {
  const res = await visitor.fetch(listUrl.replace(APP, ""));
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toMatch(/application\/vc\+jwt/);
  const { payload } = await jwtVerify(await res.text(), keys, { algorithms: ["EdDSA"] });
  const subject = payload.credentialSubject as { type: string; statusPurpose: string; encodedList: string };
  expect(payload.type).toEqual(["VerifiableCredential", "BitstringStatusListCredential"]);
  expect(subject.statusPurpose).toBe("revocation");
  expect(subject.encodedList.startsWith("u")).toBe(true);
  const bytes = gunzipSync(Buffer.from(subject.encodedList.slice(1), "base64url"));
  expect(bytes.length).toBeGreaterThanOrEqual(16_384); // §2.1: at least 131,072 entries
  return (bytes[Math.floor(index / 8)]! >> (7 - (index % 8))) & 1;
}

beforeAll(async () => {
  const org = await fixtureOrg(`Credential Crew ${Date.now()}`);
  learner = await fixturePerson(org, { name: "Ilse Marrow-Quint" });
  manager = await clientOf((await fixturePerson(org, { name: "Credential Manager", role: "manager" })).id);
  const c = await issue(learner, "freeze-protection", daysFromNow(-3));
  code = c.verificationCode;
  certId = c.id;
  const res = await visitor.fetch("/.well-known/jwks.json");
  expect(res.status).toBe(200);
  keys = createLocalJWKSet((await res.json()) as { keys: JWK[] });
});

describe("published keys", () => {
  it("serves public Ed25519 keys only, as a JWK Set and as the did:web document of this address", async () => {
    const set = (await (await visitor.fetch("/.well-known/jwks.json")).json()) as { keys: Record<string, string>[] };
    expect(set.keys.length).toBeGreaterThan(0);
    for (const k of set.keys) {
      expect(k).toMatchObject({ kty: "OKP", crv: "Ed25519", alg: "EdDSA" });
      expect(k.d).toBeUndefined();
    }
    const doc = (await (await visitor.fetch("/.well-known/did.json")).json()) as { id: string; verificationMethod: { id: string }[] };
    expect(doc.id).toBe(`did:web:${new URL(APP).host.replace(":", "%3A")}`);
    expect(doc.verificationMethod.map((m) => m.id)).toEqual(set.keys.map((k) => k.kid));
  });
});

describe("a certificate's credential", () => {
  it("gets its status-list position in the transaction that issues it", async () => {
    const [entry] = await db.select().from(credentialStatusEntry).where(eq(credentialStatusEntry.certificateId, certId));
    expect(entry?.identityHash).toBe(`sha256$${createHash("sha256").update(`${learner.email.toLowerCase()}${entry!.salt}`).digest("hex")}`);
  });

  it("is an OB 3.0 credential with the certificate's hours and dates and no plain e-mail; the JWT verifies against the published keys", async () => {
    const res = await visitor.fetch(`/api/verify/${code}/credential`);
    expect(res.status).toBe(200);
    const json = (await res.json()) as Credential;
    expect(validate(json), JSON.stringify(validate.errors)).toBe(true);
    const [row] = await db.select().from(certificate).where(eq(certificate.id, certId));
    expect(json.credentialSubject.creditsEarned).toBe(Number(row!.ceHours));
    expect(json.validFrom).toBe(row!.issuedAt.toISOString().replace(/\.\d{3}Z$/, "Z"));
    expect(json.validUntil).toBe(row!.expiresAt.toISOString().replace(/\.\d{3}Z$/, "Z"));
    expect(JSON.stringify(json)).not.toContain(learner.email);

    const jwtRes = await visitor.fetch(`/api/verify/${code}/credential?format=jwt`);
    expect(jwtRes.headers.get("content-type")).toMatch(/application\/vc\+jwt/);
    const jwt = await jwtRes.text();
    const { payload } = await jwtVerify(jwt, keys, { algorithms: ["EdDSA"], issuer: `${APP}/api/credentials/issuer` });
    const credential: Record<string, unknown> = { ...payload };
    for (const claim of ["iss", "jti", "nbf", "exp"]) delete credential[claim];
    expect(credential).toEqual(json);
    expect(payload.jti).toBe(json.id);
    expect(payload.iss).toBe(json.issuer.id);
    expect(payload.exp).toBe(Date.parse(json.validUntil) / 1000);
    // and with the did:web document's key named by the JWT's kid
    const doc = (await (await visitor.fetch("/.well-known/did.json")).json()) as { verificationMethod: { id: string; publicKeyJwk: JWK }[] };
    const method = doc.verificationMethod.find((m) => m.id === decodeProtectedHeader(jwt).kid)!;
    await expect(jwtVerify(jwt, await importJWK(method.publicKeyJwk, "EdDSA"))).resolves.toBeTruthy();

    const profile = (await (await visitor.fetch("/api/credentials/issuer")).json()) as { id: string; type: string[] };
    expect(profile.id).toBe(json.issuer.id);
    expect(profile.type).toEqual(["Profile"]);
  });

  it("the holder finds it on their certificates page (JSON and signed JWT, both downloads) with their training history", async () => {
    const html = (await (await clientOf(learner.id)).fetch("/certificates").then((r) => r.text())).replace(/&amp;/g, "&");
    expect(html).toMatch(new RegExp(`href="${APP}/api/verify/${code}/credential"[^>]*download`));
    expect(html).toMatch(new RegExp(`href="${APP}/api/verify/${code}/credential\\?format=jwt"[^>]*download`));
    expect(html).toContain('href="/api/account/training-history?format=pdf"');
    expect(html).toContain('href="/api/account/training-history?format=csv"');
  });

    it("revocation by a manager flips its bit in the status list, and /verify, /api/verify and the list agree", async () => {
    const other = await issue(learner, "pipe-and-joining", daysFromNow(-2));
    const json = (await (await visitor.fetch(`/api/verify/${code}/credential`)).json()) as Credential;
    const otherJson = (await (await visitor.fetch(`/api/verify/${other.verificationCode}/credential`)).json()) as Credential;
    const index = Number(json.credentialStatus.statusListIndex);
    expect(await statusBit(json.credentialStatus.statusListCredential, index)).toBe(0);
    expect(((await (await visitor.fetch(`/api/verify/${code}`)).json()) as { status: string }).status).toBe("valid");

    const r = await postJson(manager, `/api/certificates/${certId}/revoke`, { reason: "Quiz taken by someone else (test)" });
    expect(r.status).toBe(200);

    expect(await statusBit(json.credentialStatus.statusListCredential, index)).toBe(1);
    expect(await statusBit(otherJson.credentialStatus.statusListCredential, Number(otherJson.credentialStatus.statusListIndex))).toBe(0);
    expect(((await (await visitor.fetch(`/api/verify/${code}`)).json()) as { status: string }).status).toBe("revoked");
    const page = await (await visitor.fetch(`/verify/${code}`)).text();
    expect(page).toContain("This certificate was revoked");
    expect(page).toContain(`/api/verify/${code}/credential`);
  });

  it("an expired certificate is reported as expired: by /api/verify, and by its JWT's exp", async () => {
    const org = { id: learner.organizationId };
    const old = await fixturePerson(org, { name: "Expired Holder" });
    await completedWithCertificate(old, "freeze-protection", { completedAt: daysFromNow(-800), expiresAt: daysFromNow(-70) });
    const [row] = await db.select().from(certificate).where(eq(certificate.userId, old.id));
    expect(((await (await visitor.fetch(`/api/verify/${row!.verificationCode}`)).json()) as { status: string }).status).toBe("expired");
    const jwt = await (await visitor.fetch(`/api/verify/${row!.verificationCode}/credential?format=jwt`)).text();
    await expect(jwtVerify(jwt, keys)).rejects.toThrow(/"exp" claim/);
    await expect(jwtVerify(jwt, keys, { currentDate: daysFromNow(-100) })).resolves.toBeTruthy();
  });
});

describe("bad input gets a clear 4xx", () => {
  it("refuses serials, unknown codes and unknown formats for credentials, and malformed or missing status lists", async () => {
    const [row] = await db.select({ serial: certificate.serial }).from(certificate).where(eq(certificate.id, certId));
    const cases: [string, number][] = [
      [`/api/verify/${row!.serial}/credential`, 404],
      ["/api/verify/AAAAAAAAAAAAAAAAAAAAAAAA/credential", 404],
      [`/api/verify/${code}/credential?format=xml`, 400],
      ["/api/credentials/status/abc", 400],
      ["/api/credentials/status/0", 400],
      ["/api/credentials/status/99999", 404],
    ];
    for (const [url, status] of cases) {
      const res = await visitor.fetch(url);
      expect(res.status, url).toBe(status);
      expect(((await res.json()) as { error?: string }).error ?? "", url).toMatch(/.{20,}/);
    }
  });
});
