import "server-only";
import { and, countDistinct, count, eq, gt, isNull, or } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { invitation, organization, user } from "@/db/schema";
import { DomainError } from "@/lib/errors";
import { seatAllowance, type TrialState } from "./allowance";
import { isoDay } from "@/lib/dates";

export const BILLING_PATH = "/team/billing";

export class SeatLimitError extends DomainError {
  constructor(
    readonly seats: number,
    readonly used: number,
    readonly requested: number,
    trialEndedAt?: Date | null,
  ) {
    super("conflict",
      trialEndedAt
        ? `Your organization's trial ended on ${isoDay(trialEndedAt)}; buy seats on the billing page to invite more people.`
        : `Your organization has ${seats} seats; buy more on the billing page.`,
      undefined,
      // the answer carries the figures and where to buy seats beside the message
      { seats, used, requested, billingUrl: BILLING_PATH },
    );
  }
}

export type SeatUsage = { seats: number; members: number; pending: number; trial: TrialState; trialEndsAt: Date | null };

/**
 * Seats the organization may fill now (lib/billing/allowance: bought seats, plus the trial's while
 * it runs), active members (not banned) and open invitations (distinct e-mails).
 */
export async function seatUsage(orgId: string, tx: Tx | typeof db = db, lock = false): Promise<SeatUsage> {
  const orgQuery = tx.select({ seats: organization.seats, trialEndsAt: organization.trialEndsAt }).from(organization).where(eq(organization.id, orgId));
  const [org] = lock ? await orgQuery.for("update") : await orgQuery;
  const [m] = await tx
    .select({ n: count() })
    .from(user)
    .where(and(eq(user.organizationId, orgId), or(isNull(user.banned), eq(user.banned, false))));
  const [p] = await tx
    .select({ n: countDistinct(invitation.email) })
    .from(invitation)
    // An invitation being accepted (claimed, account not yet linked) still holds its seat, so a
    // concurrent invitation cannot take it in between.
    .where(and(eq(invitation.organizationId, orgId), isNull(invitation.acceptedUserId), isNull(invitation.revokedAt), gt(invitation.expiresAt, new Date())));
  const allowance = seatAllowance({ seats: org?.seats ?? 0, trialEndsAt: org?.trialEndsAt ?? null });
  return { seats: allowance.seats, members: m?.n ?? 0, pending: p?.n ?? 0, trial: allowance.trial, trialEndsAt: allowance.trialEndsAt };
}

/**
 * The one seat check for invitations: active members + open invitations + `count` new ones must
 * fit in the seats the organization may fill (lib/billing/allowance: bought seats, plus the
 * trial's while it runs). Call it inside the transaction that writes the invitations (it locks the
 * organization row so two managers cannot both take the last seat). When the transaction has
 * already written the new invitations, say how many with `written` (they are counted once, and the
 * refusal reports the seats in use before them).
 */
export async function assertSeatAvailable(orgId: string, count: number, tx?: Tx, opts: { written?: number } = {}): Promise<SeatUsage> {
  const usage = await seatUsage(orgId, tx ?? db, Boolean(tx));
  const used = usage.members + usage.pending - (opts.written ?? 0);
  if (used + count > usage.seats) throw new SeatLimitError(usage.seats, used, count, usage.trial === "ended" ? usage.trialEndsAt : null);
  return usage;
}
