"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { INVITE_DAYS, INVITE_ROLES, ROLE_LABELS, inviteSchema, type InviteInput } from "@/lib/team/browser";

type Out = z.output<typeof inviteSchema>;

/** One invitation: e-mail, optional name, role, team. */
export function InviteForm({ teams, org }: { teams: { id: string; name: string }[]; org: string | null }) {
  const router = useRouter();
  const ids = { role: useId(), team: useId() };
  const [error, setError] = useState<{ message: string; billing?: string } | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, reset, setError: setFieldError, control } = useForm<InviteInput, unknown, Out>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: "", name: "", role: "learner", teamId: "", org: org ?? undefined },
  });

  async function onSubmit(values: Out) {
    setError(null);
    setDone(null);
    const res = await postJson<{ message: string }>("/api/team/invites", { ...values, org: org ?? undefined });
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) setFieldError(field as keyof InviteInput, { message: messages[0] });
      setError({ message: res.error, billing: res.status === 409 && /seats/.test(res.error) ? "/team/billing" : undefined });
      return;
    }
    setDone(res.data.message);
    reset({ email: "", name: "", role: values.role, teamId: values.teamId ?? "", org: org ?? undefined });
    router.refresh();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-xl flex-col gap-4" aria-label="Invite one person">
      <ErrorSummary control={control} />
      {error ? (
        <div className="flex flex-col gap-1">
          <FormError message={error.message} />
          {error.billing ? <Link href={error.billing}>Go to the billing page to add seats</Link> : null}
        </div>
      ) : null}
      <FormNotice message={done} />
      <Field label="E-mail" type="email" autoComplete="off" {...register("email")} error={formState.errors.email?.message} />
      <Field label="Name (optional)" hint="Prefills the name on their account; they can change it." autoComplete="off" {...register("name")} error={formState.errors.name?.message} />
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.role} className="font-bold">Role</label>
        <select id={ids.role} {...register("role")} aria-invalid={formState.errors.role ? true : undefined} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
          {INVITE_ROLES.map((r) => (
            <option key={r} value={r}>{ROLE_LABELS[r]}</option>
          ))}
        </select>
        {formState.errors.role ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.role.message}</p> : null}
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={ids.team} className="font-bold">Team</label>
        <select id={ids.team} {...register("teamId")} aria-invalid={formState.errors.teamId ? true : undefined} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
          <option value="">No team</option>
          {teams.map((t) => (
            <option key={t.id} value={t.id}>{t.name}</option>
          ))}
        </select>
        {formState.errors.teamId ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.teamId.message}</p> : null}
      </div>
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Sending…" : "Send the invitation"}
      </Button>
      <p className="text-sm text-muted">The mail carries a link that works once and expires after {INVITE_DAYS} days. Inviting the same address again replaces the earlier link.</p>
    </form>
  );
}
