import { ApiError, json, readJson, route } from "@/lib/api";
import { createOrganizationWithManager } from "@/lib/accounts";
import { signUpSchema } from "@/lib/auth/schemas";

/** Creates a new organization (with its trial seats) and its first manager; sends the verification mail. */
export const POST = route("public", async ({ req }) => {
  const input = await readJson(req, signUpSchema);
  const result = await createOrganizationWithManager(input, req.headers);
  if (!result.ok) throw new ApiError(400, result.message, result.fieldErrors);
  return json({ ok: true, message: "Check your e-mail: we sent a link to confirm the address." }, 201);
});
