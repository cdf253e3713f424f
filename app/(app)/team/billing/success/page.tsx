import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import Link from "next/link";
import { CheckoutStatus } from "@/components/billing/checkout-status";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { checkoutFor } from "@/lib/billing";
import { billingHref } from "@/lib/billing";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("billing");
  return { title: `${t("payment")} · ${t("title")}` };
}

/** Where the payment page sends the buyer after paying. The seats come with the webhook, so this page waits for it. */
export default async function CheckoutSuccessPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("manager", "/team/billing/success");
  const t = await getTranslations("billing");
  const id = (await searchParams).checkout;
  const found = typeof id === "string" ? await checkoutFor(viewer, id) : undefined;
  if (!found) {
    return (
      <>
        <PageTitle title={t("payment")} />
        <p className="max-w-prose">
          {t.rich("noCheckout", { link: (c) => <Link href="/team/billing">{c}</Link> })}
        </p>
      </>
    );
  }
  return (
    <>
      <PageTitle title={found.status === "paid" ? t("received") : t("payment")} lead={found.orgName} />
      <CheckoutStatus initial={found} billingHref={billingHref(viewer, found.orgId)} />
    </>
  );
}
