import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { VerifyForm } from "@/components/certificates/verify-form";
import { PageTitle } from "@/components/ui/page-title";
import { parseVerifyInput, verifyPathSegment, VERIFY_INPUT_ERROR } from "@/lib/certificates";

export const metadata: Metadata = { title: "Check a certificate" };

/** Public: type a certificate's code or serial to check it (the QR code on the certificate opens the result directly). */
export default async function VerifyPage({ searchParams }: { searchParams: Promise<{ code?: string | string[] }> }) {
  const { code } = await searchParams;
  const typed = typeof code === "string" ? code : undefined;
  let error: string | undefined;
  if (typed?.trim()) {
    const found = parseVerifyInput(typed);
    if (found) redirect(`/verify/${encodeURIComponent(verifyPathSegment(found))}`);
    error = VERIFY_INPUT_ERROR;
  }
  return (
    <>
      <PageTitle
        title="Check a certificate"
        lead="Builders, inspectors and licensing bodies can confirm that a Riser certificate is genuine and whether it is still valid. You need no account."
      />
      <VerifyForm initial={typed} serverError={error} />
      <p className="mt-6 max-w-prose text-sm text-muted">
        The check shows the holder&apos;s name, what was completed, the continuing-education hours, the dates and the status. It shows
        nothing else about the holder.
      </p>
    </>
  );
}
