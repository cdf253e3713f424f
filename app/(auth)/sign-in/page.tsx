import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import { Suspense } from "react";
import { SignInForm } from "@/components/auth/sign-in-form";
import { PageTitle } from "@/components/ui/page-title";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("auth"))("signIn") };
}

export default async function SignInPage() {
  const t = await getTranslations("auth");
  return (
    <>
      <PageTitle title={t("signIn")} lead={t("signInLead")} />
      <Suspense>
        <SignInForm />
      </Suspense>
    </>
  );
}
