"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";
import { signInSchema } from "@/lib/auth/browser";
import { ResendConfirmation } from "./resend-confirmation";
import { SecondStepForm } from "./second-step-form";
import { safeNext } from "@/lib/safe-next";

type Values = z.infer<typeof signInSchema>;

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<Values>({ resolver: zodResolver(signInSchema) });
  const [unconfirmed, setUnconfirmed] = useState<string | null>(null);
  const [secondStep, setSecondStep] = useState(false);

  function signedIn() {
    // only same-origin path and query are followed (lib/safe-next.ts)
    router.push(safeNext(params.get("next"), window.location.origin));
    router.refresh();
  }

  async function onSubmit(values: Values) {
    setError(null);
    const { data, error } = await authClient.signIn.email({ email: values.email, password: values.password });
    if (error) {
      if (error.code === "BANNED_USER") setError("This account is banned from Riser. If you think this is a mistake, ask your training manager.");
      else if (error.status === 403) {
        setError("Confirm your e-mail address first: open the link we sent you.");
        setUnconfirmed(values.email);
      }
      // a paused account (too many wrong passwords) explains itself; otherwise this address is rate limited
      else if (error.status === 429) setError(error.code === "ACCOUNT_SIGN_IN_PAUSED" && error.message ? error.message : "Too many sign-in attempts. Wait a minute and try again.");
      else if (error.status === 401) setError("That e-mail and password do not match an account.");
      else setError(error.message ?? "Sign-in failed. Try again.");
      return;
    }
    // the password was right and the account uses two-step sign-in: ask for the code
    if (data && "twoFactorRedirect" in data && data.twoFactorRedirect) return setSecondStep(true);
    signedIn();
  }

  if (secondStep) {
    return (
      <SecondStepForm
        onDone={signedIn}
        onRestart={(message) => {
          setSecondStep(false);
          setError(message);
        }}
      />
    );
  }

  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      {verifiedNotice(params.get("verified"), params.get("error"), error) ? <FormNotice message="Your e-mail is confirmed. Sign in to continue." /> : null}
      {params.get("verified") && params.get("error") ? (
        <FormError message={params.get("error") === "TOKEN_EXPIRED" ? "That confirmation link has expired. Sign in below; if your address still needs confirming, you can send yourself a new link." : "That confirmation link is not valid. Sign in below; if your address still needs confirming, you can send yourself a new link."} />
      ) : null}
      {params.get("reset") ? <FormNotice message="Your password is changed. Sign in with the new one." /> : null}
      <FormError message={error} />
      {unconfirmed && error ? <ResendConfirmation email={unconfirmed} /> : null}
      <Field label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Field label="Password" type="password" autoComplete="current-password" {...register("password")} error={formState.errors.password?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
      <p className="text-sm">
        <Link href="/forgot-password">Forgot your password?</Link> · <Link href="/sign-up">Create an account for your company</Link>
      </p>
    </form>
  );
}

/**
 * "E-mail confirmed" only when the confirmation really succeeded (no `error` from the link) and no
 * sign-in error is on screen beside it.
 */
export function verifiedNotice(verified: string | null, linkError: string | null, signInError: string | null): boolean {
  return Boolean(verified) && !linkError && !signInError;
}
