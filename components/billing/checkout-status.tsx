"use client";
import Link from "next/link";
import { useEffect, useState } from "react";
import useSWR from "swr";
import { getJson } from "@/lib/fetcher";
import { formatMoney } from "@/lib/billing/browser";
import type { CheckoutSummary } from "@/lib/billing";

type Status = CheckoutSummary & { seatsNow: number; orgName: string };
const FINAL = new Set(["paid", "expired", "failed"]);
const GIVE_UP_MS = 90_000;

/**
 * The result of a checkout after the payment page: polls until the provider's webhook has been
 * processed (seats are added only then), or says plainly that it is still waiting.
 */
export function CheckoutStatus({ initial, billingHref }: { initial: Status; billingHref: string }) {
  const [since] = useState(() => Date.now());
  const [gaveUp, setGaveUp] = useState(false);
  const done = FINAL.has(initial.status);
  const { data, error } = useSWR<Status>(done ? null : `/api/billing/checkout/${initial.id}`, getJson, {
    fallbackData: initial,
    refreshInterval: (d) => (d && FINAL.has(d.status)) || gaveUp ? 0 : 1500,
  });
  const c = data ?? initial;
  useEffect(() => {
    if (FINAL.has(c.status)) return;
    const t = setTimeout(() => setGaveUp(true), Math.max(0, GIVE_UP_MS - (Date.now() - since)));
    return () => clearTimeout(t);
  }, [c.status, since]);

  const s = c.seats === 1 ? "" : "s";
  if (c.status === "paid") {
    return (
      <div className="flex max-w-prose flex-col gap-3 rounded border border-pass bg-pass-light p-4" role="status" data-testid="checkout-paid">
        <p className="text-xl font-bold text-pass">
          Payment received: {c.seats} seat{s} added.
        </p>
        <p>
          {c.orgName} now has <strong className="font-mono">{c.seatsNow}</strong> seats. You paid {formatMoney(c.amount, c.currency)}; the receipt is on the billing
          page and in your mail.
        </p>
        <p>
          <Link href={billingHref}>Back to seats and billing</Link>
        </p>
      </div>
    );
  }
  if (c.status === "expired" || c.status === "failed") {
    return (
      <div className="flex max-w-prose flex-col gap-3 rounded border border-caution bg-caution-light p-4" role="status" data-testid="checkout-ended">
        <p className="text-xl font-bold text-caution">{c.status === "failed" ? "The payment failed." : "This checkout ended without payment."}</p>
        <p>Nothing was charged and no seats were added.</p>
        <p>
          <Link href={billingHref}>Back to seats and billing</Link> to try again.
        </p>
      </div>
    );
  }
  return (
    <div className="flex max-w-prose flex-col gap-3 rounded border border-water bg-water-light p-4" role="status" aria-live="polite" data-testid="checkout-waiting">
      <p className="text-xl font-bold">Waiting for the payment service to confirm…</p>
      <p>
        Seats are added only when the payment service confirms the payment of {c.seats} seat{s} ({formatMoney(c.amount, c.currency)}). This usually takes a few
        seconds; this page updates by itself.
      </p>
      {error ? <p className="text-caution">Riser could not check the status just now ({error.message}). It keeps trying.</p> : null}
      {gaveUp ? (
        <p className="font-bold">
          Still no confirmation. If you paid, the seats appear as soon as it arrives, and you will get a receipt by mail; nothing is charged twice. Check the{" "}
          <Link href={billingHref}>billing page</Link> later.
        </p>
      ) : null}
    </div>
  );
}
