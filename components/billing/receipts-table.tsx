import { useTranslations } from "next-intl";
import { Table } from "@/components/ui/table";
import { formatMoney } from "@/lib/billing/browser";
import type { Receipt } from "@/lib/billing";
import { formatDayTime } from "./format";

/** Every payment that added seats, newest first. */
export function ReceiptsTable({ receipts }: { receipts: Receipt[] }) {
  const t = useTranslations("billing");
  return (
    <section aria-labelledby="receipts-h" className="flex flex-col gap-3">
      <h2 id="receipts-h" className="text-2xl">
        {t("receipts.heading")}
      </h2>
      {receipts.length === 0 ? (
        <p className="rounded border border-line bg-panel p-4" data-testid="receipts-empty">
          {t("receipts.none")}
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
                  {t.rich("receipts.card", { added: r.seatsAdded, before: r.seatsBefore ?? "?", after: r.seatsAfter ?? "?", mono: (x) => <span className="font-mono">{x}</span> })} · {formatDayTime(r.paidAt)}
                </p>
                <p className="text-sm text-muted">{t("receipts.boughtBy", { name: r.boughtBy })}</p>
                <p className="font-mono text-xs text-muted [overflow-wrap:anywhere]">{r.reference}</p>
              </li>
            ))}
          </ul>
          <Table
            className="hidden sm:block"
            label={t("receipts.label")}
            rows={receipts}
            rowKey={(r) => r.id}
            tableProps={{ "data-testid": "receipts" }}
            rowProps={(r) => ({ "data-testid": `receipt-${r.number}` })}
            columns={[
              { key: "date", header: t("receipts.date"), className: "whitespace-nowrap", cell: (r) => formatDayTime(r.paidAt) },
              {
                key: "receipt",
                header: t("receipts.receipt"),
                cell: (r) => (
                  <>
                    <span className="font-mono">{r.number}</span>
                    <span className="block max-w-48 font-mono text-xs break-all text-muted" title={r.reference}>
                      {r.reference}
                    </span>
                  </>
                ),
              },
              { key: "added", header: t("receipts.added"), headerClassName: "px-3 py-2 text-right align-bottom", className: "text-right font-mono", cell: (r) => `+${r.seatsAdded}` },
              { key: "before-after", header: t("receipts.beforeAfter"), headerClassName: "px-3 py-2 text-right align-bottom", className: "whitespace-nowrap text-right font-mono", cell: (r) => `${r.seatsBefore ?? "?"} → ${r.seatsAfter ?? "?"}` },
              {
                key: "amount",
                header: t("receipts.amount"),
                headerClassName: "px-3 py-2 text-right align-bottom",
                className: "whitespace-nowrap text-right font-mono",
                cell: (r) => (
                  <>
                    {formatMoney(r.amount, r.currency)} <span className="text-xs text-muted">{r.currency.toUpperCase()}</span>
                  </>
                ),
              },
              { key: "by", header: t("receipts.by"), cell: (r) => r.boughtBy },
            ]}
          />
        </>
      )}
    </section>
  );
}
