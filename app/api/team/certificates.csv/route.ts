import { route } from "@/lib/api";
import { certificatesCsv } from "@/lib/team";
import { resolveScope } from "@/lib/access";

/** GET /api/team/certificates.csv[?org= admins] → the organization's certificates, streamed as CSV. */
export const GET = route("manager", async ({ req, viewer }) => {
  return certificatesCsv(await resolveScope(viewer, new URL(req.url).searchParams.get("org")));
});
