import { ApiError, clientIp, json, route } from "@/lib/api";
import { hitVerifyLimit, tooManyLookupsMessage } from "@/lib/certificates";
import { credentialForCode, signedCredential } from "@/lib/credentials";

/**
 * GET /api/verify/:code/credential (public) → the certificate's Open Badges 3.0 credential as JSON;
 * ?format=jwt → the same credential signed (VC-JWT, application/vc+jwt). Only the verification code
 * reaches it (never a serial). Unknown code → 404, an unknown format → 400, over the limit → 429.
 */
export const GET = route<{ code: string }>("public", async ({ req, params }) => {
  const format = new URL(req.url).searchParams.get("format") ?? "json";
  if (format !== "json" && format !== "jwt") throw new ApiError(400, 'Unknown format: ask for format=json (the credential) or format=jwt (the signed credential).');
  const limit = await hitVerifyLimit(clientIp(req));
  if (!limit.allowed) {
    return json({ error: tooManyLookupsMessage(limit.retryAfterSeconds) }, { status: 429, headers: { "Retry-After": String(limit.retryAfterSeconds) } });
  }
  const credential = await credentialForCode(params.code);
  if (!credential) throw new ApiError(404, "No Riser certificate matches this verification code. A credential is reached with the code printed under the verification address, not with the serial.");
  const name = `riser-credential-${params.code.replace(/[^A-Za-z0-9_-]/g, "")}`;
  if (format === "json") {
    return json(credential, { headers: { "Content-Disposition": `attachment; filename="${name}.json"` } });
  }
  return new Response(await signedCredential(credential), {
    headers: { "Content-Type": "application/vc+jwt", "Content-Disposition": `attachment; filename="${name}.jwt"`, "Cache-Control": "no-store" },
  });
});
