import { Table } from "@/components/ui/table";
import { formatMoney, type PriceTier } from "@/lib/billing/browser";

/** The price per seat by purchase size. */
export function PriceTable({ plans, currency }: { plans: PriceTier[]; currency: string }) {
  return (
    <Table
      label="Price per seat"
      caption={`Price per seat (${currency.toUpperCase()}, one-time)`}
      captionVisible
      rows={plans}
      rowKey={(p) => p.key}
      tableProps={{ "data-testid": "price-table" }}
      columns={[
        { key: "plan", header: "Plan", cell: (p) => p.name },
        { key: "seats", header: "Seats in one purchase", className: "font-mono", cell: (p) => `${p.minSeats}–${p.maxSeats}` },
        { key: "per-seat", header: "Per seat", className: "text-right font-mono", headerClassName: "px-3 py-2 text-right align-bottom", cell: (p) => formatMoney(p.unitAmount, currency) },
      ]}
    />
  );
}
