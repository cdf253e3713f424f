"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { LANGUAGE_NAMES, LOCALES, type Locale } from "@/lib/i18n/browser";
import { INVITE_DAYS, INVITE_ROLES, inviteSchema, type InviteInput } from "@/lib/team/browser";
import { useFieldError, useTranslatedResolver } from "./use-field-error";

type Out = z.output<typeof inviteSchema>;

/** One invitation: e-mail, optional name, role, team, and the language of the mail and the new account. */
export function InviteForm({ teams, org, defaultLanguage }: { teams: { id: string; name: string }[]; org: string | null; defaultLanguage: Locale }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const ids = { role: useId(), team: useId(), language: useId() };
  const [error, setError] = useState<{ message: string; billing?: string } | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset, setError: setFieldError, control } = useForm<InviteInput, unknown, Out>({
    resolver: useTranslatedResolver(zodResolver(inviteSchema)),
    defaultValues: { email: "", name: "", role: "learner", teamId: "", language: defaultLanguage, org: org ?? undefined },
  });

  async function onSubmit(values: Out) {
    setError(null);
    setDone(null);
    const res = await postJson<{ message: string }>("/api/team/invites", { ...values, org: org ?? undefined });
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) setFieldError(field as keyof InviteInput, { message: tr(messages[0]) });
      setError({ message: tr(res.error) ?? res.error, billing: res.status === 409 && /seat|asiento/i.test(res.error) ? "/team/billing" : undefined });
      return;
    }
    setDone(res.data.message);
    reset({ email: "", name: "", role: values.role, teamId: values.teamId ?? "", language: values.language ?? defaultLanguage, org: org ?? undefined });
    router.refresh();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-xl flex-col gap-4" aria-label={t("invite.formLabel")}>
      <ErrorSummary control={control} />
      {error ? (
        <div className="flex flex-col gap-1">
          <FormError message={error.message} />
          {error.billing ? <Link href={error.billing}>{t("invite.billingLink")}</Link> : null}
        </div>
      ) : null}
      <FormNotice message={done} />
      <Field label={t("invite.email")} type="email" autoComplete="off" {...register("email")} error={formState.errors.email?.message} />
      <Field label={t("invite.name")} hint={t("invite.nameHint")} autoComplete="off" {...register("name")} error={formState.errors.name?.message} />
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.role} className="font-bold">{t("invite.role")}</label>
        <select id={ids.role} {...register("role")} aria-invalid={formState.errors.role ? true : undefined} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
          {INVITE_ROLES.map((r) => (
            <option key={r} value={r}>{t(`role.${r}`)}</option>
          ))}
        </select>
        {formState.errors.role ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.role.message}</p> : null}
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.team} className="font-bold">{t("invite.team")}</label>
        <select id={ids.team} {...register("teamId")} aria-invalid={formState.errors.teamId ? true : undefined} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
          <option value="">{t("noTeam")}</option>
          {teams.map((x) => (
            <option key={x.id} value={x.id}>{x.name}</option>
          ))}
        </select>
        {formState.errors.teamId ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.teamId.message}</p> : null}
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.language} className="font-bold">{t("invite.language")}</label>
        <p id={`${ids.language}-hint`} className="text-sm text-muted">{t("invite.languageHint")}</p>
        <select id={ids.language} {...register("language")} aria-describedby={`${ids.language}-hint`} aria-invalid={formState.errors.language ? true : undefined} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
          {LOCALES.map((l) => (
            <option key={l} value={l} lang={l}>{LANGUAGE_NAMES[l]}</option>
          ))}
        </select>
        {formState.errors.language ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.language.message}</p> : null}
      </div>
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("invite.sending") : t("invite.send")}
      </Button>
      <p className="text-sm text-muted">{t("invite.linkNote", { days: INVITE_DAYS })}</p>
    </form>
  );
}
