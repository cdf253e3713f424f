import { assertSameOrigin } from "@/lib/admin";
import { clientIp, json, readJson, route } from "@/lib/api";
import { startCheckout } from "@/lib/billing";
import { checkoutInput } from "@/lib/billing";

/**
 * POST /api/billing/checkout { seats, idempotencyKey, org? } → { checkoutId, url }: the payment
 * page to send the manager to. The same idempotencyKey again returns the same checkout (never a
 * second charge). Seats are added later, only by the provider's signed webhook.
 */
export const POST = route("manager", async ({ req, viewer }) => {
  assertSameOrigin(req);
  const input = await readJson(req, checkoutInput);
  const started = await startCheckout(viewer, input, clientIp(req));
  return json(started, started.reused ? 200 : 201);
});
