import { json, route } from "@/lib/api";
import { hitRateLimit } from "@/lib/rate-limit";
import { previewRoster, readUpload } from "@/lib/team";
import { ROSTER_PREVIEW_LIMIT } from "@/lib/team";
import { resolveWriteOrg } from "@/lib/access";

/**
 * POST /api/team/invites/preview (multipart: file, org? for admins) → every row with its problems
 * and the file's hash for the import. Writes nothing. Limited per manager (counted in MariaDB, so
 * every app server shares the count): 429 with Retry-After past the limit.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const limit = await hitRateLimit(`roster-preview:${viewer.id}`, ROSTER_PREVIEW_LIMIT.max, ROSTER_PREVIEW_LIMIT.windowSeconds);
  if (!limit.allowed) {
    const minutes = Math.max(1, Math.ceil(limit.retryAfterSeconds / 60));
    return json(
      { error: `Too many roster previews: at most ${ROSTER_PREVIEW_LIMIT.max} every ${ROSTER_PREVIEW_LIMIT.windowSeconds / 60} minutes. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.` },
      { status: 429, headers: { "Retry-After": String(limit.retryAfterSeconds) } },
    );
  }
  const { bytes, fileName, form } = await readUpload(req);
  const org = await resolveWriteOrg(viewer, (form.get("org") as string | null) || new URL(req.url).searchParams.get("org"));
  return json(await previewRoster(org, bytes, fileName));
});
