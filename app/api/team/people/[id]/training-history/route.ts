import { route } from "@/lib/api";
import { historyDownload } from "@/lib/credentials";

/**
 * GET /api/team/people/:id/training-history?format=pdf|csv → one person's training history, for a
 * manager of their organization or an admin. Unknown person → 404; another organization's → 403.
 */
export const GET = route<{ id: string }>("manager", async ({ req, viewer, params }) => historyDownload(viewer, params.id, new URL(req.url).searchParams.get("format")));
