import "server-only";
import { log } from "@/lib/log";
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { checkout } from "@/db/schema";
import type { Viewer } from "@/lib/access";
import { DomainError } from "@/lib/errors";
import { audit } from "@/lib/audit";
import { env } from "@/lib/env";
import { resolveWriteOrg } from "@/lib/access";
import { CURRENCY, PLANS } from "./plans";
import { quote } from "./pricing";
import { isProviderUnreachable, paymentProvider } from "./provider";

export type StartedCheckout = { checkoutId: string; url: string; seats: number; amount: number; currency: string; reused: boolean };

type CheckoutRow = typeof checkout.$inferSelect;

const UNREACHABLE =
  "The payment service is not reachable right now. Nothing was charged and no seats were added. Try again in a few minutes; trying again with the same purchase never charges twice.";

export function isDuplicateKey(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 6; depth++) {
    if ((e as { code?: unknown }).code === "ER_DUP_ENTRY" || (e as { errno?: unknown }).errno === 1062) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

async function findByKey(orgId: string, key: string): Promise<CheckoutRow | undefined> {
  const [row] = await db
    .select()
    .from(checkout)
    .where(and(eq(checkout.organizationId, orgId), eq(checkout.idempotencyKey, key)));
  return row;
}

/** Riser's checkout row for this key: the existing one, or a new one (status "creating"). */
async function claimCheckout(viewer: Viewer, orgId: string, seats: number, key: string, ip: string): Promise<CheckoutRow> {
  const existing = await findByKey(orgId, key);
  if (existing) return existing;
  const q = quote(seats, PLANS, CURRENCY);
  if (!q) throw new DomainError("invalid", "Some fields need attention.", { seats: ["No price is set for this number of seats"] });
  const id = randomUUID();
  const at = new Date();
  try {
    await db.transaction(async (tx) => {
      await tx.insert(checkout).values({
        id,
        organizationId: orgId,
        requestedBy: viewer.id,
        requestedByEmail: viewer.email,
        requestedByName: viewer.name,
        seats,
        plan: q.plan.key,
        unitAmount: q.unitAmount,
        amount: q.amount,
        currency: q.currency,
        idempotencyKey: key,
        status: "creating",
        createdAt: at,
        updatedAt: at,
      });
      await audit(
        { actor: viewer, organizationId: orgId, action: "billing.checkout", targetType: "checkout", targetId: id, ip, details: { seats, plan: q.plan.key, amount: q.amount, currency: q.currency } },
        tx,
      );
    });
  } catch (err) {
    // the same key sent twice at once: the other request made the row
    if (!isDuplicateKey(err)) throw err;
  }
  const row = await findByKey(orgId, key);
  if (!row) throw new Error("checkout row missing after insert");
  return row;
}

/**
 * Starts (or resumes) a seat purchase: our checkout row first, then the provider's checkout
 * session, created with an idempotency key derived from our row. The same browser key again —
 * a double click, a retry after a timeout, a retry after the provider was down — finds the same
 * row and so the same provider session: one purchase, never two charges. Seats are NOT added here;
 * only the provider's signed webhook adds them (lib/billing/webhook.ts).
 */
export async function startCheckout(viewer: Viewer, input: { seats: number; idempotencyKey: string; org?: string }, ip: string): Promise<StartedCheckout> {
  const stripe = paymentProvider();
  if (!stripe) throw new DomainError("unavailable", "Buying seats is switched off on this Riser instance: no payment service is configured. Nothing was charged.");
  const { orgId, orgName } = await resolveWriteOrg(viewer, input.org);
  const row = await claimCheckout(viewer, orgId, input.seats, input.idempotencyKey, ip);

  if (row.seats !== input.seats) {
    throw new DomainError("conflict", `This purchase was started for ${row.seats} seat${row.seats === 1 ? "" : "s"}. Reload the page to buy a different number.`);
  }
  if (row.status === "paid") throw new DomainError("conflict", "This purchase is already paid and its seats were added. Reload the page to buy more.");
  if (row.status === "expired" || row.status === "failed") throw new DomainError("conflict", "This checkout ended without payment. Reload the page to start a new one.");
  const started = (url: string, reused: boolean): StartedCheckout => ({ checkoutId: row.id, url, seats: row.seats, amount: row.amount, currency: row.currency, reused });
  if (row.providerUrl) return started(row.providerUrl, true);

  const plan = PLANS.find((p) => p.key === row.plan);
  let session;
  try {
    session = await stripe.checkout.sessions.create(
      {
        mode: "payment",
        client_reference_id: row.id,
        customer_email: row.requestedByEmail,
        line_items: [
          {
            quantity: row.seats,
            price_data: { currency: row.currency, unit_amount: row.unitAmount, product_data: { name: `Riser training seat (${plan?.name ?? row.plan})` } },
          },
        ],
        metadata: { organizationId: orgId, organizationName: orgName, checkoutId: row.id, seats: String(row.seats) },
        success_url: `${env.APP_URL}/team/billing/success?checkout=${row.id}`,
        cancel_url: `${env.APP_URL}/team/billing/cancel?checkout=${row.id}`,
      },
      { idempotencyKey: `riser-checkout-${row.id}` },
    );
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    await db
      .update(checkout)
      .set({ lastError: message.slice(0, 2000), updatedAt: new Date() })
      .where(eq(checkout.id, row.id));
    if (isProviderUnreachable(err)) {
      log().warn({ checkoutId: row.id, error: message }, "payment service unreachable");
      throw new DomainError("unavailable", UNREACHABLE);
    }
    log().error({ checkoutId: row.id, err }, "the payment service refused the checkout session");
    throw new DomainError("upstream", "The payment service could not start this checkout. Nothing was charged and no seats were added. Try again later, or ask Riser's administrator.");
  }
  if (!session.url) throw new DomainError("upstream", "The payment service did not return a payment page. Nothing was charged.");
  await db
    .update(checkout)
    .set({ providerSessionId: session.id, providerUrl: session.url, status: "open", lastError: null, updatedAt: new Date() })
    .where(and(eq(checkout.id, row.id), eq(checkout.status, "creating")));
  return started(session.url, false);
}
