import type { Metadata } from "next";
import { ResetPasswordForm } from "@/components/auth/password-forms";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string; confirmed?: string }> }) {
  const { token, error, confirmed } = await searchParams;
  return (
    <>
      <PageTitle title="Choose a new password" />
      {confirmed && !error ? (
        // an e-mail confirmed from another browser than the sign-up's: the owner of the address chooses the password
        <p role="status" className="mb-4 max-w-md rounded border-l-4 border-water bg-water-light p-3">
          Your e-mail address is confirmed. Because the link was opened in a different browser from the one used to sign up, choose your password here.
        </p>
      ) : null}
      <ResetPasswordForm token={error ? null : (token ?? null)} />
    </>
  );
}
