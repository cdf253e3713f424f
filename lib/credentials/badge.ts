/**
 * The Open Badges 3.0 OpenBadgeCredential of one certificate, before signing (pure: no server code).
 * Shape: 1EdTech Open Badges 3.0 §8 (AchievementCredential) on the W3C VC Data Model 2.0; tests check
 * it against the standard's own JSON Schema (../shared/standards/openbadges-3.0/).
 */
import { OB_CONTEXT, VC_CONTEXT_V2, achievementUrl, credentialUrl, issuerUrl, statusListUrl, statusSlot } from "./urls";

export type BadgeCertificate = {
  serial: string;
  kind: "module" | "path";
  subjectSlug: string;
  subjectTitle: string;
  ceHours: number;
  issuedAt: Date;
  expiresAt: Date;
  verificationCode: string;
  /** the NFPA 13D edition the material was taught to (module certificates with an adopted edition) */
  edition?: number | null;
};

export type BadgeAchievementFacts = {
  /** the module's or path's summary */
  description: string;
  /** what it took to earn it, in words (Markdown allowed by OB 3.0) */
  criteria: string;
};

export type BadgeEntry = { position: number; salt: string; identityHash: string };

/** The issuer Profile (OB 3.0 §B.1 Profile): Riser's instance, served at its id. */
export function issuerProfile(appUrl: string) {
  return {
    id: issuerUrl(appUrl),
    type: ["Profile"],
    name: "Riser",
    url: appUrl.replace(/\/+$/, ""),
    description: "Riser issues certificates for completed training in residential fire-sprinkler work (NFPA 13D systems in one- and two-family homes).",
  };
}

/** ISO 8601 with the trailing Z and no milliseconds (OB 3.0 DateTimeZ). */
export const dateTimeZ = (d: Date) => d.toISOString().replace(/\.\d{3}Z$/, "Z");

/** What it takes to earn a module or a path certificate (lib/completion's rule, in words). */
export function criteriaNarrative(kind: "module" | "path", facts: { passMark?: number; modules?: string[]; signOff?: boolean }): string {
  if (kind === "path") {
    return `Hold a valid Riser certificate for every module of the learning path${facts.modules?.length ? `: ${facts.modules.join("; ")}` : ""}.`;
  }
  const pass = facts.passMark ? ` (pass mark ${facts.passMark}%)` : "";
  const signOff = facts.signOff ? ", and have each required practical skill signed off by a training manager" : "";
  return `Read every lesson of the module for at least half of its stated reading time and mark it complete, then pass the module quiz, graded on the server${pass}${signOff}.`;
}

export function buildAchievement(appUrl: string, c: Pick<BadgeCertificate, "kind" | "subjectSlug" | "subjectTitle" | "ceHours">, facts: BadgeAchievementFacts) {
  const id = achievementUrl(appUrl, c.kind, c.subjectSlug);
  return {
    id,
    type: ["Achievement"],
    achievementType: "CertificateOfCompletion",
    name: c.subjectTitle,
    description: facts.description,
    criteria: { narrative: facts.criteria },
    creditsAvailable: c.ceHours,
    inLanguage: "en",
    resultDescription: [{ id: `${id}#completion`, type: ["ResultDescription"], name: "Completion", resultType: "Status" }],
  };
}

/**
 * The unsigned credential. The holder is identified only by the salted hash of their e-mail
 * (OB 3.0 IdentityObject, hashed: true); validFrom/validUntil are the certificate's dates;
 * credentialStatus points at its bit in the revocation status list (W3C Bitstring Status List §2.1).
 */
export function buildOpenBadgeCredential(appUrl: string, c: BadgeCertificate, facts: BadgeAchievementFacts, entry: BadgeEntry) {
  const slot = statusSlot(entry.position);
  const listUrl = statusListUrl(appUrl, slot.list);
  const achievement = buildAchievement(appUrl, c, facts);
  return {
    "@context": [VC_CONTEXT_V2, OB_CONTEXT],
    id: credentialUrl(appUrl, c.verificationCode),
    type: ["VerifiableCredential", "OpenBadgeCredential"],
    name: `${c.subjectTitle} (Riser certificate ${c.serial})`,
    issuer: issuerProfile(appUrl),
    validFrom: dateTimeZ(c.issuedAt),
    validUntil: dateTimeZ(c.expiresAt),
    awardedDate: dateTimeZ(c.issuedAt),
    credentialSubject: {
      type: ["AchievementSubject"],
      identifier: [{ type: "IdentityObject", identityType: "emailAddress", hashed: true, identityHash: entry.identityHash, salt: entry.salt }],
      achievement,
      creditsEarned: c.ceHours,
      // The achievement is one per module; the edition differs per certificate, so it travels with
      // the holder's subject (OB 3.0 AchievementSubject.narrative), as the PDF prints it.
      ...(c.edition ? { narrative: `Material taught to NFPA 13D, ${c.edition} edition. The adopted edition with its local amendments and the authority having jurisdiction govern.` } : {}),
      result: [{ type: ["Result"], resultDescription: achievement.resultDescription[0]!.id, status: "Completed" }],
    },
    credentialStatus: {
      id: `${listUrl}#${slot.index}`,
      type: "BitstringStatusListEntry",
      statusPurpose: "revocation",
      statusListIndex: String(slot.index),
      statusListCredential: listUrl,
    },
  };
}

export type OpenBadgeCredential = ReturnType<typeof buildOpenBadgeCredential>;
