import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { redirect } from "next/navigation";
import { VerifyForm } from "@/components/certificates/verify-form";
import { PageTitle } from "@/components/ui/page-title";
import { parseVerifyInput, verifyPathSegment, VERIFY_INPUT_ERROR } from "@/lib/certificates";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("verify"))("title") };
}

/** Public: type a certificate's code or serial to check it (the QR code on the certificate opens the result directly). */
export default async function VerifyPage({ searchParams }: { searchParams: Promise<{ code?: string | string[] }> }) {
  const { code } = await searchParams;
  const t = await getTranslations("verify");
  const typed = typeof code === "string" ? code : undefined;
  let error: string | undefined;
  if (typed?.trim()) {
    const found = parseVerifyInput(typed);
    if (found) redirect(`/verify/${encodeURIComponent(verifyPathSegment(found))}`);
    // the form shows it in the reader's language (errors catalog)
    error = VERIFY_INPUT_ERROR;
  }
  return (
    <>
      <PageTitle title={t("title")} lead={t("lead")} />
      <VerifyForm initial={typed} serverError={error} />
      <p className="mt-6 max-w-prose text-sm text-muted">{t("whatItShows")}</p>
    </>
  );
}
