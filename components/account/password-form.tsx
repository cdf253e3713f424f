"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useSWRConfig } from "swr";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { passwordChangeSchemaFor } from "@/lib/account/browser";
import { authClient } from "@/components/auth/auth-client";
import { useFieldError, useTranslatedResolver } from "@/components/team/use-field-error";

type Values = z.infer<ReturnType<typeof passwordChangeSchemaFor>>;

/** hasSecondFactor: the account uses two-step sign-in, so 8 characters are enough (lib/auth/schemas.ts). */
export function PasswordForm({ hasSecondFactor = false }: { hasSecondFactor?: boolean }) {
  const t = useTranslations("account");
  const fieldError = useFieldError();
  const { mutate } = useSWRConfig();
  const [error, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, reset, control } = useForm<Values>({
    resolver: useTranslatedResolver(zodResolver(passwordChangeSchemaFor(hasSecondFactor))),
    defaultValues: { currentPassword: "", newPassword: "", confirm: "", signOutOthers: true },
  });
  async function onSubmit(v: Values) {
    setFormError(null);
    setNotice(null);
    const { error } = await authClient.changePassword({ currentPassword: v.currentPassword, newPassword: v.newPassword, revokeOtherSessions: v.signOutOthers });
    if (error) {
      if (error.code === "INVALID_PASSWORD") return setError("currentPassword", { message: t("notCurrentPassword") });
      if (error.code === "PASSWORD_TOO_SHORT" || error.code === "PASSWORD_NOT_ALLOWED") return setError("newPassword", { message: fieldError(error.message) ?? t("passwordFailed") });
      if (error.status === 429) return setFormError(t("tooManyAttempts"));
      return setFormError(error.message ?? t("passwordFailed"));
    }
    reset({ currentPassword: "", newPassword: "", confirm: "", signOutOthers: v.signOutOthers });
    setNotice(v.signOutOthers ? t("passwordChangedOthers") : t("passwordChanged"));
    void mutate("/api/account/sessions");
  }
  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <FormNotice message={notice} />
      <Field label={t("currentPassword")} type="password" autoComplete="current-password" {...register("currentPassword")} error={formState.errors.currentPassword?.message} />
      <Field label={t("newPassword")} type="password" autoComplete="new-password" hint={t(hasSecondFactor ? "passwordHintSecondFactor" : "passwordHint")} {...register("newPassword")} error={formState.errors.newPassword?.message} />
      <Field label={t("newPasswordAgain")} type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5" {...register("signOutOthers")} />
        {t("signOutOthers")}
      </label>
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("changing") : t("changePassword")}
      </Button>
    </form>
  );
}
