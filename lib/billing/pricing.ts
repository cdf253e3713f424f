/**
 * Price arithmetic shared by the billing pages (browser) and the checkout (server). Holds no prices
 * itself: the tiers come from lib/billing/plans.ts through the server.
 */
export type PriceTier = { key: string; name: string; minSeats: number; maxSeats: number; unitAmount: number };

export type Quote = { plan: PriceTier; seats: number; unitAmount: number; amount: number; currency: string };

/** The tier whose range holds `seats`, or null when no tier does. */
export function tierFor(seats: number, tiers: readonly PriceTier[]): PriceTier | null {
  return tiers.find((t) => seats >= t.minSeats && seats <= t.maxSeats) ?? null;
}

/** Amounts in minor units (cents): seats × the tier's price per seat. */
export function quote(seats: number, tiers: readonly PriceTier[], currency: string): Quote | null {
  if (!Number.isInteger(seats) || seats < 1) return null;
  const plan = tierFor(seats, tiers);
  if (!plan) return null;
  return { plan, seats, unitAmount: plan.unitAmount, amount: plan.unitAmount * seats, currency };
}

/** "$195.00" — for two-decimal currencies (the minor unit is a hundredth). */
export function formatMoney(minor: number, currency: string): string {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(minor / 100);
}
