import "server-only";
/**
 * The portable credential of one certificate, reached with its verification code (the secret the
 * holder shares; a serial is guessable, so it is not accepted here). Built from the certificate row
 * as it stands and signed on request: the same certificate always yields the same credential.
 */
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { certificate } from "@/db/schema";
import { ensureCredentialEntry, parseVerifyInput } from "@/lib/certificates";
import { findModule, loadCatalog } from "@/lib/content";
import { env } from "@/lib/env";
import { buildOpenBadgeCredential, criteriaNarrative, type BadgeAchievementFacts, type OpenBadgeCredential } from "./badge";
import { signCredential } from "./keyring";
import { keyRing } from "./keys";

/** Description and criteria of a module or path from the content; the title when it is gone. */
export function achievementFacts(kind: "module" | "path", slug: string, title: string): BadgeAchievementFacts {
  if (kind === "module") {
    const m = findModule(slug);
    return {
      description: m?.meta.summary ?? title,
      criteria: criteriaNarrative("module", { passMark: m?.meta.passMark, signOff: (m?.meta.requiredSkills.length ?? 0) > 0 }),
    };
  }
  const catalog = loadCatalog();
  const p = catalog.paths.find((x) => x.slug === slug);
  const modules = p?.modules.map((s) => catalog.modules.find((m) => m.slug === s)?.meta.title ?? s);
  return { description: p?.summary ?? title, criteria: criteriaNarrative("path", { modules }) };
}

/** The unsigned credential for a verification code; null when no certificate has that code. */
export async function credentialForCode(raw: string): Promise<OpenBadgeCredential | null> {
  const lookup = parseVerifyInput(raw);
  if (!lookup || lookup.kind !== "code") return null;
  const [c] = await db.select().from(certificate).where(eq(certificate.verificationCode, lookup.code)).limit(1);
  // varbinary compares bytes, but check again: the code is the only key accepted here
  if (!c || c.verificationCode !== lookup.code) return null;
  const entry = await ensureCredentialEntry(c.id);
  if (!entry) return null;
  return buildOpenBadgeCredential(
    env.APP_URL,
    {
      serial: c.serial,
      kind: c.kind,
      subjectSlug: c.subjectSlug,
      subjectTitle: c.subjectTitle,
      ceHours: Number(c.ceHours),
      issuedAt: c.issuedAt,
      expiresAt: c.expiresAt,
      verificationCode: c.verificationCode,
      edition: c.edition,
    },
    achievementFacts(c.kind, c.subjectSlug, c.subjectTitle),
    entry,
  );
}

/** The credential signed as a VC-JWT with the current key. */
export async function signedCredential(credential: OpenBadgeCredential): Promise<string> {
  return signCredential(await keyRing(), credential);
}
