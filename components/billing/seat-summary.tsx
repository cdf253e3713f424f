import type { SeatSummary } from "@/lib/billing";
import { formatDay, plural } from "./format";

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
  return (
    <section aria-labelledby="seats-h" className="flex flex-col gap-3">
      <h2 id="seats-h" className="text-2xl">
        Seats
      </h2>
      <dl className="grid grid-cols-3 gap-2 sm:gap-3">
        <Figure label="Seats" value={s.seats} testId="seats-total" detail={s.trial === "active" ? "trial seats included" : undefined} />
        <Figure label="In use" value={s.used} testId="seats-used" detail={`${plural(s.members, "person", "people")}, ${plural(s.pending, "open invitation")}`} />
        <Figure label="Free" value={s.free} testId="seats-free" detail={s.free === 0 ? "buy seats to invite more" : undefined} />
      </dl>
      {s.trial === "active" && s.trialEndsAt ? (
        <p className="max-w-prose rounded border border-water bg-water-light px-3 py-2" data-testid="trial-note">
          Your organization is on its trial until <strong>{formatDay(s.trialEndsAt)}</strong>. Buying seats ends the trial, and the trial&apos;s seats stay with
          your organization.
        </p>
      ) : null}
      {s.trial === "ended" && s.trialEndsAt ? (
        <p className="max-w-prose rounded border border-caution bg-caution-light px-3 py-2 text-caution" role="status" data-testid="trial-note">
          The trial ended on <strong>{formatDay(s.trialEndsAt)}</strong>. Everyone already in keeps access; buy seats to invite more people.
        </p>
      ) : null}
      {s.used > s.seats ? (
        <p className="max-w-prose text-sm text-caution">
          More seats are in use than your organization has. Nobody loses access, but new invitations wait until there are free seats.
        </p>
      ) : null}
    </section>
  );
}
