import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { checkout, organization, paymentEvent, type CheckoutStatus } from "@/db/schema";
import { canManageOrganization, type Viewer } from "@/lib/access";
import type { TrialState } from "./allowance";
import { seatUsage } from "@/lib/billing/seats";
import { CURRENCY, PLANS } from "./plans";
import type { PriceTier } from "./pricing";
import { CHECKOUT_STATUS_LABEL } from "./schemas";
import { receiptNumber } from "./webhook";

const iso = (d: Date | null | undefined) => (d ? new Date(d).toISOString() : null);

export type Receipt = {
  id: number;
  number: string;
  paidAt: string;
  seatsAdded: number;
  seatsBefore: number | null;
  seatsAfter: number | null;
  amount: number;
  currency: string;
  reference: string;
  boughtBy: string;
};

export type CheckoutSummary = {
  id: string;
  status: CheckoutStatus;
  statusLabel: string;
  seats: number;
  amount: number;
  currency: string;
  createdAt: string;
  paidAt: string | null;
  /** the provider's payment page, while the checkout can still be paid */
  payUrl: string | null;
  boughtBy: string;
};

export type SeatSummary = { seats: number; members: number; pending: number; used: number; free: number; trial: TrialState; trialEndsAt: string | null };

export type BillingOverview = SeatSummary & {
  orgId: string;
  orgName: string;
  receipts: Receipt[];
  checkouts: CheckoutSummary[];
  plans: PriceTier[];
  currency: string;
};

export async function seatSummary(orgId: string): Promise<SeatSummary> {
  const u = await seatUsage(orgId);
  const used = u.members + u.pending;
  return { seats: u.seats, members: u.members, pending: u.pending, used, free: Math.max(0, u.seats - used), trial: u.trial, trialEndsAt: iso(u.trialEndsAt) };
}

function toSummary(c: typeof checkout.$inferSelect): CheckoutSummary {
  return {
    id: c.id,
    status: c.status,
    statusLabel: CHECKOUT_STATUS_LABEL[c.status],
    seats: c.seats,
    amount: c.amount,
    currency: c.currency,
    createdAt: c.createdAt.toISOString(),
    paidAt: iso(c.paidAt),
    payUrl: c.status === "open" ? c.providerUrl : null,
    boughtBy: c.requestedByName,
  };
}

/** Everything /team/billing shows for one organization (the caller has checked access). */
export async function billingOverview(orgId: string, orgName: string): Promise<BillingOverview> {
  const [seats, paid, recent] = await Promise.all([
    seatSummary(orgId),
    db
      .select({ e: paymentEvent, by: checkout.requestedByName })
      .from(paymentEvent)
      .innerJoin(checkout, eq(checkout.id, paymentEvent.checkoutId))
      .where(and(eq(paymentEvent.organizationId, orgId), eq(paymentEvent.outcome, "seats_added")))
      .orderBy(desc(paymentEvent.processedAt), desc(paymentEvent.id))
      .limit(200),
    db
      .select()
      .from(checkout)
      .where(and(eq(checkout.organizationId, orgId), inArray(checkout.status, ["creating", "open", "processing", "expired", "failed"])))
      .orderBy(desc(checkout.createdAt))
      .limit(10),
  ]);
  return {
    orgId,
    orgName,
    ...seats,
    receipts: paid.map(({ e, by }) => ({
      id: e.id,
      number: receiptNumber(e.id),
      paidAt: e.processedAt.toISOString(),
      seatsAdded: e.seatsAdded,
      seatsBefore: e.seatsBefore,
      seatsAfter: e.seatsAfter,
      amount: e.amount ?? 0,
      currency: e.currency ?? CURRENCY,
      reference: e.providerSessionId,
      boughtBy: by,
    })),
    checkouts: recent.map(toSummary),
    plans: PLANS,
    currency: CURRENCY,
  };
}

/** One checkout, if the viewer manages its organization (else undefined, as if it did not exist). */
export async function checkoutFor(viewer: Viewer, id: string): Promise<(CheckoutSummary & { orgId: string; orgName: string; seatsNow: number }) | undefined> {
  if (!/^[0-9a-f-]{36}$/.test(id)) return undefined;
  const [row] = await db
    .select({ c: checkout, orgName: organization.name })
    .from(checkout)
    .innerJoin(organization, eq(organization.id, checkout.organizationId))
    .where(eq(checkout.id, id));
  if (!row || !canManageOrganization(viewer, row.c.organizationId)) return undefined;
  const seats = await seatSummary(row.c.organizationId);
  return { ...toSummary(row.c), orgId: row.c.organizationId, orgName: row.orgName, seatsNow: seats.seats };
}

/** Admins' overview: every organization with its seats (no receipts). */
export async function organizationSeatList(): Promise<(SeatSummary & { orgId: string; orgName: string })[]> {
  const orgs = await db.select({ id: organization.id, name: organization.name }).from(organization).orderBy(organization.name).limit(500);
  return Promise.all(orgs.map(async (o) => ({ orgId: o.id, orgName: o.name, ...(await seatSummary(o.id)) })));
}
