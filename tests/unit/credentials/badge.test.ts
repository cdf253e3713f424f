// The Open Badges 3.0 credential of a certificate, before signing, checked against the standard's own
// files in ../shared/standards/openbadges-3.0/ (copied unchanged from 1EdTech's repository):
// achievementcredential.schema.json ($id …/ob_v3p0_achievementcredential-jsonschema1.json, JSON Schema
// draft 2019-09) and profile.schema.json, with ajv; context-3.0.3.json for the terms used.
import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";
import Ajv2019 from "ajv/dist/2019";
import addFormats from "ajv-formats";
import { describe, expect, it } from "vitest";
import { identityHashOf } from "@/lib/certificates/identity-hash";
import { buildOpenBadgeCredential, criteriaNarrative, issuerProfile } from "@/lib/credentials/badge";
import { OB_CONTEXT, STATUS_LIST_SIZE, VC_CONTEXT_V2 } from "@/lib/credentials/urls";

const STANDARDS = path.resolve("../shared/standards/openbadges-3.0");
const read = (f: string) => JSON.parse(readFileSync(path.join(STANDARDS, f), "utf8")) as Record<string, unknown>;
// strict: false only because the published schemas use annotation keywords ajv's strict mode
// does not know; every validation keyword still applies.
const ajv = addFormats(new Ajv2019({ strict: false, allErrors: true }));
const validateCredential = ajv.compile(read("achievementcredential.schema.json"));
const validateProfile = ajv.compile(read("profile.schema.json"));

const APP = "https://training.riser.example";
const email = "Dario.Vance@quillmoor.example";
const salt = "5d41402abc4b2a76b9719d911017c592";
const cert = {
  serial: "RSR-2026-000123",
  kind: "module" as const,
  subjectSlug: "freeze-protection",
  subjectTitle: "Freeze protection",
  ceHours: 1.5,
  issuedAt: new Date("2026-03-04T15:20:11.123Z"),
  expiresAt: new Date("2028-03-04T15:20:11.123Z"),
  verificationCode: "7KQ2M9XD3HTVA8RWEC6N4JPB5GFZ",
};
const facts = { description: "Where homes freeze, and how antifreeze and dry systems keep sprinklers working.", criteria: criteriaNarrative("module", { passMark: 80 }) };
const build = (position = 42) => buildOpenBadgeCredential(APP, cert, facts, { position, salt, identityHash: identityHashOf(email, salt) });

