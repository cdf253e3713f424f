import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { ResetPasswordForm } from "@/components/auth/password-forms";
import { resetTokenHasSecondFactor } from "@/lib/auth";
import { PageTitle } from "@/components/ui/page-title";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("auth"))("resetTitle") };
}

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string; confirmed?: string }> }) {
  const { token, error, confirmed } = await searchParams;
  const t = await getTranslations("auth");
  const hasSecondFactor = !error && (await resetTokenHasSecondFactor(token));
  return (
    <>
      <PageTitle title={t("resetTitle")} />
      {confirmed && !error ? (
        // an e-mail confirmed from another browser than the sign-up's: the owner of the address chooses the password
        <p role="status" className="mb-4 max-w-md rounded border-l-4 border-water bg-water-light p-3">
          {t("confirmedElsewhere")}
        </p>
      ) : null}
      <ResetPasswordForm token={error ? null : (token ?? null)} hasSecondFactor={hasSecondFactor} />
    </>
  );
}
