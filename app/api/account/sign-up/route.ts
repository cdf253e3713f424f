import { ApiError, clientIp, json, readJson, route } from "@/lib/api";
import { inRequestLanguage, requestLocale } from "@/lib/i18n";
import { createOrganizationWithManager } from "@/lib/accounts";
import { signUpSchema } from "@/lib/auth";
import { hitSignupLimits, rememberSignupBrowser, releasePendingAddress, signupCookie } from "@/lib/auth";

/**
 * Creates a new organization (with its trial seats) and its first manager; sends the verification
 * mail. Rate limited per client and per address; an unverified account on the address is replaced;
 * the answer's cookie marks this browser as the one that chose the password (lib/auth/signup.ts).
 */
export const POST = inRequestLanguage(route("public", async ({ req }) => {
  const input = await readJson(req, signUpSchema);
  const limit = await hitSignupLimits(clientIp(req), input.email);
  if (!limit.allowed) return json({ error: limit.message }, { status: 429, headers: { "Retry-After": String(limit.retryAfterSeconds) } });
  await releasePendingAddress(input.email);
  // the new manager reads Riser in the language the form was in (their Account page changes it)
  const result = await createOrganizationWithManager(input, req.headers, await requestLocale());
  if (!result.ok) throw new ApiError(400, result.message, result.fieldErrors);
  const nonce = await rememberSignupBrowser(result.userId);
  return json({ ok: true, message: "Check your e-mail: we sent a link to confirm the address." }, { status: 201, headers: { "Set-Cookie": signupCookie(nonce) } });
}));
