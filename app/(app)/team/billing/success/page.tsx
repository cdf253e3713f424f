import type { Metadata } from "next";
import Link from "next/link";
import { CheckoutStatus } from "@/components/billing/checkout-status";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { checkoutFor } from "@/lib/billing";
import { billingHref } from "@/lib/billing";

export const metadata: Metadata = { title: "Payment · Seats and billing" };

/** Where the payment page sends the buyer after paying. The seats come with the webhook, so this page waits for it. */
export default async function CheckoutSuccessPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("manager", "/team/billing/success");
  const id = (await searchParams).checkout;
  const found = typeof id === "string" ? await checkoutFor(viewer, id) : undefined;
  if (!found) {
    return (
      <>
        <PageTitle title="Payment" />
        <p className="max-w-prose">
          Riser has no checkout of your organization with this reference. If you paid, the seats appear on the <Link href="/team/billing">billing page</Link> as
          soon as the payment service confirms.
        </p>
      </>
    );
  }
  return (
    <>
      <PageTitle title={found.status === "paid" ? "Payment received" : "Payment"} lead={found.orgName} />
      <CheckoutStatus initial={found} billingHref={billingHref(viewer, found.orgId)} />
    </>
  );
}
