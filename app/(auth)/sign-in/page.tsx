import type { Metadata } from "next";
import { Suspense } from "react";
import { SignInForm } from "@/components/auth/sign-in-form";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Sign in" };

export default function SignInPage() {
  return (
    <>
      <PageTitle title="Sign in" lead="Pick up your training where you left it." />
      <Suspense>
        <SignInForm />
      </Suspense>
    </>
  );
}