describe("OpenBadgeCredential", () => {
  it("validates against the OB 3.0 AchievementCredential JSON Schema (achievementcredential.schema.json)", () => {
    const ok = validateCredential(build());
    expect(validateCredential.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it("carries the edition taught in the holder's narrative and still validates (AchievementSubject.narrative, OB 3.0 schema)", () => {
    const withEdition = buildOpenBadgeCredential(APP, { ...cert, edition: 2022 }, facts, { position: 42, salt, identityHash: identityHashOf(email, salt) });
    expect(validateCredential(withEdition)).toBe(true);
    expect(withEdition.credentialSubject.narrative).toContain("NFPA 13D, 2022 edition");
    // the achievement is one per module: the edition never changes it
    expect(withEdition.credentialSubject.achievement).toEqual(build().credentialSubject.achievement);
    expect("narrative" in build().credentialSubject).toBe(false);
  });

  it("the schema is live: a credential without validFrom, or with a plain e-mail identity lacking its hash, fails it", () => {
    const noDate: Record<string, unknown> = { ...build() };
    delete noDate.validFrom;
    expect(validateCredential(noDate)).toBe(false);
    const c = build();
    const broken = { ...c, credentialSubject: { ...c.credentialSubject, identifier: [{ type: "IdentityObject", identityType: "emailAddress", email }] } };
    expect(validateCredential(broken)).toBe(false);
  });

  it("the issuer profile validates against profile.schema.json and sits at the stable public URL", () => {
    const profile = { "@context": [VC_CONTEXT_V2, OB_CONTEXT], ...issuerProfile(APP) };
    expect(validateProfile(profile)).toBe(true);
    expect(build().issuer.id).toBe(`${APP}/api/credentials/issuer`);
  });

  it("names both contexts, the types, the certificate's dates and the hours", () => {
    const c = build();
    expect(c["@context"]).toEqual(["https://www.w3.org/ns/credentials/v2", "https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json"]);
    expect(c.type).toEqual(["VerifiableCredential", "OpenBadgeCredential"]);
    expect(c.validFrom).toBe("2026-03-04T15:20:11Z");
    expect(c.validUntil).toBe("2028-03-04T15:20:11Z");
    expect(c.credentialSubject.achievement.creditsAvailable).toBe(1.5);
    expect(c.credentialSubject.creditsEarned).toBe(1.5);
    expect(c.credentialSubject.achievement.criteria.narrative).toMatch(/pass mark 80%/);
    expect(c.credentialSubject.result[0]).toMatchObject({ status: "Completed", resultDescription: c.credentialSubject.achievement.resultDescription[0]!.id });
  });

  it("identifies the holder by the salted SHA-256 of the e-mail only, never the plain address", () => {
    const c = build();
    const id = c.credentialSubject.identifier[0]!;
    // OB 3.0 IdentityHash: "sha256$" + hex SHA-256 of identifier then salt (computed here with node:crypto directly)
    const expected = `sha256$${createHash("sha256").update(`dario.vance@quillmoor.example${salt}`).digest("hex")}`;
    expect(id).toEqual({ type: "IdentityObject", identityType: "emailAddress", hashed: true, identityHash: expected, salt });
    expect(JSON.stringify(c).toLowerCase()).not.toContain("dario.vance@quillmoor.example");
    expect(JSON.stringify(c).toLowerCase()).not.toContain("quillmoor");
  });

  it("hashes with SHA-256 as published: FIPS 180-2 Appendix B.1, SHA-256(\"abc\")", () => {
    expect(identityHashOf("abc", "")).toBe("sha256$ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("points at its bit in the revocation list (W3C Bitstring Status List §2.1 BitstringStatusListEntry)", () => {
    expect(build(1).credentialStatus).toEqual({
      id: `${APP}/api/credentials/status/1#0`,
      type: "BitstringStatusListEntry",
      statusPurpose: "revocation",
      statusListIndex: "0",
      statusListCredential: `${APP}/api/credentials/status/1`,
    });
    const second = build(STATUS_LIST_SIZE + 5).credentialStatus;
    expect(second.statusListCredential).toBe(`${APP}/api/credentials/status/2`);
    expect(second.statusListIndex).toBe("4");
  });

  it("uses only types the published OB 3.0 context (context-3.0.3.json) defines, besides the VC 2.0 core ones", () => {
    const context = (read("context-3.0.3.json")["@context"] ?? {}) as Record<string, unknown>;
    const types = new Set<string>();
    const walk = (v: unknown) => {
      if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === "object") {
        for (const [k, x] of Object.entries(v)) {
          if (k === "type") for (const t of [x].flat()) types.add(String(t));
          walk(x);
        }
      }
    };
    walk(build());
    const vcCore = new Set(["VerifiableCredential", "BitstringStatusListEntry"]); // defined by https://www.w3.org/ns/credentials/v2
    for (const t of types) if (!vcCore.has(t)) expect(Object.keys(context), t).toContain(t);
  });

  it("uses in each OB-typed object only terms the published context (context-3.0.3.json) defines for that type or at its top level", () => {
    const context = (read("context-3.0.3.json")["@context"] ?? {}) as Record<string, { "@context"?: Record<string, unknown> } | unknown>;
    const scoped = (t: string) => Object.keys(((context[t] as { "@context"?: Record<string, unknown> } | undefined)?.["@context"]) ?? {});
    const checked: string[] = [];
    const walk = (v: unknown) => {
      if (Array.isArray(v)) return v.forEach(walk);
      if (!v || typeof v !== "object") return;
      const o = v as Record<string, unknown>;
      const types = [o.type ?? []].flat().map(String);
      // objects typed only by the OB context (VC 2.0 core types' terms live in the VC context, not shipped here)
      if (types.length && types.every((t) => t in context)) {
        const allowed = new Set([...Object.keys(context), ...types.flatMap(scoped)]);
        for (const k of Object.keys(o)) if (!k.startsWith("@")) expect(allowed.has(k), `${types.join("/")}.${k}`).toBe(true);
        checked.push(...types);
      }
      Object.values(o).forEach(walk);
    };
    walk(build());
    // the objects the check reached: the subject, its achievement, its identity and the issuer
    for (const t of ["AchievementSubject", "Achievement", "IdentityObject", "Profile"]) expect(checked, t).toContain(t);
  });
});
