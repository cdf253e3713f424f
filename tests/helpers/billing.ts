/** Helpers for the seat-purchase tests: the local payments fake and signed webhook events. */
import { randomUUID } from "node:crypto";
import Stripe from "stripe";
import { APP } from "./http";

export const FAKE = `http://127.0.0.1:${process.env.STRIPE_API_PORT ?? "12121"}`;
const SECRET = process.env.STRIPE_WEBHOOK_SECRET ?? "";

export type FakeSession = Record<string, unknown> & { id: string; amount_total: number; currency: string; client_reference_id: string; metadata: Record<string, string> };
export type FakeEvent = { id: string; type: string; sessionId: string; payload: Record<string, unknown> & { id: string }; deliveries: { status: number }[] };

export async function fakeSessions(checkoutId: string): Promise<FakeSession[]> {
  return (await fetch(`${FAKE}/_fake/sessions?client_reference_id=${checkoutId}`)).json();
}

export async function fakeEvents(sessionId: string): Promise<FakeEvent[]> {
  return (await fetch(`${FAKE}/_fake/events?session=${sessionId}`)).json();
}

/** Presses "Pay" or "Decline" on the fake's checkout page, as the browser's form does. */
export async function pressOnPayPage(payUrl: string, action: "pay" | "decline"): Promise<Response> {
  const html = await (await fetch(payUrl)).text();
  const m = html.match(new RegExp(`<form method="post" action="([^"]+/${action})"`));
  if (!m) throw new Error(`no ${action} form on ${payUrl}:\n${html}`);
  return fetch(new URL(m[1]!, payUrl), { method: "POST", redirect: "manual" });
}

/** An event shaped like the provider's, around a session object. */
export function sessionEvent(type: string, session: Record<string, unknown>, id = `evt_test_${randomUUID().replace(/-/g, "")}`) {
  return { id, object: "event", api_version: "2026-10-28.endive", created: Math.floor(Date.now() / 1000), data: { object: session }, livemode: false, pending_webhooks: 1, request: { id: null, idempotency_key: null }, type };
}

/** Posts a body to the app's webhook, signed with the endpoint secret (or another secret, or none). */
export async function postWebhook(body: unknown, opts: { secret?: string | null; timestamp?: number; raw?: string } = {}) {
  const payload = opts.raw ?? JSON.stringify(body, null, 2);
  const secret = opts.secret === undefined ? SECRET : opts.secret;
  const headers: Record<string, string> = { "content-type": "application/json" };
  if (secret) headers["stripe-signature"] = Stripe.webhooks.generateTestHeaderString({ payload: JSON.stringify(body, null, 2), secret, timestamp: opts.timestamp });
  const res = await fetch(`${APP}/api/billing/webhook`, { method: "POST", headers, body: payload });
  return { status: res.status, json: (await res.json().catch(() => ({}))) as Record<string, unknown> };
}

export async function until<T>(fn: () => Promise<T | null | undefined | false>, ms = 15_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error(`condition not met within ${ms} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

export const newKey = () => randomUUID();
