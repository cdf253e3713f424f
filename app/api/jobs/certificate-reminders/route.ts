import { json, route } from "@/lib/api";
import { sendExpiryReminders } from "@/lib/certificates";
import { assertJobsSecret } from "@/lib/certificates";

/**
 * POST /api/jobs/certificate-reminders (header x-jobs-secret) → { due, sent, failed, skipped }.
 * For an external scheduler; `npm run jobs:run` runs the same function. Safe to call repeatedly.
 */
export const POST = route("public", async ({ req }) => {
  assertJobsSecret(req);
  return json(await sendExpiryReminders());
});
