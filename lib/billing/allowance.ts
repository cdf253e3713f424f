import "server-only";
import { TRIAL } from "./plans";

export type TrialState = "none" | "active" | "ended";
export type SeatAllowance = { seats: number; trial: TrialState; trialEndsAt: Date | null };

/**
 * Seats an organization may fill now. `trialEndsAt` is set only while an organization has never
 * bought seats (sign-up sets it; the first purchase clears it). While the trial runs, every seat
 * counts; after it ends, the trial's own seats stop counting (anything beyond them, e.g. set by an
 * admin, still does).
 */
export function seatAllowance(org: { seats: number; trialEndsAt: Date | null }, now = new Date()): SeatAllowance {
  if (!org.trialEndsAt) return { seats: org.seats, trial: "none", trialEndsAt: null };
  if (org.trialEndsAt.getTime() > now.getTime()) return { seats: org.seats, trial: "active", trialEndsAt: org.trialEndsAt };
  return { seats: Math.max(0, org.seats - TRIAL.seats), trial: "ended", trialEndsAt: org.trialEndsAt };
}

/** Seats after a purchase of `added`: the allowance now plus what was bought; the trial ends. */
export function seatsAfterPurchase(org: { seats: number; trialEndsAt: Date | null }, added: number, now = new Date()): { before: number; after: number } {
  const before = seatAllowance(org, now).seats;
  return { before, after: before + added };
}
