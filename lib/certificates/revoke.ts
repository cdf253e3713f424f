import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { certificate, type Certificate } from "@/db/schema";
import { audit } from "@/lib/audit";

/**
 * Revokes one certificate and writes its audit row in the same transaction. `authorize` runs on the
 * locked row before anything changes (throw to refuse). Free of request code so that scripts can use it.
 */
export type RevokeResult = { ok: true; id: number; serial: string; revokedAt: Date } | { ok: false; problem: "not-found" | "already-revoked"; serial?: string };

export async function revokeWithAudit(
  actor: { id: string; email: string },
  id: number,
  reason: string,
  ip: string | null,
  authorize: (cert: Certificate) => void | Promise<void>,
): Promise<RevokeResult> {
  return db.transaction(async (tx) => {
    const [cert] = await tx.select().from(certificate).where(eq(certificate.id, id)).for("update");
    if (!cert) return { ok: false, problem: "not-found" } as const;
    await authorize(cert);
    if (cert.revokedAt) return { ok: false, problem: "already-revoked", serial: cert.serial } as const;
    const revokedAt = new Date();
    await tx
      .update(certificate)
      .set({ revokedAt, revokedBy: actor.id, revokeReason: reason })
      .where(and(eq(certificate.id, id), isNull(certificate.revokedAt)));
    await audit(
      {
        actor,
        organizationId: cert.organizationId,
        action: "certificate.revoke",
        targetType: "certificate",
        targetId: String(cert.id),
        reason,
        ip,
        details: { serial: cert.serial, holderId: cert.userId, holderName: cert.holderName, title: cert.subjectTitle },
      },
      tx,
    );
    return { ok: true, id: cert.id, serial: cert.serial, revokedAt } as const;
  });
}
