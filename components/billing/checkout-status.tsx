"use client";
import { useTranslations } from "next-intl";
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
  const tt = useTranslations("billing");
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

  if (c.status === "paid") {
    return (
      <div className="flex max-w-prose flex-col gap-3 rounded border border-pass bg-pass-light p-4" role="status" data-testid="checkout-paid">
        <p className="text-xl font-bold text-pass">
          {tt("status.paid", { seats: c.seats })}
        </p>
        <p>
          {tt.rich("status.paidBody", { org: c.orgName, seats: c.seatsNow, amount: formatMoney(c.amount, c.currency), b: (x) => <strong className="font-mono">{x}</strong> })}
        </p>
        <p>
          <Link href={billingHref}>{tt("back")}</Link>
        </p>
      </div>
    );
  }
  if (c.status === "expired" || c.status === "failed") {
    return (
      <div className="flex max-w-prose flex-col gap-3 rounded border border-caution bg-caution-light p-4" role="status" data-testid="checkout-ended">
        <p className="text-xl font-bold text-caution">{c.status === "failed" ? tt("status.failed") : tt("status.expired")}</p>
        <p>{tt("status.nothingCharged")}</p>
        <p>
          {tt.rich("status.tryAgain", { link: (x) => <Link href={billingHref}>{x}</Link> })}
        </p>
      </div>
    );
  }
  return (
    <div className="flex max-w-prose flex-col gap-3 rounded border border-water bg-water-light p-4" role="status" aria-live="polite" data-testid="checkout-waiting">
      <p className="text-xl font-bold">{tt("status.waiting")}</p>
      <p>
        {tt("status.waitingBody", { seats: c.seats, amount: formatMoney(c.amount, c.currency) })}
      </p>
      {error ? <p className="text-caution">{tt("status.checkFailed", { message: error.message })}</p> : null}
      {gaveUp ? (
        <p className="font-bold">
          {tt.rich("status.gaveUp", { link: (x) => <Link href={billingHref}>{x}</Link> })}
        </p>
      ) : null}
    </div>
  );
}
