import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PageTitle } from "@/components/ui/page-title";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("auth"))("signUpMeta") };
}

export default async function SignUpPage() {
  const t = await getTranslations("auth");
  return (
    <>
      <PageTitle title={t("signUpTitle")} lead={t("signUpLead")} />
      <SignUpForm />
    </>
  );
}
