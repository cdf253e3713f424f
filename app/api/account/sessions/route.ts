import { json, route } from "@/lib/api";
import { listOwnSessions } from "@/lib/account";

/** GET /api/account/sessions → the viewer's own live sessions (no tokens), the current one marked. */
export const GET = route("signed-in", async ({ viewer }) => json({ sessions: await listOwnSessions(viewer.id, viewer.sessionId) }));
