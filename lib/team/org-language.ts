import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { organization } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { audit } from "@/lib/audit";
import { DomainError } from "@/lib/errors";
import { isLocale, type Locale } from "@/lib/i18n/browser";

/** The language an organization's new invitations start with (a manager may change it per invitation). */
export async function orgDefaultLanguage(orgId: string): Promise<Locale> {
  const [org] = await db.select({ language: organization.defaultLanguage }).from(organization).where(eq(organization.id, orgId));
  if (!org) throw new DomainError("not-found", "No such organization.");
  return isLocale(org.language) ? org.language : "en";
}

/** Sets that default; the change and its audit row commit together, like the other organization settings. */
export async function setOrgDefaultLanguage(viewer: Viewer, orgId: string, language: Locale, ip: string | null): Promise<{ changed: boolean }> {
  return db.transaction(async (tx) => {
    const [org] = await tx.select({ language: organization.defaultLanguage }).from(organization).where(eq(organization.id, orgId)).for("update");
    if (!org) throw new DomainError("not-found", "No such organization.");
    if (org.language === language) return { changed: false };
    await tx.update(organization).set({ defaultLanguage: language }).where(eq(organization.id, orgId));
    await audit(
      { actor: viewer, organizationId: orgId, action: "organization.default-language", targetType: "organization", targetId: orgId, ip, details: { from: org.language, to: language } },
      tx,
    );
    return { changed: true };
  });
}
