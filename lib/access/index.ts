import "server-only";
import { cache } from "react";
import { headers } from "next/headers";
import { auth } from "@/lib/auth";
import { isRole, roleSatisfies, type Role, type Rule } from "./rules";

export { ROLES, roleSatisfies, type Role, type Rule } from "./rules";

/** The signed-in person as every server check sees them: only what access decisions need. */
export type Viewer = {
  id: string;
  name: string;
  email: string;
  role: Role;
  organizationId: string | null;
  teamId: string | null;
  sessionId: string;
};

export class AccessError extends Error {
  constructor(
    readonly status: 401 | 403,
    message: string,
  ) {
    super(message);
  }
}

async function loadViewer(requestHeaders: Headers): Promise<Viewer | null> {
  const result = await auth.api.getSession({ headers: requestHeaders });
  if (!result) return null;
  const u = result.user as typeof result.user & {
    role?: string;
    organizationId?: string | null;
    teamId?: string | null;
    banned?: boolean | null;
  };
  if (u.banned) return null;
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role: isRole(u.role) ? u.role : "learner",
    organizationId: u.organizationId ?? null,
    teamId: u.teamId ?? null,
    sessionId: result.session.id,
  };
}

/** The viewer of the current page or action (once per request). */
export const getViewer = cache(async (): Promise<Viewer | null> => loadViewer(await headers()));

/** The viewer of a route handler's request. */
export async function getRequestViewer(req: Request): Promise<Viewer | null> {
  return loadViewer(req.headers);
}

/** Decides one rule for one viewer; throws AccessError (401 no session, 403 wrong role). */
export function check(viewer: Viewer | null, rule: Rule): Viewer | null {
  if (rule === "public") return viewer;
  if (!viewer) throw new AccessError(401, "Sign in to continue.");
  if (!roleSatisfies(viewer.role, rule)) throw new AccessError(403, "Your role does not allow this.");
  return viewer;
}

/** Whether the viewer may see or act on data of this organization (admins: all; managers: their own). */
export function canManageOrganization(viewer: Viewer, organizationId: string | null): boolean {
  if (viewer.role === "admin") return true;
  return viewer.role === "manager" && organizationId !== null && viewer.organizationId === organizationId;
}

export function assertManagesOrganization(viewer: Viewer, organizationId: string | null): void {
  if (!canManageOrganization(viewer, organizationId)) {
    throw new AccessError(403, "That belongs to another organization.");
  }
}

/** For pages and server actions: no session → sign-in page; wrong role → 403 page. */
export async function requireViewer(rule: Exclude<Rule, "public"> = "signed-in", next?: string): Promise<Viewer> {
  const viewer = await getViewer();
  // loaded here, not at the top: scripts (migrate, seed, jobs) import this area outside Next, where
  // next/navigation cannot load
  const { forbidden, redirect } = await import("next/navigation");
  if (!viewer) return redirect(next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in");
  if (!roleSatisfies(viewer.role, rule)) return forbidden();
  return viewer;
}
export * from "./scope";
