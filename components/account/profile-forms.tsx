"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { emailChangeSchema, nameSchema } from "@/lib/account/browser";
import { authClient } from "@/components/auth/auth-client";

export function NameForm({ name }: { name: string }) {
  const t = useTranslations("account");
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<z.infer<typeof nameSchema>>({ resolver: zodResolver(nameSchema), defaultValues: { name } });
  async function onSubmit(v: z.infer<typeof nameSchema>) {
    setError(null);
    setNotice(null);
    const { error } = await authClient.updateUser({ name: v.name });
    if (error) return setError(error.message ?? t("nameFailed"));
    setNotice(t("nameSaved"));
    router.refresh();
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <FormNotice message={notice} />
      <Field label={t("name")} autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("saving") : t("saveName")}
      </Button>
    </form>
  );
}

export function EmailForm({ email }: { email: string }) {
  const t = useTranslations("account");
  const [error, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, reset, control } = useForm<z.infer<typeof emailChangeSchema>>({ resolver: zodResolver(emailChangeSchema), defaultValues: { email: "", password: "" } });
  async function onSubmit(v: z.infer<typeof emailChangeSchema>) {
    setFormError(null);
    setNotice(null);
    if (v.email === email.toLowerCase()) return setError("email", { message: t("sameEmail") });
    // the current password travels with the request (checked in lib/auth/guards.ts)
    const { error } = await authClient.changeEmail({ newEmail: v.email, callbackURL: "/account?email=changed", password: v.password } as Parameters<typeof authClient.changeEmail>[0]);
    if (error) {
      if (error.status === 429) return setFormError(t("tooManyRequests"));
      if (error.code === "INVALID_PASSWORD" || error.code === "CURRENT_PASSWORD_REQUIRED") return setError("password", { message: error.message ?? t("passwordNotRight") });
      return setFormError(error.message ?? t("emailFailed"));
    }
    reset();
    setNotice(t("emailSent", { newEmail: v.email, email }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-3">
      <ErrorSummary control={control} />
      <p>
        {t.rich("currentAddress", { email, strong: (c) => <strong className="wrap-anywhere">{c}</strong> })}
      </p>
      <FormError message={error} />
      <FormNotice message={notice} />
      <Field label={t("newEmail")} type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Field label={t("passwordToConfirm")} type="password" autoComplete="current-password" {...register("password")} error={formState.errors.password?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("sending") : t("sendConfirmation")}
      </Button>
    </form>
  );
}
