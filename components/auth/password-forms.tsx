"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useTranslations } from "next-intl";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";
import { forgotSchema, resetSchemaFor } from "@/lib/auth/browser";

export function ForgotPasswordForm() {
  const t = useTranslations("auth");
  const [sent, setSent] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<z.infer<typeof forgotSchema>>({ resolver: zodResolver(forgotSchema) });
  async function onSubmit(v: z.infer<typeof forgotSchema>) {
    setError(null);
    const { error } = await authClient.requestPasswordReset({ email: v.email, redirectTo: "/reset-password" });
    if (error && error.status === 429) return setError(t("tooManyRequests"));
    if (error && error.status >= 500) return setError(t("mailFailed"));
    setSent(true); // same answer whether or not the address has an account
  }
  if (sent) return <FormNotice message={t("resetSent")} />;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label={t("email")} type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>{t("sendReset")}</Button>
    </form>
  );
}

type ResetValues = z.infer<ReturnType<typeof resetSchemaFor>>;

/** hasSecondFactor: the token's account uses two-step sign-in, so 8 characters are enough (lib/auth/schemas.ts). */
export function ResetPasswordForm({ token, hasSecondFactor = false }: { token: string | null; hasSecondFactor?: boolean }) {
  const t = useTranslations("auth");
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<ResetValues>({ resolver: zodResolver(resetSchemaFor(hasSecondFactor)) });
  if (!token) return <FormError message={t("resetIncomplete")} />;
  async function onSubmit(v: ResetValues) {
    setError(null);
    const { error } = await authClient.resetPassword({ newPassword: v.password, token: token! });
    if (error) return setError(error.status === 400 ? t("resetExpired") : (error.message ?? t("changeFailed")));
    router.push("/sign-in?reset=1");
  }
  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label={t("newPassword")} type="password" autoComplete="new-password" hint={t(hasSecondFactor ? "passwordHintSecondFactor" : "passwordHint")} {...register("password")} error={formState.errors.password?.message} />
      <Field label={t("newPasswordAgain")} type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>{t("changePassword")}</Button>
    </form>
  );
}
