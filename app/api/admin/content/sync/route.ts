import { clientIp, json, route } from "@/lib/api";
import { syncNow } from "@/lib/admin";
import { assertSameOrigin } from "@/lib/admin";

/** POST /api/admin/content/sync → syncs content/ into the catalog now (audited: content.sync); 422 with problems when content is invalid. */
export const POST = route("admin", async ({ req, viewer }) => {
  assertSameOrigin(req);
  const outcome = await syncNow(viewer, clientIp(req));
  return outcome.ok ? json(outcome) : json({ ...outcome, error: "The content has problems; nothing was synced." }, 422);
});
