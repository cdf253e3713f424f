import { useTranslations } from "next-intl";
import type { SeatSummary } from "@/lib/billing";
import { formatDay } from "./format";

function Figure({ label, value, detail, testId }: { label: string; value: number; detail?: string; testId: string }) {
  return (
    <div className="rounded border border-line bg-panel p-3 sm:p-4">
      <dt className="text-sm text-muted">{label}</dt>
      <dd className="mt-1">
        <span className="font-mono text-2xl sm:text-3xl" data-testid={testId}>
          {value}
        </span>
        {detail ? <span className="mt-1 block text-xs text-muted sm:text-sm">{detail}</span> : null}
      </dd>
    </div>
  );
}

/** Seats, seats in use and free seats, with the trial's state. */
export function SeatFigures({ s }: { s: SeatSummary }) {
  const t = useTranslations("billing");
  return (
    <section aria-labelledby="seats-h" className="flex flex-col gap-3">
      <h2 id="seats-h" className="text-2xl">
        {t("figures.seats")}
      </h2>
      <dl className="grid grid-cols-3 gap-2 sm:gap-3">
        <Figure label={t("figures.seats")} value={s.seats} testId="seats-total" detail={s.trial === "active" ? t("figures.trialIncluded") : undefined} />
        <Figure label={t("figures.used")} value={s.used} testId="seats-used" detail={t("figures.usedDetail", { members: s.members, pending: s.pending })} />
        <Figure label={t("figures.free")} value={s.free} testId="seats-free" detail={s.free === 0 ? t("figures.buyMore") : undefined} />
      </dl>
      {s.trial === "active" && s.trialEndsAt ? (
        <p className="max-w-prose rounded border border-water bg-water-light px-3 py-2" data-testid="trial-note">
          {t.rich("figures.trialActive", { date: formatDay(s.trialEndsAt), b: (c) => <strong>{c}</strong> })}
        </p>
      ) : null}
      {s.trial === "ended" && s.trialEndsAt ? (
        <p className="max-w-prose rounded border border-caution bg-caution-light px-3 py-2 text-caution" role="status" data-testid="trial-note">
          {t.rich("figures.trialEnded", { date: formatDay(s.trialEndsAt), b: (c) => <strong>{c}</strong> })}
        </p>
      ) : null}
      {s.used > s.seats ? (
        <p className="max-w-prose text-sm text-caution">
          {t("figures.over")}
        </p>
      ) : null}
    </section>
  );
}
