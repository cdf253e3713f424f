import "server-only";
import { forbidden, notFound } from "next/navigation";
import { AccessError, type Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { resolveScope, type OrgScope } from "@/lib/access";

/** The organization a billing page shows: a 403 page for another organization, 404 for none. */
export async function billingPageScope(viewer: Viewer, org: string | string[] | undefined): Promise<OrgScope> {
  try {
    return await resolveScope(viewer, typeof org === "string" && org ? org : null);
  } catch (err) {
    if (err instanceof AccessError) forbidden();
    if (err instanceof DomainError && err.kind === "not-found") notFound();
    throw err;
  }
}

/** Where "back to billing" points: admins keep the organization they were looking at. */
export const billingHref = (viewer: Viewer, orgId: string) => (viewer.role === "admin" ? `/team/billing?org=${encodeURIComponent(orgId)}` : "/team/billing");
