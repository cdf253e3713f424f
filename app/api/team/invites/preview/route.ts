import { json, route } from "@/lib/api";
import { previewRoster, readUpload } from "@/lib/team/bulk";
import { resolveWriteOrg } from "@/lib/team/scope";

/**
 * POST /api/team/invites/preview (multipart: file, org? for admins) → every row with its problems
 * and the file's hash for the import. Writes nothing.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  const { bytes, fileName, form } = await readUpload(req);
  const org = await resolveWriteOrg(viewer, (form.get("org") as string | null) || new URL(req.url).searchParams.get("org"));
  return json(await previewRoster(org, bytes, fileName));
});
