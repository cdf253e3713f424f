import { useTranslations } from "next-intl";
import { Table } from "@/components/ui/table";
import { formatMoney, type PriceTier } from "@/lib/billing/browser";

/** The price per seat by purchase size. */
export function PriceTable({ plans, currency }: { plans: PriceTier[]; currency: string }) {
  const t = useTranslations("billing");
  return (
    <Table
      label={t("price.label")}
      caption={t("price.caption", { currency: currency.toUpperCase() })}
      captionVisible
      rows={plans}
      rowKey={(p) => p.key}
      tableProps={{ "data-testid": "price-table" }}
      columns={[
        { key: "plan", header: t("price.plan"), cell: (p) => p.name },
        { key: "seats", header: t("price.seats"), className: "font-mono", cell: (p) => `${p.minSeats}–${p.maxSeats}` },
        { key: "per-seat", header: t("price.perSeat"), className: "text-right font-mono", headerClassName: "px-3 py-2 text-right align-bottom", cell: (p) => formatMoney(p.unitAmount, currency) },
      ]}
    />
  );
}
