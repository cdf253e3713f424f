import { clientIp, json, readJson, route } from "@/lib/api";
import { reviewSignOff } from "@/lib/signoffs";
import { reviewInput } from "@/lib/signoffs";

/**
 * POST /api/sign-offs/:id/review { decision: "approve" | "return", comment } → { id, status, moduleCompleted }.
 * A manager of the learner's organization or an admin, never the learner themselves; a comment is
 * required to return. The learner is mailed; the decision goes into the audit log.
 */
export const POST = route<{ id: string }>("manager", async ({ req, viewer, params }) => {
  const input = await readJson(req, reviewInput);
  return json(await reviewSignOff(viewer, params.id, input, clientIp(req)));
});
