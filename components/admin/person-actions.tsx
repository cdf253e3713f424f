"use client";
import { useTranslations } from "next-intl";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError } from "@/components/ui/field";
import { ROLES } from "@/lib/access/browser";
import { banSchema, changeRoleSchema, moveOrganizationSchema, signOutSchema, unbanSchema } from "@/lib/admin/browser";
import type { PersonRow } from "@/lib/admin";
import { postJson } from "@/lib/fetcher";
import { SelectField, TextAreaField } from "@/components/ui/select-field";
import { applyServerErrors } from "./server-errors";

/** the role names, from the team catalog (role.learner …) */
export const roleLabel = (t: (key: string) => string, role: string) => (["learner", "sales", "manager", "admin"].includes(role) ? t(`role.${role}`) : role);

type Done = (message: string) => void;
type Org = { id: string; name: string };

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="flex flex-col gap-3 border-t border-line pt-4 first:border-t-0 first:pt-0">
      <h3 className="text-lg">{title}</h3>
      {children}
    </section>
  );
}

function RoleForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const t = useTranslations("adminConsole");
  const tt = useTranslations("team");
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof changeRoleSchema>, unknown, z.output<typeof changeRoleSchema>>({
    resolver: zodResolver(changeRoleSchema),
    defaultValues: { role: ROLES.includes(person.role as never) ? (person.role as (typeof ROLES)[number]) : "learner", reason: "" },
  });
  async function onSubmit(v: z.output<typeof changeRoleSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/role`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["role", "reason"], r));
    onDone(t("done.role", { name: person.name, role: roleLabel(tt, v.role) }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <SelectField label={t("newRole")} options={ROLES.map((r) => ({ value: r, label: roleLabel(tt, r) }))} {...register("role")} error={formState.errors.role?.message} />
      <TextAreaField label={t("reasonForTheRoleChange")} hint={t("requiredSavedInTheAuditLog")} {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("btn.changing") : t("btn.changeRole")}
      </Button>
    </form>
  );
}

function MoveForm({ person, organizations, onDone }: { person: PersonRow; organizations: Org[]; onDone: Done }) {
  const t = useTranslations("adminConsole");
  const [error, setFormError] = useState<string | null>(null);
  const choices = organizations.filter((o) => o.id !== person.organizationId);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof moveOrganizationSchema>, unknown, z.output<typeof moveOrganizationSchema>>({
    resolver: zodResolver(moveOrganizationSchema),
    defaultValues: { organizationId: "", reason: "" },
  });
  async function onSubmit(v: z.output<typeof moveOrganizationSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/organization`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["organizationId", "reason"], r));
    onDone(t("done.moved", { name: person.name, org: organizations.find((o) => o.id === v.organizationId)?.name ?? t("done.newOrg") }));
  }
  if (!choices.length) return <p className="text-muted">{t("thereIsNoOtherOrganizationTo")}</p>;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <SelectField
        label={t("moveToOrganization")}
        hint={t("theyLeaveTheirCurrentTeam")}
        options={[{ value: "", label: t("choose") }, ...choices.map((o) => ({ value: o.id, label: o.name }))]}
        {...register("organizationId")}
        error={formState.errors.organizationId?.message}
      />
      <TextAreaField label={t("reasonForTheMoveOptional")} {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("btn.moving") : t("btn.move")}
      </Button>
    </form>
  );
}

function BanForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const t = useTranslations("adminConsole");
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof banSchema>, unknown, z.output<typeof banSchema>>({
    resolver: zodResolver(banSchema),
    defaultValues: { reason: "", days: "" },
  });
  async function onSubmit(v: z.output<typeof banSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/ban`, { reason: v.reason, days: v.days ?? "" });
    if (!r.ok) return setFormError(applyServerErrors(setError, ["reason", "days"], r));
    onDone(t("done.banned", { name: person.name }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <TextAreaField label={t("reasonForTheBan")} hint={t("requiredSavedInTheAuditLog")} {...register("reason")} error={formState.errors.reason?.message} />
      <Field label={t("banForHowManyDays")} hint={t("leaveEmptyToBanUntilAn")} inputMode="numeric" {...register("days")} error={formState.errors.days?.message} />
      <Button type="submit" variant="danger" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("btn.banning") : t("btn.ban")}
      </Button>
    </form>
  );
}

function UnbanForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const t = useTranslations("adminConsole");
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof unbanSchema>, unknown, z.output<typeof unbanSchema>>({
    resolver: zodResolver(unbanSchema),
    defaultValues: { reason: "" },
  });
  async function onSubmit(v: z.output<typeof unbanSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/unban`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["reason"], r));
    onDone(t("done.unbanned", { name: person.name }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <p>
        {person.banExpires ? t("bannedUntil", { date: person.banExpires.slice(0, 10) }) : t("bannedUntilLifted")}
        {person.banReason ? `: “${person.banReason}”` : "."}
      </p>
      <TextAreaField label={t("reasonForLiftingTheBanOptional")} {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("btn.lifting") : t("btn.lift")}
      </Button>
    </form>
  );
}

function SignOutForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const t = useTranslations("adminConsole");
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof signOutSchema>, unknown, z.output<typeof signOutSchema>>({
    resolver: zodResolver(signOutSchema),
    defaultValues: { reason: "" },
  });
  async function onSubmit(v: z.output<typeof signOutSchema>) {
    setFormError(null);
    const r = await postJson<{ sessionsEnded: number }>(`/api/admin/people/${person.id}/sign-out`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["reason"], r));
    onDone(t("done.signedOut", { name: person.name, count: r.data.sessionsEnded }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <p className="text-sm text-muted">{t("endsEverySessionOfThisPerson")}</p>
      <TextAreaField label={t("reasonForTheSignOutOptional")} {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("btn.signingOut") : t("btn.signOut")}
      </Button>
    </form>
  );
}

/** Everything an admin can do to one person, each audited by the server. */
export function PersonActions({ person, organizations, viewerId, onDone }: { person: PersonRow; organizations: Org[]; viewerId: string; onDone: Done }) {
  const t = useTranslations("adminConsole");
  const tt = useTranslations("team");
  const self = person.id === viewerId;
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="font-bold">{t("eMail")}</dt>
        <dd className="wrap-anywhere">{person.email}</dd>
        <dt className="font-bold">{t("role")}</dt>
        <dd>{roleLabel(tt, person.role)}</dd>
        <dt className="font-bold">{t("organization")}</dt>
        <dd>{person.organization ?? "none"}{person.team ? ` · ${person.team}` : ""}</dd>
      </dl>
      {self ? <p className="rounded border border-line bg-panel px-3 py-2">{t("thisIsYouAnotherAdminChanges")}</p> : null}
      {!self ? (
        <Section title={t("role")}>
          <RoleForm person={person} onDone={onDone} />
        </Section>
      ) : null}
      <Section title={t("organization")}>
        <MoveForm person={person} organizations={organizations} onDone={onDone} />
      </Section>
      {!self ? <Section title={person.banned ? t("section.ban") : t("section.banFromRiser")}>{person.banned ? <UnbanForm person={person} onDone={onDone} /> : <BanForm person={person} onDone={onDone} />}</Section> : null}
      <Section title={t("forceSignOut")}>
        <SignOutForm person={person} onDone={onDone} />
      </Section>
    </div>
  );
}
