import "server-only";
import { cache } from "react";
import { headers } from "next/headers";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { organization } from "@/db/schema";
import { readSession } from "@/lib/auth";
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
  /** Two-step sign-in is on for this account (better-auth's twoFactor plugin). */
  twoFactorEnabled: boolean;
  /**
   * The account must use two-step sign-in and does not yet: an admin, or a manager whose
   * organization requires it. Such a viewer reaches only what any signed-in person reaches
   * (their own training and /account, where they set it up) until they enrol.
   */
  secondFactorMissing: boolean;
};

export const SECOND_FACTOR_MESSAGE = "Set up two-step sign-in on your Account page first (an authenticator app code at every sign-in); your role requires it.";

/** Who must use two-step sign-in: admins always; managers when their organization asks for it. */
async function secondFactorRequired(role: Role, organizationId: string | null): Promise<boolean> {
  if (role === "admin") return true;
  if (role !== "manager" || !organizationId) return false;
  const [org] = await db.select({ required: organization.requireManagerTwoFactor }).from(organization).where(eq(organization.id, organizationId));
  return org?.required === true;
}

export class AccessError extends Error {
  constructor(
    readonly status: 401 | 403,
    message: string,
    readonly code?: string,
  ) {
    super(message);
  }
}

async function loadViewer(requestHeaders: Headers): Promise<Viewer | null> {
  // proxy.ts has usually just read the same cookies: lib/auth remembers what it accepted
  const { session: result } = await readSession(requestHeaders);
  if (!result) return null;
  const u = result.user as typeof result.user & {
    role?: string;
    organizationId?: string | null;
    teamId?: string | null;
    banned?: boolean | null;
    twoFactorEnabled?: boolean | null;
  };
  if (u.banned) return null;
  const role = isRole(u.role) ? u.role : "learner";
  const twoFactorEnabled = u.twoFactorEnabled === true;
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role,
    organizationId: u.organizationId ?? null,
    teamId: u.teamId ?? null,
    sessionId: result.session.id,
    twoFactorEnabled,
    // looked up only for the few who could need it (a manager or admin without a second factor)
    secondFactorMissing: !twoFactorEnabled && (role === "admin" || role === "manager") ? await secondFactorRequired(role, u.organizationId ?? null) : false,
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
  if (rule !== "signed-in" && viewer.secondFactorMissing) throw new AccessError(403, SECOND_FACTOR_MESSAGE, "SECOND_FACTOR_REQUIRED");
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
  // an admin (or a manager whose organization requires it) without a second factor sets it up first
  if (rule !== "signed-in" && viewer.secondFactorMissing) return redirect(`/account?second-factor=required${next ? `&next=${encodeURIComponent(next)}` : ""}#two-factor-h`);
  return viewer;
}
export * from "./scope";
export * from "./records";
