"use client";
import { useTranslations } from "next-intl";
import { useFieldError, useTranslatedResolver } from "@/components/team/use-field-error";
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
  const t = useTranslations("billing");
  const tr = useFieldError();
  const [attempt, setAttempt] = useState<{ seats: number; key: string } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [leaving, setLeaving] = useState(false);
  const { register, handleSubmit, control, formState, setError } = useForm<z.input<typeof seatsOnly>, unknown, z.output<typeof seatsOnly>>({
    resolver: useTranslatedResolver(zodResolver(seatsOnly)),
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
      if (res.fieldErrors?.seats?.[0]) setError("seats", { message: tr(res.fieldErrors.seats[0]) ?? res.fieldErrors.seats[0] });
      else setProblem(res.status === 0 ? t("buy.offline") : (tr(res.error) ?? res.error));
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
        {t("buy.heading")}
      </h2>
      <Field
        label={t("buy.seats")}
        type="number"
        inputMode="numeric"
        min={1}
        max={MAX_SEATS_PER_CHECKOUT}
        step={1}
        hint={t("buy.hint", { max: MAX_SEATS_PER_CHECKOUT })}
        error={formState.errors.seats?.message}
        className="max-w-40 font-mono"
        {...register("seats")}
      />
      <p className="text-lg" aria-live="polite" data-testid="quote">
        {q ? (
          <>
            {t.rich("buy.quote", { seats: q.seats, unit: formatMoney(q.unitAmount, currency), plan: q.plan.name, amount: formatMoney(q.amount, currency), mono: (x) => <span className="font-mono">{x}</span>, b: (x) => <strong className="font-mono">{x}</strong> })}{" "}
            <span className="text-sm text-muted">{currency.toUpperCase()}</span>
          </>
        ) : (
          <span className="text-muted">{t("buy.enter")}</span>
        )}
      </p>
      <FormError message={problem} />
      {enabled ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" disabled={formState.isSubmitting || leaving}>
            {leaving ? t("buy.opening") : formState.isSubmitting ? t("buy.starting") : t("continue")}
          </Button>
        </div>
      ) : (
        <p className="rounded border border-caution bg-caution-light px-3 py-2 text-caution">{t("buy.off")}</p>
      )}
      <p className="text-sm text-muted">
        {t("buy.note")}
      </p>
    </form>
  );
}
