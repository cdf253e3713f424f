"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useTranslations } from "next-intl";
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
  const t = useTranslations("auth");
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
      if (error.code === "BANNED_USER") setError(t("banned"));
      else if (error.status === 403) {
        setError(t("confirmFirst"));
        setUnconfirmed(values.email);
      }
      // a paused account (too many wrong passwords) explains itself; otherwise this address is rate limited
      else if (error.status === 429) setError(error.code === "ACCOUNT_SIGN_IN_PAUSED" && error.message ? error.message : t("tooManySignIns"));
      else if (error.status === 401) setError(t("noMatch"));
      else setError(error.message ?? t("signInFailed"));
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
      {verifiedNotice(params.get("verified"), params.get("error"), error) ? <FormNotice message={t("emailConfirmed")} /> : null}
      {params.get("verified") && params.get("error") ? (
        <FormError message={params.get("error") === "TOKEN_EXPIRED" ? t("linkExpired") : t("linkInvalid")} />
      ) : null}
      {params.get("reset") ? <FormNotice message={t("passwordChanged")} /> : null}
      <FormError message={error} />
      {unconfirmed && error ? <ResendConfirmation email={unconfirmed} /> : null}
      <Field label={t("email")} type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Field label={t("password")} type="password" autoComplete="current-password" {...register("password")} error={formState.errors.password?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? t("signingIn") : t("signIn")}
      </Button>
      <p className="text-sm">
        <Link href="/forgot-password">{t("forgotLink")}</Link> · <Link href="/sign-up">{t("signUpTitle")}</Link>
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
