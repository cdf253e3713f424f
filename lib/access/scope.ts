import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { organization, team } from "@/db/schema";
import type { Viewer } from "./index";
import { DomainError } from "@/lib/errors";

/**
 * Which organization's data a request may see. Managers: their own, always (asking for another
 * one is a 403). Admins: the one named by `?org=`, or every organization when none is named.
 * `orgId: null` therefore only ever happens for an admin.
 */
export type OrgScope = { orgId: string | null; orgName: string | null };

/**
 * The one rule for which organization a viewer's lists and counts cover: `null` means every
 * organization (admins who name none), a string is that organization (admins who name one,
 * managers always their own), `undefined` means none (everyone else). Checks nothing in the
 * database; resolveScope below adds that and the 403/404 answers.
 */
export function organizationFilter(viewer: Viewer, requested?: string | null): string | null | undefined {
  if (viewer.role === "admin") return requested || null;
  if (viewer.role === "manager" && viewer.organizationId) return viewer.organizationId;
  return undefined;
}

export async function resolveScope(viewer: Viewer, orgParam?: string | null): Promise<OrgScope> {
  if (viewer.role === "admin") {
    if (!orgParam) return { orgId: null, orgName: null };
    const [org] = await db.select({ id: organization.id, name: organization.name }).from(organization).where(eq(organization.id, orgParam));
    if (!org) throw new DomainError("not-found", "No such organization.");
    return { orgId: org.id, orgName: org.name };
  }
  if (viewer.role !== "manager" || !viewer.organizationId) throw new DomainError("forbidden", "Only training managers see team data.");
  if (orgParam && orgParam !== viewer.organizationId) throw new DomainError("forbidden", "That belongs to another organization.");
  const [org] = await db.select({ id: organization.id, name: organization.name }).from(organization).where(eq(organization.id, viewer.organizationId));
  if (!org) throw new DomainError("forbidden", "Your organization no longer exists.");
  return { orgId: org.id, orgName: org.name };
}

/** For pages: another organization → the 403 page; an unknown one → the 404 page. */
export async function pageScope(viewer: Viewer, orgParam?: string | null): Promise<OrgScope> {
  try {
    return await resolveScope(viewer, orgParam);
  } catch (err) {
    // loaded here, not at the top: scripts import this area outside Next (see requireViewer)
    const { forbidden, notFound } = await import("next/navigation");
    if (err instanceof DomainError && err.kind === "forbidden") forbidden();
    if (err instanceof DomainError && err.kind === "not-found") notFound();
    throw err;
  }
}

/** For changes (invite, assign): one organization is required; admins must name it. */
export async function resolveWriteOrg(viewer: Viewer, orgParam?: string | null): Promise<{ orgId: string; orgName: string }> {
  const scope = await resolveScope(viewer, orgParam);
  if (!scope.orgId || !scope.orgName) throw new DomainError("invalid", "Choose the organization first.", { org: ["Choose the organization"] });
  return { orgId: scope.orgId, orgName: scope.orgName };
}

export type TeamOption = { id: string; name: string; organizationId: string; orgName: string };

/** Active (not archived) teams in scope (all teams of all organizations for an admin without ?org=). */
export async function teamsInScope(scope: OrgScope): Promise<TeamOption[]> {
  const q = db
    .select({ id: team.id, name: team.name, organizationId: team.organizationId, orgName: organization.name })
    .from(team)
    .innerJoin(organization, eq(organization.id, team.organizationId));
  const rows = scope.orgId
    ? await q.where(and(eq(team.organizationId, scope.orgId), isNull(team.archivedAt))).orderBy(asc(team.name))
    : await q.where(isNull(team.archivedAt)).orderBy(asc(organization.name), asc(team.name));
  return rows;
}

export async function allOrganizations(): Promise<{ id: string; name: string }[]> {
  return db.select({ id: organization.id, name: organization.name }).from(organization).orderBy(asc(organization.name));
}
