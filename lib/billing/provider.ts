import "server-only";
import Stripe from "stripe";
import { env } from "@/lib/env";

/**
 * The payment provider's SDK client, made once. Configuration only decides where it talks: the
 * scripts set STRIPE_API_HOST/PORT/PROTOCOL to the local fake (scripts/payments-fake.mjs); with a
 * real key and none of the overrides the SDK uses the real service. Retries reuse the request's
 * idempotency key, so a retried create never makes a second checkout.
 */
let client: Stripe | null = null;

export function paymentsConfigured(): boolean {
  return Boolean(env.STRIPE_SECRET_KEY);
}

export function paymentProvider(): Stripe | null {
  if (!env.STRIPE_SECRET_KEY) return null;
  client ??= new Stripe(env.STRIPE_SECRET_KEY, {
    ...(env.STRIPE_API_HOST ? { host: env.STRIPE_API_HOST } : {}),
    ...(env.STRIPE_API_PORT ? { port: env.STRIPE_API_PORT } : {}),
    ...(env.STRIPE_API_PROTOCOL ? { protocol: env.STRIPE_API_PROTOCOL } : {}),
    maxNetworkRetries: 2,
    timeout: 15_000,
    telemetry: false,
    appInfo: { name: "Riser" },
  });
  return client;
}

/** Verifies the signature over the raw body and returns the event; throws on a bad signature. */
export function verifyWebhook(rawBody: string, signature: string | null, secret: string): Stripe.Event {
  return Stripe.webhooks.constructEvent(rawBody, signature ?? "", secret);
}

/** True for "could not reach the provider" (network, DNS, timeout, provider down). */
export function isProviderUnreachable(err: unknown): boolean {
  return err instanceof Stripe.errors.StripeConnectionError || (err instanceof Stripe.errors.StripeAPIError && (err.statusCode ?? 500) >= 500);
}

export function isSignatureError(err: unknown): boolean {
  return err instanceof Stripe.errors.StripeSignatureVerificationError;
}

export type ProviderEvent = Stripe.Event;
export type ProviderSession = Stripe.Checkout.Session;
