// Seat prices, the trial allowance and webhook signing, without a server.
import { createHmac } from "node:crypto";
import fc from "fast-check";
import Stripe from "stripe";
import { describe, expect, it } from "vitest";
import { seatAllowance, seatsAfterPurchase } from "@/lib/billing/allowance";
import { CURRENCY, PLANS, TRIAL } from "@/lib/billing/plans";
import { formatMoney, quote, tierFor } from "@/lib/billing/pricing";
import { MAX_SEATS_PER_CHECKOUT, checkoutInput } from "@/lib/billing/schemas";

const DAY = 86_400_000;

describe("seat prices (the demo plans in lib/billing/plans.ts)", () => {
  it("every purchase size from 1 to the maximum has exactly one plan, and none beyond", () => {
    for (let n = 1; n <= MAX_SEATS_PER_CHECKOUT; n++) expect(PLANS.filter((p) => n >= p.minSeats && n <= p.maxSeats)).toHaveLength(1);
    expect(tierFor(0, PLANS)).toBeNull();
    expect(tierFor(MAX_SEATS_PER_CHECKOUT + 1, PLANS)).toBeNull();
  });

  it("the total is seats × the plan's price, and the price per seat never rises with the purchase size", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: MAX_SEATS_PER_CHECKOUT }), (n) => {
        const q = quote(n, PLANS, CURRENCY)!;
        expect(q.amount).toBe(n * q.plan.unitAmount);
        expect(Number.isInteger(q.amount)).toBe(true); // minor units, no rounding anywhere
        // common practice for volume pricing: the per-seat price does not rise with the size
        if (n < MAX_SEATS_PER_CHECKOUT) expect(quote(n + 1, PLANS, CURRENCY)!.unitAmount).toBeLessThanOrEqual(q.unitAmount);
      }),
    );
  });

  it("refuses what is not a whole, positive seat count", () => {
    for (const n of [0, -1, 2.5, Number.NaN]) expect(quote(n, PLANS, CURRENCY)).toBeNull();
    expect(checkoutInput.safeParse({ seats: "0", idempotencyKey: "k".repeat(20) }).success).toBe(false);
    expect(checkoutInput.safeParse({ seats: "4.5", idempotencyKey: "k".repeat(20) }).success).toBe(false);
    expect(checkoutInput.safeParse({ seats: "5", idempotencyKey: "short" }).success).toBe(false);
    expect(checkoutInput.safeParse({ seats: "5", idempotencyKey: "0b9c1e9e-3f1a-4c52-9d55-6a1f0f6d2a11" }).data?.seats).toBe(5);
  });

  it("prints amounts from minor units with two decimals (ISO 4217: USD has 2 minor-unit digits)", () => {
    expect(formatMoney(19500, "usd")).toBe("$195.00");
    expect(formatMoney(3950, "usd")).toBe("$39.50");
    expect(formatMoney(123456789, "usd")).toBe("$1,234,567.89");
  });
});

describe("trial allowance", () => {
  const now = new Date("2027-03-10T12:00:00Z");
  it("counts every seat without a trial and while the trial runs", () => {
    expect(seatAllowance({ seats: 25, trialEndsAt: null }, now)).toMatchObject({ seats: 25, trial: "none" });
    expect(seatAllowance({ seats: TRIAL.seats, trialEndsAt: new Date(now.getTime() + DAY) }, now)).toMatchObject({ seats: TRIAL.seats, trial: "active" });
  });
  it("stops counting the trial's own seats once it has ended, never below zero", () => {
    expect(seatAllowance({ seats: TRIAL.seats, trialEndsAt: new Date(now.getTime() - 1) }, now)).toMatchObject({ seats: 0, trial: "ended" });
    expect(seatAllowance({ seats: TRIAL.seats + 4, trialEndsAt: new Date(now.getTime() - DAY) }, now).seats).toBe(4);
    expect(seatAllowance({ seats: 1, trialEndsAt: new Date(now.getTime() - DAY) }, now).seats).toBe(0);
  });
  it("a purchase during the trial keeps the trial seats; after it ended, only what is bought counts", () => {
    expect(seatsAfterPurchase({ seats: TRIAL.seats, trialEndsAt: new Date(now.getTime() + DAY) }, 5, now)).toEqual({ before: TRIAL.seats, after: TRIAL.seats + 5 });
    expect(seatsAfterPurchase({ seats: TRIAL.seats, trialEndsAt: new Date(now.getTime() - DAY) }, 5, now)).toEqual({ before: 0, after: 5 });
    expect(seatsAfterPurchase({ seats: 25, trialEndsAt: null }, 5, now)).toEqual({ before: 25, after: 30 });
  });
});

describe("webhook signatures as the fake makes them", () => {
  // The provider's documented scheme ("Check the webhook signatures" / "Verify manually" in its
  // webhook docs, from memory — verify): header "t=<unix time>,v1=<hex>", where v1 is the
  // HMAC-SHA256, keyed with the endpoint secret, of "<t>.<raw body>"; the default tolerance is 300 s.
  const secret = "whsec_unit_test_secret_0123456789";
  const payload = JSON.stringify({ id: "evt_test_1", object: "event", type: "checkout.session.completed", data: { object: { id: "cs_test_1" } } }, null, 2);

  it("the SDK's test header is exactly the documented HMAC over timestamp and raw body", () => {
    const t = 1_800_000_000;
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret, timestamp: t });
    const expected = createHmac("sha256", secret).update(`${t}.${payload}`).digest("hex");
    expect(header).toBe(`t=${t},v1=${expected}`);
  });

  it("verification accepts the signed body and refuses a changed body, a wrong secret or an old timestamp", () => {
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret });
    expect(Stripe.webhooks.constructEvent(payload, header, secret).id).toBe("evt_test_1");
    expect(() => Stripe.webhooks.constructEvent(payload.replace("cs_test_1", "cs_test_2"), header, secret)).toThrow();
    expect(() => Stripe.webhooks.constructEvent(payload, header, `${secret}x`)).toThrow();
    const old = Stripe.webhooks.generateTestHeaderString({ payload, secret, timestamp: Math.floor(Date.now() / 1000) - 301 });
    expect(() => Stripe.webhooks.constructEvent(payload, old, secret)).toThrow(/tolerance/);
  });
});
