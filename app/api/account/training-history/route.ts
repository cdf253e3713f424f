import { route } from "@/lib/api";
import { historyDownload } from "@/lib/credentials";

/** GET /api/account/training-history?format=pdf|csv → the viewer's own training history (default PDF). */
export const GET = route("signed-in", async ({ req, viewer }) => historyDownload(viewer, viewer.id, new URL(req.url).searchParams.get("format")));
