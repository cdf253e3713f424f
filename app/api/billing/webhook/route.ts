import { ApiError, json, route } from "@/lib/api";
import { log } from "@/lib/log";
import { isSignatureError, processPaymentEvent, verifyWebhook } from "@/lib/billing";
import { env } from "@/lib/env";

const MAX_BYTES = 512 * 1024;

/**
 * POST /api/billing/webhook — the payment provider's signed events. Public (the provider has no
 * session), so the signature over the raw body is the only proof: a bad or missing one → 400 and
 * nothing changes. Unknown organization → logged, 200 (so the provider stops retrying), nothing
 * changes. Processing is idempotent per event id (lib/billing/webhook.ts).
 */
export const POST = route("public", async ({ req }) => {
  if (!env.STRIPE_WEBHOOK_SECRET) throw new ApiError(503, "Payment webhooks are not configured on this Riser instance.");
  const raw = await req.text();
  if (raw.length > MAX_BYTES) throw new ApiError(413, "This webhook body is too large.");
  let event;
  try {
    event = verifyWebhook(raw, req.headers.get("stripe-signature"), env.STRIPE_WEBHOOK_SECRET);
  } catch (err) {
    if (isSignatureError(err) || err instanceof SyntaxError) {
      log().warn({ error: err instanceof Error ? err.message.split("\n")[0] : "bad signature" }, "payment webhook refused");
      throw new ApiError(400, "The webhook signature does not match. Nothing was changed.");
    }
    throw err;
  }
  const result = await processPaymentEvent(event);
  return json({ received: true, ...result });
});
