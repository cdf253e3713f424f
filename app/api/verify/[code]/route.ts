import { ApiError, clientIp, json, route } from "@/lib/api";
import { verificationByCode } from "@/lib/certificates";
import { hitVerifyLimit, tooManyLookupsMessage } from "@/lib/certificates";

/**
 * GET /api/verify/:code (public) → { serial, holderName, title, kind, ceHours, issuedAt, expiresAt,
 * status } and nothing else. Unknown or malformed code → 404; over the per-client limit → 429.
 */
export const GET = route<{ code: string }>("public", async ({ req, params }) => {
  const limit = await hitVerifyLimit(clientIp(req));
  if (!limit.allowed) {
    return json({ error: tooManyLookupsMessage(limit.retryAfterSeconds) }, { status: 429, headers: { "Retry-After": String(limit.retryAfterSeconds) } });
  }
  const record = await verificationByCode(params.code);
  if (!record) throw new ApiError(404, "No Riser certificate matches this code or serial. Check it against the certificate: the code is printed under the verification address.");
  return json(record);
});
