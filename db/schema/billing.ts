/**
 * Seat purchases. A `checkout` is Riser's record of one attempt to buy seats: created before the
 * payment provider is called (so that a retry with the same idempotency key finds it), then tied to
 * the provider's checkout session. A `payment_event` is one signed webhook event from the provider,
 * recorded once per provider event id (the UNIQUE key makes processing idempotent: the same event
 * delivered twice is recorded and applied once). Receipts on /team/billing are the payment events
 * that added seats; they copy the amounts and the seat counts before and after, so a receipt never
 * changes when prices or seats change later.
 */
import { datetime, index, int, mysqlTable, text, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { organization } from "./org";

/** creating → open → paid | processing → paid | expired | failed */
export type CheckoutStatus = "creating" | "open" | "processing" | "paid" | "expired" | "failed";

export const checkout = mysqlTable(
  "checkout",
  {
    id: varchar("id", { length: 36 }).primaryKey(),
    organizationId: varchar("organization_id", { length: 36 })
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    requestedBy: varchar("requested_by", { length: 36 }),
    requestedByEmail: varchar("requested_by_email", { length: 255 }).notNull(),
    requestedByName: varchar("requested_by_name", { length: 200 }).notNull(),
    seats: int("seats").notNull(),
    plan: varchar("plan", { length: 40 }).notNull(),
    /** minor units (cents) per seat and in total, as quoted when the checkout was created */
    unitAmount: int("unit_amount").notNull(),
    amount: int("amount").notNull(),
    currency: varchar("currency", { length: 3 }).notNull(),
    /** the key the browser sent: the same key again returns this checkout instead of a new one */
    idempotencyKey: varchar("idempotency_key", { length: 64 }).notNull(),
    providerSessionId: varchar("provider_session_id", { length: 255 }),
    providerUrl: text("provider_url"),
    status: varchar("status", { length: 12 }).$type<CheckoutStatus>().notNull(),
    lastError: text("last_error"),
    createdAt: datetime("created_at", { fsp: 3 }).notNull(),
    updatedAt: datetime("updated_at", { fsp: 3 }).notNull(),
    paidAt: datetime("paid_at", { fsp: 3 }),
  },
  (t) => [
    uniqueIndex("checkout_org_key_uq").on(t.organizationId, t.idempotencyKey),
    uniqueIndex("checkout_session_uq").on(t.providerSessionId),
    index("checkout_org_created_idx").on(t.organizationId, t.createdAt),
  ],
);

/** What processing an event did (kept with the event, for support and for the receipts). */
export type PaymentOutcome = "seats_added" | "awaiting_payment" | "checkout_expired" | "payment_failed" | "already_paid" | "amount_mismatch" | "ignored";

export const paymentEvent = mysqlTable(
  "payment_event",
  {
    id: int("id").autoincrement().primaryKey(),
    providerEventId: varchar("provider_event_id", { length: 255 }).notNull(),
    type: varchar("type", { length: 64 }).notNull(),
    organizationId: varchar("organization_id", { length: 36 }).notNull(),
    checkoutId: varchar("checkout_id", { length: 36 }).notNull(),
    providerSessionId: varchar("provider_session_id", { length: 255 }).notNull(),
    outcome: varchar("outcome", { length: 20 }).$type<PaymentOutcome>().notNull(),
    seatsAdded: int("seats_added").notNull().default(0),
    seatsBefore: int("seats_before"),
    seatsAfter: int("seats_after"),
    /** minor units as the provider reported them for the session */
    amount: int("amount"),
    currency: varchar("currency", { length: 3 }),
    /** the provider's own time for the event */
    eventCreatedAt: datetime("event_created_at", { fsp: 3 }).notNull(),
    processedAt: datetime("processed_at", { fsp: 3 }).notNull(),
  },
  (t) => [
    uniqueIndex("payment_event_provider_uq").on(t.providerEventId),
    index("payment_event_org_idx").on(t.organizationId, t.processedAt),
    index("payment_event_checkout_idx").on(t.checkoutId),
  ],
);
