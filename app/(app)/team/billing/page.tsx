import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import Link from "next/link";
import { BuySeatsForm } from "@/components/billing/buy-seats-form";
import { formatDayTime } from "@/components/billing/format";
import { PriceTable } from "@/components/billing/price-table";
import { ReceiptsTable } from "@/components/billing/receipts-table";
import { SeatFigures } from "@/components/billing/seat-summary";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { billingOverview, paymentsConfigured } from "@/lib/billing";
import { billingPageScope } from "@/lib/billing";
import { formatMoney } from "@/lib/billing";
import { AllOrganizations } from "@/components/billing/all-organizations";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("billing");
  return { title: t("title") };
}

/** Admins without ?org=: every organization's seats, each linking to its billing page. */
export default async function BillingPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("manager", "/team/billing");
  const t = await getTranslations("billing");
  const scope = await billingPageScope(viewer, (await searchParams).org);
  if (!scope.orgId || !scope.orgName) return <AllOrganizations />;
  const o = await billingOverview(scope.orgId, scope.orgName);
  const unfinished = o.checkouts;

  return (
    <>
      <PageTitle
        title={t("title")}
        lead={t("lead", { org: o.orgName })}
      >
        {viewer.role === "admin" ? <Link href="/team/billing">{t("allOrgs")}</Link> : null}
      </PageTitle>
      <div className="flex flex-col gap-10">
        <SeatFigures s={o} />
        <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <BuySeatsForm plans={o.plans} currency={o.currency} org={viewer.role === "admin" ? o.orgId : undefined} enabled={paymentsConfigured()} />
          <PriceTable plans={o.plans} currency={o.currency} />
        </div>
        {unfinished.length ? (
          <section aria-labelledby="unfinished-h" className="flex flex-col gap-3">
            <h2 id="unfinished-h" className="text-2xl">
              {t("unpaid")}
            </h2>
            <p className="max-w-prose text-sm text-muted">{t("unpaidNote")}</p>
            <ul className="flex flex-col gap-2" data-testid="unfinished-checkouts">
              {unfinished.map((c) => (
                <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 rounded border border-line bg-panel px-3 py-2">
                  <span>
                    {formatDayTime(c.createdAt)} · {t("seats", { count: c.seats })} · <span className="font-mono">{formatMoney(c.amount, c.currency)}</span> · {c.boughtBy}
                  </span>
                  <span className="flex items-center gap-3">
                    <span className="text-sm font-bold">{t(`checkoutStatus.${c.status}`)}</span>
                    {c.payUrl ? <a href={c.payUrl}>{t("continue")}</a> : null}
                  </span>
                </li>
              ))}
            </ul>
          </section>
        ) : null}
        <ReceiptsTable receipts={o.receipts} />
      </div>
    </>
  );
}
