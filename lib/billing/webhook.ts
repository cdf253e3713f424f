import "server-only";
import { log } from "@/lib/log";
import { and, eq, inArray, isNull, or } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { checkout, organization, paymentEvent, user, type CheckoutStatus, type PaymentOutcome } from "@/db/schema";
import { audit } from "@/lib/audit";
import { env } from "@/lib/env";
import { mailDate, mailTranslator, sendMail, type MailT } from "@/lib/mail";
import { seatsAfterPurchase } from "./allowance";
import { isDuplicateKey } from "./checkout";
import { PLANS } from "./plans";
import { formatMoney } from "./pricing";
import type { ProviderEvent, ProviderSession } from "./provider";

export type WebhookOutcome = PaymentOutcome | "duplicate" | "unknown" | "unhandled";
export type WebhookResult = { outcome: WebhookOutcome; seatsAdded: number };

const SESSION_EVENTS = new Set(["checkout.session.completed", "checkout.session.async_payment_succeeded", "checkout.session.async_payment_failed", "checkout.session.expired"]);

/** A status a later event may still move on from (a paid checkout never moves). */
const OPEN: CheckoutStatus[] = ["creating", "open", "processing"];

export const receiptNumber = (paymentEventId: number) => `R-${String(paymentEventId).padStart(6, "0")}`;

/** Our checkout for the session: by the provider's session id, else by our own id in client_reference_id. */
async function findCheckout(session: ProviderSession) {
  const [bySession] = await db.select().from(checkout).where(eq(checkout.providerSessionId, session.id));
  if (bySession) return bySession;
  const ref = session.client_reference_id;
  if (!ref || !/^[0-9a-f-]{36}$/.test(ref)) return undefined;
  const [byRef] = await db
    .select()
    .from(checkout)
    .where(and(eq(checkout.id, ref), or(isNull(checkout.providerSessionId), eq(checkout.providerSessionId, session.id))));
  return byRef;
}

function isPaid(event: ProviderEvent, session: ProviderSession): boolean {
  if (event.type === "checkout.session.async_payment_succeeded") return true;
  return event.type === "checkout.session.completed" && (session.payment_status === "paid" || session.payment_status === "no_payment_required");
}

type Applied = { outcome: PaymentOutcome; seatsAdded: number; seatsBefore: number | null; seatsAfter: number | null; paymentEventId: number };

/**
 * Applies one verified provider event. Idempotent: the provider event id is recorded in the same
 * transaction as the change (UNIQUE key), so the same event twice changes things once; the
 * checkout row is locked, so two different events for one checkout (completed and
 * async_payment_succeeded, or a late "expired") can add its seats at most once. Order does no
 * harm: a paid checkout never goes back, and a payment the provider confirms is honoured even if
 * an "expired" or "failed" event for it came first.
 */
