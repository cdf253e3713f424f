import { ApiError, clientIp, json, route } from "@/lib/api";
import { importRoster, readUpload } from "@/lib/team";
import { resolveWriteOrg } from "@/lib/access";
import { SeatLimitError, seatLimitResponse } from "@/lib/billing";

/**
 * POST /api/team/invites/import (multipart: file, fileHash from the preview, org? for admins) →
 * checks every row again and writes all valid rows in one transaction; invitation mails follow.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const { bytes, fileName, form } = await readUpload(req);
  const fileHash = form.get("fileHash");
  if (typeof fileHash !== "string" || !/^[0-9a-f]{64}$/.test(fileHash)) throw new ApiError(400, "Preview the file first, then import it.");
  const org = await resolveWriteOrg(viewer, (form.get("org") as string | null) || new URL(req.url).searchParams.get("org"));
  try {
    const result = await importRoster(viewer, org, bytes, fileName, fileHash, clientIp(req));
    return json({ ok: true, ...result, message: `${result.imported} invitation${result.imported === 1 ? "" : "s"} sent; ${result.skipped} row${result.skipped === 1 ? "" : "s"} skipped.` }, 201);
  } catch (err) {
    if (err instanceof SeatLimitError) return seatLimitResponse(err);
    throw err;
  }
});
