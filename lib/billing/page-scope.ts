import "server-only";
import { pageScope, type OrgScope, type Viewer } from "@/lib/access";

/** The organization a billing page shows: a 403 page for another organization, 404 for none. */
export const billingPageScope = (viewer: Viewer, org: string | string[] | undefined): Promise<OrgScope> => pageScope(viewer, typeof org === "string" && org ? org : null);

/** Where "back to billing" points: admins keep the organization they were looking at. */
export const billingHref = (viewer: Viewer, orgId: string) => (viewer.role === "admin" ? `/team/billing?org=${encodeURIComponent(orgId)}` : "/team/billing");
