/** Billing input schemas, shared by the browser (react-hook-form) and the server. No server code here. */
import { z } from "zod";
import type { CheckoutStatus } from "@/db/schema/billing";

/** Most seats one checkout may add (a larger order is several checkouts or a talk with us). */
export const MAX_SEATS_PER_CHECKOUT = 500;

export const checkoutInput = z.object({
  seats: z.coerce
    .number({ message: "Enter a whole number of seats" })
    .int("Enter a whole number of seats")
    .min(1, "Buy at least 1 seat")
    .max(MAX_SEATS_PER_CHECKOUT, `At most ${MAX_SEATS_PER_CHECKOUT} seats in one purchase`),
  /** made by the browser once per purchase attempt; sending it again never starts a second payment */
  idempotencyKey: z.string().regex(/^[A-Za-z0-9-]{16,64}$/, "Reload the page and try again"),
  /** admins only: which organization buys */
  org: z.string().trim().max(36).optional(),
});
export type CheckoutInput = z.input<typeof checkoutInput>;

export const CHECKOUT_STATUS_LABEL: Record<CheckoutStatus, string> = {
  creating: "Could not reach the payment service",
  open: "Waiting for payment",
  processing: "Payment being confirmed",
  paid: "Paid",
  expired: "Not completed",
  failed: "Payment failed",
};
