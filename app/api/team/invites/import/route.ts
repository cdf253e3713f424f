import { ApiError, clientIp, json, route } from "@/lib/api";
import { importRoster, readUpload } from "@/lib/team";
import { resolveWriteOrg } from "@/lib/access";
import { plural } from "@/lib/plural";

/**
 * POST /api/team/invites/import (multipart: file, fileHash from the preview, org? for admins) →
 * checks every row again and writes all valid rows in one transaction; invitation mails follow.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const { bytes, fileName, form } = await readUpload(req);
  const fileHash = form.get("fileHash");
  if (typeof fileHash !== "string" || !/^[0-9a-f]{64}$/.test(fileHash)) throw new ApiError(400, "Preview the file first, then import it.");
  const org = await resolveWriteOrg(viewer, (form.get("org") as string | null) || new URL(req.url).searchParams.get("org"));
  const result = await importRoster(viewer, org, bytes, fileName, fileHash, clientIp(req));
  return json({ ok: true, ...result, message: `${plural(result.imported, "invitation")} sent; ${plural(result.skipped, "row")} skipped.` }, 201);
});
