import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { organization } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { audit } from "@/lib/audit";
import { DomainError } from "@/lib/errors";

/**
 * An organization's rule for its managers: when `requireManagerTwoFactor` is on, a manager of it without
 * two-step sign-in reaches only their own pages until they set it up (lib/access). Admins always need it.
 */
export async function managerTwoFactorRequired(orgId: string): Promise<boolean> {
  const [org] = await db.select({ required: organization.requireManagerTwoFactor }).from(organization).where(eq(organization.id, orgId));
  if (!org) throw new DomainError("not-found", "No such organization.");
  return org.required;
}

/** Switches the rule on or off; the change and its audit row commit together. */
export async function setManagerTwoFactorRequired(viewer: Viewer, orgId: string, required: boolean, ip: string | null): Promise<{ changed: boolean }> {
  // a manager who switches it on without it would lock themselves out of the page they are on
  if (required && !viewer.twoFactorEnabled) {
    throw new DomainError("conflict", "Set up two-step sign-in for your own account first (Account page), then require it of your managers.", {
      required: ["Set up two-step sign-in for your own account first"],
    });
  }
  return db.transaction(async (tx) => {
    const [org] = await tx.select({ required: organization.requireManagerTwoFactor }).from(organization).where(eq(organization.id, orgId)).for("update");
    if (!org) throw new DomainError("not-found", "No such organization.");
    if (org.required === required) return { changed: false };
    await tx.update(organization).set({ requireManagerTwoFactor: required }).where(eq(organization.id, orgId));
    await audit(
      { actor: viewer, organizationId: orgId, action: "organization.manager-two-factor", targetType: "organization", targetId: orgId, ip, details: { required } },
      tx,
    );
    return { changed: true };
  });
}
