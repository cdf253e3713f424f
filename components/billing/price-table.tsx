import { formatMoney, type PriceTier } from "@/lib/billing/browser";

/** The price per seat by purchase size. */
export function PriceTable({ plans, currency }: { plans: PriceTier[]; currency: string }) {
  return (
    <div className="overflow-x-auto rounded border border-line bg-panel">
      <table className="w-full border-collapse text-left text-sm" data-testid="price-table">
        <caption className="px-3 py-2 text-left font-bold">Price per seat ({currency.toUpperCase()}, one-time)</caption>
        <thead>
          <tr className="border-b border-line bg-paper">
            <th scope="col" className="px-3 py-2">
              Plan
            </th>
            <th scope="col" className="px-3 py-2">
              Seats in one purchase
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Per seat
            </th>
          </tr>
        </thead>
        <tbody>
          {plans.map((p) => (
            <tr key={p.key} className="border-b border-line last:border-b-0">
              <td className="px-3 py-2">{p.name}</td>
              <td className="px-3 py-2 font-mono">
                {p.minSeats}–{p.maxSeats}
              </td>
              <td className="px-3 py-2 text-right font-mono">{formatMoney(p.unitAmount, currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
