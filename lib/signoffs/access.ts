import "server-only";
/**
 * Who may see a sign-off's evidence: the learner who sent it, managers of the organization it was
 * sent in, and admins. Everyone else gets 403 (signed in) or 401 (not signed in, from the route
 * wrapper). The bucket itself is never public; files reach browsers only through this check.
 */
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { signOff, signOffEvidence, type SignOff } from "@/db/schema";
import { AccessError, canManageOrganization, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export function canSeeSignOff(viewer: Viewer, so: Pick<SignOff, "userId" | "organizationId">): boolean {
  return so.userId === viewer.id || canManageOrganization(viewer, so.organizationId);
}

export type EvidenceFile = { key: string; contentType: string; name: string; size: number | null };

/** The stored object to stream for this viewer: 404 unknown (or no thumbnail), 403 someone else's. */
export async function evidenceFileForViewer(viewer: Viewer, signOffId: string, evidenceId: string, thumb: boolean): Promise<EvidenceFile> {
  if (!UUID.test(signOffId) || !UUID.test(evidenceId)) throw new DomainError("not-found", "No such evidence file.");
  const [row] = await db
    .select({
      userId: signOff.userId,
      organizationId: signOff.organizationId,
      objectKey: signOffEvidence.objectKey,
      thumbnailKey: signOffEvidence.thumbnailKey,
      contentType: signOffEvidence.contentType,
      size: signOffEvidence.size,
      name: signOffEvidence.originalName,
    })
    .from(signOffEvidence)
    .innerJoin(signOff, eq(signOff.id, signOffEvidence.signOffId))
    .where(and(eq(signOffEvidence.id, evidenceId), eq(signOffEvidence.signOffId, signOffId)));
  if (!row) throw new DomainError("not-found", "No such evidence file.");
  if (!canSeeSignOff(viewer, row)) throw new AccessError(403, "Only the learner, their organization's managers and admins can see this evidence.");
  if (thumb) {
    if (!row.thumbnailKey) throw new DomainError("not-found", "This file has no thumbnail (PDFs have none).");
    return { key: row.thumbnailKey, contentType: "image/jpeg", name: row.name.replace(/\.[a-z]+$/i, "") + "-thumbnail.jpg", size: null };
  }
  return { key: row.objectKey, contentType: row.contentType, name: row.name, size: row.size };
}
