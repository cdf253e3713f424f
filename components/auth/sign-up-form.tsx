"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { signUpSchema, type SignUpInput } from "@/lib/auth/browser";
import { postJson } from "@/lib/fetcher";
import { ResendConfirmation } from "./resend-confirmation";

export function SignUpForm() {
  const t = useTranslations("auth");
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<{ message: string; email: string } | null>(null);
  const { register, handleSubmit, formState, setError: setFieldError, control } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema) });

  async function onSubmit(values: SignUpInput) {
    setError(null);
    const res = await postJson<{ message: string }>("/api/account/sign-up", values);
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) {
        setFieldError(field as keyof SignUpInput, { message: messages[0] });
      }
      setError(res.error);
      return;
    }
    setDone({ message: res.data.message, email: values.email });
  }

  if (done) {
    return (
      <div className="flex max-w-md flex-col gap-3" data-testid="sign-up-done">
        <FormNotice message={t("checkEmail", { email: done.email })} />
        <p className="text-sm text-muted">{t("nothingArrived")}</p>
        <ResendConfirmation email={done.email} />
      </div>
    );
  }
  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label={t("yourName")} autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <Field label={t("workEmail")} type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Field label={t("password")} type="password" autoComplete="new-password" hint={t("passwordHint")} {...register("password")} error={formState.errors.password?.message} />
      <Field label={t("company")} autoComplete="organization" hint={t("companyHint")} {...register("organizationName")} error={formState.errors.organizationName?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? t("creating") : t("createAccount")}
      </Button>
      <p className="text-sm text-muted">
        {t("trial")}
      </p>
    </form>
  );
}
