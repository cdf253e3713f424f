import { formatMoney } from "@/lib/billing/browser";
import type { Receipt } from "@/lib/billing";
import { formatDayTime } from "./format";

/** Every payment that added seats, newest first. */
export function ReceiptsTable({ receipts }: { receipts: Receipt[] }) {
  return (
    <section aria-labelledby="receipts-h" className="flex flex-col gap-3">
      <h2 id="receipts-h" className="text-2xl">
        Receipts
      </h2>
      {receipts.length === 0 ? (
        <p className="rounded border border-line bg-panel p-4" data-testid="receipts-empty">
          No payments yet. Receipts appear here as soon as the payment service confirms a purchase.
        </p>
      ) : (
        <>
          {/* phones: one card per receipt */}
          <ul className="flex flex-col gap-2 sm:hidden" data-testid="receipts-list">
            {receipts.map((r) => (
              <li key={r.id} className="rounded border border-line bg-panel p-3">
                <p className="flex flex-wrap items-baseline justify-between gap-2">
                  <span className="font-mono font-bold">{r.number}</span>
                  <span className="font-mono">{formatMoney(r.amount, r.currency)} {r.currency.toUpperCase()}</span>
                </p>
                <p className="text-sm">
                  <span className="font-mono">+{r.seatsAdded}</span> seats ({r.seatsBefore ?? "?"} → {r.seatsAfter ?? "?"}) · {formatDayTime(r.paidAt)}
                </p>
                <p className="text-sm text-muted">Bought by {r.boughtBy}</p>
                <p className="font-mono text-xs text-muted [overflow-wrap:anywhere]">{r.reference}</p>
              </li>
            ))}
          </ul>
          <div className="hidden overflow-x-auto rounded border border-line bg-panel sm:block">
            <table className="w-full border-collapse text-left text-sm" data-testid="receipts">
              <caption className="sr-only">Payments for seats, newest first</caption>
              <thead>
                <tr className="border-b border-line bg-paper">
                  <th scope="col" className="px-3 py-2">
                    Date
                  </th>
                  <th scope="col" className="px-3 py-2">
                    Receipt
                  </th>
                  <th scope="col" className="px-3 py-2 text-right">
                    Seats added
                  </th>
                  <th scope="col" className="px-3 py-2 text-right">
                    Seats before → after
                  </th>
                  <th scope="col" className="px-3 py-2 text-right">
                    Amount
                  </th>
                  <th scope="col" className="px-3 py-2">
                    Bought by
                  </th>
                </tr>
              </thead>
              <tbody>
                {receipts.map((r) => (
                  <tr key={r.id} className="border-b border-line last:border-b-0" data-testid={`receipt-${r.number}`}>
                    <td className="whitespace-nowrap px-3 py-2">{formatDayTime(r.paidAt)}</td>
                    <td className="px-3 py-2">
                      <span className="font-mono">{r.number}</span>
                      <span className="block max-w-48 truncate font-mono text-xs text-muted" title={r.reference}>
                        {r.reference}
                      </span>
                    </td>
                    <td className="px-3 py-2 text-right font-mono">+{r.seatsAdded}</td>
                    <td className="whitespace-nowrap px-3 py-2 text-right font-mono">
                      {r.seatsBefore ?? "?"} → {r.seatsAfter ?? "?"}
                    </td>
                    <td className="whitespace-nowrap px-3 py-2 text-right font-mono">
                      {formatMoney(r.amount, r.currency)} <span className="text-xs text-muted">{r.currency.toUpperCase()}</span>
                    </td>
                    <td className="px-3 py-2">{r.boughtBy}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </section>
  );
}
