import "server-only";
import { and, count, eq, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { assignment, invitation, team, user } from "@/db/schema";
import type { FirstDayCounts } from "./first-day-steps";

/** The counts behind a manager's first-day checklist (their organization only). */
export async function firstDayCounts(orgId: string): Promise<FirstDayCounts> {
  const [[t], [i], [m], [a]] = await Promise.all([
    db.select({ n: count() }).from(team).where(and(eq(team.organizationId, orgId), isNull(team.archivedAt))),
    db.select({ n: count() }).from(invitation).where(eq(invitation.organizationId, orgId)),
    db.select({ n: count() }).from(user).where(eq(user.organizationId, orgId)),
    db.select({ n: count() }).from(assignment).where(eq(assignment.organizationId, orgId)),
  ]);
  return { teams: t?.n ?? 0, invited: i?.n ?? 0, members: m?.n ?? 0, assignments: a?.n ?? 0 };
}
