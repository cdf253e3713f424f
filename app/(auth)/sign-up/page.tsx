import type { Metadata } from "next";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <>
      <PageTitle title="Create an account for your company" lead="Set up Riser for your crews or your sales office. Invited by your company? Use the link in your invitation instead." />
      <SignUpForm />
    </>
  );
}
