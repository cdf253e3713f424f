"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";
import { postJson } from "@/lib/fetcher";
import { acceptInviteSchema, type AcceptInviteInput } from "@/lib/team/browser";
import { useFieldError, useTranslatedResolver } from "./use-field-error";

/** The invitee chooses a name and a password; the account is created and they are signed in. */
export function AcceptInviteForm({ token, email, name }: { token: string; email: string; name: string }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [created, setCreated] = useState(false);
  const { register, handleSubmit, formState, setError: setFieldError, control } = useForm<AcceptInviteInput>({
    resolver: useTranslatedResolver(zodResolver(acceptInviteSchema)),
    defaultValues: { token, name, password: "", confirm: "" },
  });

  async function onSubmit(values: AcceptInviteInput) {
    setError(null);
    const res = await postJson<{ email: string }>("/api/invite/accept", values);
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) setFieldError(field as keyof AcceptInviteInput, { message: tr(messages[0]) });
      setError(tr(res.error) ?? res.error);
      return;
    }
    setCreated(true);
    const signedIn = await authClient.signIn.email({ email: res.data.email, password: values.password });
    if (!signedIn.error) {
      router.push("/learn");
      router.refresh();
    }
  }

  if (created) {
    return (
      <div className="flex max-w-md flex-col gap-3">
        <FormNotice message={t("accept.ready")} />
        <p>
          {t.rich("accept.fallback", { email, link: (c) => <Link href="/sign-in">{c}</Link> })}
        </p>
      </div>
    );
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <div className="flex flex-col gap-1">
        <span className="font-bold">{t("invite.email")}</span>
        <span className="break-all rounded border border-line bg-paper px-3 py-2">{email}</span>
      </div>
      <input type="hidden" {...register("token")} />
      <Field label={t("accept.name")} autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <Field label={t("accept.password")} type="password" autoComplete="new-password" hint={t("accept.passwordHint")} {...register("password")} error={formState.errors.password?.message} />
      <Field label={t("accept.confirm")} type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? t("accept.creating") : t("accept.create")}
      </Button>
    </form>
  );
}
