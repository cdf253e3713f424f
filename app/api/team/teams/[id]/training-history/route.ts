import { route } from "@/lib/api";
import { teamHistoryZip } from "@/lib/credentials";

/**
 * GET /api/team/teams/:id/training-history → a ZIP of each team member's training history (PDF and
 * CSV), for a manager of the team's organization or an admin. Unknown team → 404; another
 * organization's → 403; no members → 409; too many members → 413.
 */
export const GET = route<{ id: string }>("manager", async ({ viewer, params }) => teamHistoryZip(viewer, params.id));
