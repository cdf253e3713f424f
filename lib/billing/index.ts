import "server-only";
/** Seats and billing: what the rest of Riser calls. */
export { startCheckout, type StartedCheckout } from "./checkout";
export { processPaymentEvent, receiptNumber, type WebhookResult } from "./webhook";
export { billingOverview, checkoutFor, organizationSeatList, seatSummary, type BillingOverview, type CheckoutSummary, type Receipt, type SeatSummary } from "./queries";
export { isSignatureError, paymentsConfigured, verifyWebhook } from "./provider";
export { CURRENCY, PLANS, TRIAL } from "./plans";
export * from "./page-scope";
export * from "./plans";
export * from "./pricing";
export * from "./queries";
export * from "./schemas";
export * from "./seats";
