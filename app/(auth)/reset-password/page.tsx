import type { Metadata } from "next";
import { ResetPasswordForm } from "@/components/auth/password-forms";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string }> }) {
  const { token, error } = await searchParams;
  return (
    <>
      <PageTitle title="Choose a new password" />
      <ResetPasswordForm token={error ? null : (token ?? null)} />
    </>
  );
}
