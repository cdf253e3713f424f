import "server-only";
import type { PriceTier } from "./pricing";

/**
 * Seat plans, prices and currency: the one place they are set.
 *
 * DEMO VALUES. The plan names, the per-seat prices and the choice of currency below are invented
 * for Riser's local demo and tests; they are not anyone's price list. A deployment sets its own
 * here. Server-only on purpose: prices reach the browser only through the billing pages, which
 * only managers and admins can open.
 *
 * A seat is one person in the organization (managers included); an open invitation holds a seat
 * until it is accepted, revoked or expires. A purchase is a one-time payment; seats stay with the
 * organization. The price per seat depends on how many seats one purchase adds.
 */
export const CURRENCY = "usd";

export const PLANS: PriceTier[] = [
  { key: "crew", name: "Crew pack", minSeats: 1, maxSeats: 9, unitAmount: 3900 },
  { key: "branch", name: "Branch pack", minSeats: 10, maxSeats: 49, unitAmount: 3400 },
  { key: "company", name: "Company pack", minSeats: 50, maxSeats: 500, unitAmount: 2900 },
];

/**
 * The trial allowance of a new organization (sign-up): this many seats for this many days. Buying
 * seats during the trial ends it and the trial seats stay; once a trial has ended without a
 * purchase its seats no longer count for new invitations (everyone already in keeps access).
 */
export const TRIAL = { seats: 3, days: 30 } as const;
