import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { checkoutFor } from "@/lib/billing";
import { billingHref } from "@/lib/billing";

export const metadata: Metadata = { title: "Checkout cancelled · Seats and billing" };

/** Where the payment page sends the buyer who declined or came back without paying. */
export default async function CheckoutCancelPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("manager", "/team/billing/cancel");
  const id = (await searchParams).checkout;
  const found = typeof id === "string" ? await checkoutFor(viewer, id) : undefined;
  const back = found ? billingHref(viewer, found.orgId) : "/team/billing";
  if (found?.status === "paid") {
    return (
      <>
        <PageTitle title="Already paid" />
        <p className="max-w-prose">
          This purchase of {found.seats} seats is paid and its seats were added. <Link href={back}>See seats and receipts</Link>.
        </p>
      </>
    );
  }
  return (
    <>
      <PageTitle title="Checkout cancelled" />
      <div className="flex max-w-prose flex-col gap-3" data-testid="checkout-cancelled">
        <p className="text-lg">You left the payment page without paying. Nothing was charged and no seats were added.</p>
        {found?.payUrl ? (
          <p>
            Changed your mind? <a href={found.payUrl}>Return to the payment page</a> for the same {found.seats} seats.
          </p>
        ) : null}
        <p>
          <Link href={back}>Back to seats and billing</Link>
        </p>
      </div>
    </>
  );
}
