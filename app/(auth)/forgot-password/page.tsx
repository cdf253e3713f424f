import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { ForgotPasswordForm } from "@/components/auth/password-forms";
import { PageTitle } from "@/components/ui/page-title";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("auth"))("forgotMeta") };
}

export default async function ForgotPasswordPage() {
  const t = await getTranslations("auth");
  return (
    <>
      <PageTitle title={t("forgotTitle")} lead={t("forgotLead")} />
      <ForgotPasswordForm />
    </>
  );
}
