import "server-only";
import { db, type Tx } from "@/db/client";
import { auditLog } from "@/db/schema";
import type { Viewer } from "@/lib/access";

export type AuditEntry = {
  actor: Pick<Viewer, "id" | "email"> | null;
  organizationId: string | null;
  action: string; // e.g. "certificate.revoke", "user.role", "invite.send"
  targetType: string;
  targetId: string;
  reason?: string | null;
  ip?: string | null;
  details?: Record<string, unknown>;
};

/**
 * The one way to write the audit log (append-only: the app never updates or deletes its rows).
 * Pass the transaction of the change so that the change and its audit row commit together.
 */
export async function audit(entry: AuditEntry, tx?: Tx): Promise<void> {
  await (tx ?? db).insert(auditLog).values({
    actorId: entry.actor?.id ?? null,
    actorEmail: entry.actor?.email ?? null,
    organizationId: entry.organizationId,
    action: entry.action,
    targetType: entry.targetType,
    targetId: entry.targetId,
    reason: entry.reason ?? null,
    ip: entry.ip ?? null,
    details: entry.details ?? null,
  });
}
