import { clientIp, json, readJson, route } from "@/lib/api";
import { revokeCertificate } from "@/lib/certificates";
import { revokeInput } from "@/lib/certificates";

/**
 * POST /api/certificates/:id/revoke { reason } → { id, serial, revokedAt }. A manager of the
 * certificate's organization or an admin; the reason is required and goes into the audit log.
 */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const { reason } = await readJson(req, revokeInput);
  const result = await revokeCertificate(viewer, params.id, reason, clientIp(req));
  return json({ id: result.id, serial: result.serial, revokedAt: result.revokedAt.toISOString(), status: "revoked" });
});
