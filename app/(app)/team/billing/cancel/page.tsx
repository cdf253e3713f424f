import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { checkoutFor } from "@/lib/billing";
import { billingHref } from "@/lib/billing";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("billing");
  return { title: `${t("cancelled")} · ${t("title")}` };
}

/** Where the payment page sends the buyer who declined or came back without paying. */
export default async function CheckoutCancelPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("manager", "/team/billing/cancel");
  const t = await getTranslations("billing");
  const id = (await searchParams).checkout;
  const found = typeof id === "string" ? await checkoutFor(viewer, id) : undefined;
  const back = found ? billingHref(viewer, found.orgId) : "/team/billing";
  if (found?.status === "paid") {
    return (
      <>
        <PageTitle title={t("alreadyPaid")} />
        <p className="max-w-prose">
          {t.rich("alreadyPaidBody", { seats: found.seats, link: (c) => <Link href={back}>{c}</Link> })}
        </p>
      </>
    );
  }
  return (
    <>
      <PageTitle title={t("cancelled")} />
      <div className="flex max-w-prose flex-col gap-3" data-testid="checkout-cancelled">
        <p className="text-lg">{t("cancelledBody")}</p>
        {found?.payUrl ? (
          <p>
            {t.rich("changedMind", { seats: found.seats, link: (c) => <a href={found.payUrl!}>{c}</a> })}
          </p>
        ) : null}
        <p>
          <Link href={back}>{t("back")}</Link>
        </p>
      </div>
    </>
  );
}
