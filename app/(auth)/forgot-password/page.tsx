import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/password-forms";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <PageTitle title="Reset your password" lead="We will mail you a link to choose a new one." />
      <ForgotPasswordForm />
    </>
  );
}