export async function processPaymentEvent(event: ProviderEvent, now = new Date()): Promise<WebhookResult> {
  if (!SESSION_EVENTS.has(event.type)) return { outcome: "unhandled", seatsAdded: 0 };
  const session = event.data?.object as ProviderSession | undefined;
  if (!session || typeof session.id !== "string") {
    log().warn({ eventId: event.id, eventType: event.type }, "payment webhook carries no checkout session; nothing changed");
    return { outcome: "unknown", seatsAdded: 0 };
  }
  const found = await findCheckout(session);
  const metaOrg = session.metadata?.organizationId;
  if (!found || (metaOrg && metaOrg !== found.organizationId)) {
    log().warn({ eventId: event.id, eventType: event.type, sessionId: session.id, organizationId: metaOrg ?? null }, "payment webhook names no checkout of a known organization; nothing changed");
    return { outcome: "unknown", seatsAdded: 0 };
  }

  let applied: Applied | null;
  try {
    applied = await db.transaction(async (tx) => {
      const [c] = await tx.select().from(checkout).where(eq(checkout.id, found.id)).for("update");
      if (!c) throw new Error("checkout vanished");
      const [seen] = await tx.select({ id: paymentEvent.id }).from(paymentEvent).where(eq(paymentEvent.providerEventId, event.id));
      if (seen) return null; // delivered before: recorded and applied then

      let outcome: PaymentOutcome = "ignored";
      let status: CheckoutStatus = c.status;
      let seatsAdded = 0;
      let seatsBefore: number | null = null;
      let seatsAfter: number | null = null;

      if (isPaid(event, session)) {
        if (c.status === "paid") outcome = "already_paid";
        else if (session.amount_total !== c.amount || (session.currency ?? "").toLowerCase() !== c.currency) {
          outcome = "amount_mismatch";
          log().error({ eventId: event.id, sessionId: session.id, paid: session.amount_total, currency: session.currency, checkoutId: c.id, expected: c.amount, expectedCurrency: c.currency }, "payment amount does not match the checkout; no seats added");
        } else {
          const [org] = await tx.select({ seats: organization.seats, trialEndsAt: organization.trialEndsAt }).from(organization).where(eq(organization.id, c.organizationId)).for("update");
          if (!org) throw new Error("organization vanished");
          const change = seatsAfterPurchase(org, c.seats, now);
          await tx.update(organization).set({ seats: change.after, trialEndsAt: null }).where(eq(organization.id, c.organizationId));
          outcome = "seats_added";
          status = "paid";
          seatsAdded = c.seats;
          seatsBefore = change.before;
          seatsAfter = change.after;
        }
      } else if (event.type === "checkout.session.completed") {
        // completed with a payment method that settles later: seats come with async_payment_succeeded
        outcome = c.status === "paid" ? "already_paid" : "awaiting_payment";
        if (OPEN.includes(c.status)) status = "processing";
      } else if (event.type === "checkout.session.async_payment_failed") {
        outcome = c.status === "paid" ? "already_paid" : "payment_failed";
        if (OPEN.includes(c.status)) status = "failed";
      } else if (event.type === "checkout.session.expired") {
        outcome = c.status === "paid" ? "already_paid" : "checkout_expired";
        if (OPEN.includes(c.status)) status = "expired";
      }

      if (status !== c.status || !c.providerSessionId) {
        await tx
          .update(checkout)
          .set({ status, providerSessionId: session.id, updatedAt: now, ...(status === "paid" ? { paidAt: now } : {}) })
          .where(eq(checkout.id, c.id));
      }
      const [ins] = await tx
        .insert(paymentEvent)
        .values({
          providerEventId: event.id,
          type: event.type,
          organizationId: c.organizationId,
          checkoutId: c.id,
          providerSessionId: session.id,
          outcome,
          seatsAdded,
          seatsBefore,
          seatsAfter,
          amount: session.amount_total ?? null,
          currency: session.currency ?? null,
          eventCreatedAt: new Date(event.created * 1000),
          processedAt: now,
        })
        .$returningId();
      const paymentEventId = ins!.id;
      if (outcome === "seats_added") {
        await audit(
          {
            actor: c.requestedBy ? { id: c.requestedBy, email: c.requestedByEmail } : null,
            organizationId: c.organizationId,
            action: "billing.seats_purchased",
            targetType: "checkout",
            targetId: c.id,
            details: { seatsAdded, seatsBefore, seatsAfter, amount: c.amount, currency: c.currency, providerEventId: event.id, providerSessionId: session.id, receipt: receiptNumber(paymentEventId) },
          },
          tx,
        );
        // the receipt is queued in this transaction: it exists exactly when the seats do
        await mailReceipt(c.id, { outcome, seatsAdded, seatsBefore, seatsAfter, paymentEventId }, tx);
      }
      return { outcome, seatsAdded, seatsBefore, seatsAfter, paymentEventId };
    });
  } catch (err) {
    // the same event delivered twice at the same moment: the other delivery recorded it
    if (isDuplicateKey(err)) return { outcome: "duplicate", seatsAdded: 0 };
    throw err;
  }
  if (!applied) return { outcome: "duplicate", seatsAdded: 0 };
  return { outcome: applied.outcome, seatsAdded: applied.seatsAdded };
}

/** The receipt mail: to whoever bought, and to every manager of the organization. */
async function mailReceipt(checkoutId: string, applied: Applied, tx: Tx): Promise<void> {
  const [c] = await tx
    .select({ checkout, orgName: organization.name })
    .from(checkout)
    .innerJoin(organization, eq(organization.id, checkout.organizationId))
    .where(eq(checkout.id, checkoutId));
  if (!c) return;
  const managers = await tx
    .select({ email: user.email })
    .from(user)
    .where(and(eq(user.organizationId, c.checkout.organizationId), eq(user.role, "manager"), or(isNull(user.banned), eq(user.banned, false))));
  const to = [...new Set([c.checkout.requestedByEmail, ...managers.map((m) => m.email)])];
  const languageOf = new Map((await tx.select({ email: user.email, language: user.language }).from(user).where(inArray(user.email, to))).map((u) => [u.email, u.language]));
  const k = c.checkout;
  const plan = PLANS.find((p) => p.key === k.plan)?.name ?? k.plan;
  // each recipient reads the receipt in their own stored language (English for an address without an account)
  const textIn = (t: MailT, language: string | null | undefined) =>
    [
      t("hello"),
      "",
      t("receipt.intro", { org: c.orgName }),
      "",
      t("receipt.seatsAdded", { seats: k.seats }),
      t("receipt.seatsNow", { after: String(applied.seatsAfter ?? "—"), before: String(applied.seatsBefore ?? "—") }),
      t("receipt.amount", { total: formatMoney(k.amount, k.currency), currency: k.currency.toUpperCase(), seats: k.seats, unit: formatMoney(k.unitAmount, k.currency), plan }),
      t("receipt.date", { date: mailDate(language, k.paidAt ?? new Date()) }),
      t("receipt.number", { number: receiptNumber(applied.paymentEventId) }),
      t("receipt.reference", { reference: k.providerSessionId ?? "" }),
      t("receipt.boughtBy", { name: k.requestedByName, email: k.requestedByEmail }),
      "",
      t("receipt.link", { url: `${env.APP_URL}/team/billing` }),
      "",
      t("signature"),
    ].join("\n");
  for (const address of to) {
    const language = languageOf.get(address);
    const t = mailTranslator(language);
    await sendMail({ to: address, subject: t("receipt.subject", { seats: k.seats, org: c.orgName }), text: textIn(t, language), kind: "billing.receipt", key: `billing.receipt:${applied.paymentEventId}:${address}` }, tx);
  }
}
