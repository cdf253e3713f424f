import { ApiError, clientIp, json, route } from "@/lib/api";
import { verificationByCode } from "@/lib/certificates";
import { hitVerifyLimit, tooManyLookupsMessage } from "@/lib/certificates";
import { requestLocale } from "@/lib/i18n";
import { inRequestLanguage } from "@/lib/i18n";

/**
 * GET /api/verify/:code (public) → { serial, holderName, title, kind, ceHours, issuedAt, expiresAt,
 * status } and nothing else. Unknown or malformed code → 404; over the per-client limit → 429.
 */
export const GET = inRequestLanguage(route<{ code: string }>("public", async ({ req, params }) => {
  const limit = await hitVerifyLimit(clientIp(req));
  if (!limit.allowed) {
    return json({ error: tooManyLookupsMessage(limit.retryAfterSeconds) }, { status: 429, headers: { "Retry-After": String(limit.retryAfterSeconds) } });
  }
  // the module or path is named in the viewer's language, as on the verification page
  const record = await verificationByCode(params.code, new Date(), await requestLocale());
  if (!record) throw new ApiError(404, "No Riser certificate matches this code or serial. Check it against the certificate: the code is printed under the verification address.");
  return json(record);
}));
