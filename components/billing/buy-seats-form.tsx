"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { formatMoney, quote, type PriceTier } from "@/lib/billing/browser";
import { checkoutInput, MAX_SEATS_PER_CHECKOUT } from "@/lib/billing/browser";

const seatsOnly = checkoutInput.pick({ seats: true });

/** A fresh key per purchase attempt (crypto.randomUUID needs a secure context; fall back to random bytes). */
function newKey(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, "0")).join("");
}

/**
 * Choose a seat count → the server starts a checkout → the browser goes to the payment page.
 * The idempotency key stays the same while the seat count does, so pressing the button again after
 * an error (or twice) resumes the same checkout instead of starting a second payment.
 */
export function BuySeatsForm({ plans, currency, org, enabled }: { plans: PriceTier[]; currency: string; org?: string; enabled: boolean }) {
  const [attempt, setAttempt] = useState<{ seats: number; key: string } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [leaving, setLeaving] = useState(false);
  const { register, handleSubmit, control, formState, setError } = useForm<z.input<typeof seatsOnly>, unknown, z.output<typeof seatsOnly>>({
    resolver: zodResolver(seatsOnly),
    defaultValues: { seats: 5 },
  });
  const seats = Number(useWatch({ control, name: "seats" }));
  // back from the payment page (the browser may restore this page as it was): the button works again
  useEffect(() => {
    const restored = (e: PageTransitionEvent) => e.persisted && setLeaving(false);
    window.addEventListener("pageshow", restored);
    return () => window.removeEventListener("pageshow", restored);
  }, []);
  const q = quote(seats, plans, currency);

  async function onSubmit(values: z.output<typeof seatsOnly>) {
    setProblem(null);
    const n = values.seats;
    const current = attempt && attempt.seats === n ? attempt : { seats: n, key: newKey() };
    setAttempt(current);
    const res = await postJson<{ url: string; checkoutId: string }>("/api/billing/checkout", { seats: n, idempotencyKey: current.key, ...(org ? { org } : {}) });
    if (!res.ok) {
      if (res.fieldErrors?.seats?.[0]) setError("seats", { message: res.fieldErrors.seats[0] });
      else setProblem(res.status === 0 ? "No connection to Riser. Nothing was charged and no seats were added; check the network and press the button again." : res.error);
      // a purchase that is already finished cannot be resumed: the next press starts a new one
      if (res.status === 409) setAttempt(null);
      return;
    }
    setLeaving(true);
    window.location.assign(res.data.url);
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-xl flex-col gap-4 rounded border border-line bg-panel p-4" aria-labelledby="buy-h">
      <ErrorSummary control={control} />
      <h2 id="buy-h" className="text-2xl">
        Buy seats
      </h2>
      <Field
        label="Seats to add"
        type="number"
        inputMode="numeric"
        min={1}
        max={MAX_SEATS_PER_CHECKOUT}
        step={1}
        hint={`From 1 to ${MAX_SEATS_PER_CHECKOUT} in one purchase. One seat is one person in your organization, managers included.`}
        error={formState.errors.seats?.message}
        className="max-w-40 font-mono"
        {...register("seats")}
      />
      <p className="text-lg" aria-live="polite" data-testid="quote">
        {q ? (
          <>
            <span className="font-mono">{q.seats}</span> × <span className="font-mono">{formatMoney(q.unitAmount, currency)}</span> ({q.plan.name}) ={" "}
            <strong className="font-mono">{formatMoney(q.amount, currency)}</strong> <span className="text-sm text-muted">{currency.toUpperCase()}</span>
          </>
        ) : (
          <span className="text-muted">Enter a number of seats to see the price.</span>
        )}
      </p>
      <FormError message={problem} />
      {enabled ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" disabled={formState.isSubmitting || leaving}>
            {leaving ? "Opening the payment page…" : formState.isSubmitting ? "Starting checkout…" : "Continue to payment"}
          </Button>
        </div>
      ) : (
        <p className="rounded border border-caution bg-caution-light px-3 py-2 text-caution">Buying seats is switched off on this Riser instance: no payment service is configured.</p>
      )}
      <p className="text-sm text-muted">
        You pay on the payment service&apos;s page. Seats are added when it confirms the payment, usually within seconds; a receipt is mailed to your
        organization&apos;s managers.
      </p>
    </form>
  );
}
