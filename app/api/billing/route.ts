import { json, route } from "@/lib/api";
import { billingOverview, organizationSeatList } from "@/lib/billing";
import { resolveScope } from "@/lib/access";

/**
 * GET /api/billing[?org=] → seats, receipts and open checkouts of one organization (managers: their
 * own; admins: the one named), or, for an admin without ?org=, every organization's seats.
 */
export const GET = route("manager", async ({ req, viewer }) => {
  const scope = await resolveScope(viewer, new URL(req.url).searchParams.get("org"));
  if (!scope.orgId || !scope.orgName) return json({ organizations: await organizationSeatList() });
  return json({ organization: await billingOverview(scope.orgId, scope.orgName) });
});
