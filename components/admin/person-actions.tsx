"use client";
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

export const ROLE_LABEL: Record<string, string> = { learner: "Learner", sales: "Sales", manager: "Manager", admin: "Admin" };

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
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof changeRoleSchema>, unknown, z.output<typeof changeRoleSchema>>({
    resolver: zodResolver(changeRoleSchema),
    defaultValues: { role: ROLES.includes(person.role as never) ? (person.role as (typeof ROLES)[number]) : "learner", reason: "" },
  });
  async function onSubmit(v: z.output<typeof changeRoleSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/role`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["role", "reason"], r));
    onDone(`${person.name} is now ${ROLE_LABEL[v.role] ?? v.role}.`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <SelectField label="New role" options={ROLES.map((r) => ({ value: r, label: ROLE_LABEL[r]! }))} {...register("role")} error={formState.errors.role?.message} />
      <TextAreaField label="Reason for the role change" hint="Required. Saved in the audit log." {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Changing…" : "Change role"}
      </Button>
    </form>
  );
}

function MoveForm({ person, organizations, onDone }: { person: PersonRow; organizations: Org[]; onDone: Done }) {
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
    onDone(`${person.name} moved to ${organizations.find((o) => o.id === v.organizationId)?.name ?? "the new organization"}.`);
  }
  if (!choices.length) return <p className="text-muted">There is no other organization to move to.</p>;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <SelectField
        label="Move to organization"
        hint="They leave their current team."
        options={[{ value: "", label: "Choose…" }, ...choices.map((o) => ({ value: o.id, label: o.name }))]}
        {...register("organizationId")}
        error={formState.errors.organizationId?.message}
      />
      <TextAreaField label="Reason for the move (optional)" {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Moving…" : "Move"}
      </Button>
    </form>
  );
}

function BanForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof banSchema>, unknown, z.output<typeof banSchema>>({
    resolver: zodResolver(banSchema),
    defaultValues: { reason: "", days: "" },
  });
  async function onSubmit(v: z.output<typeof banSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/ban`, { reason: v.reason, days: v.days ?? "" });
    if (!r.ok) return setFormError(applyServerErrors(setError, ["reason", "days"], r));
    onDone(`${person.name} is banned and signed out everywhere.`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <TextAreaField label="Reason for the ban" hint="Required. Saved in the audit log." {...register("reason")} error={formState.errors.reason?.message} />
      <Field label="Ban for how many days" hint="Leave empty to ban until an admin lifts it." inputMode="numeric" {...register("days")} error={formState.errors.days?.message} />
      <Button type="submit" variant="danger" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Banning…" : "Ban and sign out"}
      </Button>
    </form>
  );
}

function UnbanForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof unbanSchema>, unknown, z.output<typeof unbanSchema>>({
    resolver: zodResolver(unbanSchema),
    defaultValues: { reason: "" },
  });
  async function onSubmit(v: z.output<typeof unbanSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/people/${person.id}/unban`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["reason"], r));
    onDone(`${person.name} can sign in again.`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <p>
        Banned{person.banExpires ? ` until ${person.banExpires.slice(0, 10)}` : " until lifted"}
        {person.banReason ? `: “${person.banReason}”` : "."}
      </p>
      <TextAreaField label="Reason for lifting the ban (optional)" {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Lifting…" : "Lift the ban"}
      </Button>
    </form>
  );
}

function SignOutForm({ person, onDone }: { person: PersonRow; onDone: Done }) {
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof signOutSchema>, unknown, z.output<typeof signOutSchema>>({
    resolver: zodResolver(signOutSchema),
    defaultValues: { reason: "" },
  });
  async function onSubmit(v: z.output<typeof signOutSchema>) {
    setFormError(null);
    const r = await postJson<{ sessionsEnded: number }>(`/api/admin/people/${person.id}/sign-out`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["reason"], r));
    onDone(`${person.name} is signed out everywhere (${r.data.sessionsEnded} session${r.data.sessionsEnded === 1 ? "" : "s"} ended).`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <p className="text-sm text-muted">Ends every session of this person now; they can sign in again.</p>
      <TextAreaField label="Reason for the sign-out (optional)" {...register("reason")} error={formState.errors.reason?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Signing out…" : "Sign out everywhere"}
      </Button>
    </form>
  );
}

/** Everything an admin can do to one person, each audited by the server. */
export function PersonActions({ person, organizations, viewerId, onDone }: { person: PersonRow; organizations: Org[]; viewerId: string; onDone: Done }) {
  const self = person.id === viewerId;
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="font-bold">E-mail</dt>
        <dd className="wrap-anywhere">{person.email}</dd>
        <dt className="font-bold">Role</dt>
        <dd>{ROLE_LABEL[person.role] ?? person.role}</dd>
        <dt className="font-bold">Organization</dt>
        <dd>{person.organization ?? "none"}{person.team ? ` · ${person.team}` : ""}</dd>
      </dl>
      {self ? <p className="rounded border border-line bg-panel px-3 py-2">This is you. Another admin changes your own role or bans you.</p> : null}
      {!self ? (
        <Section title="Role">
          <RoleForm person={person} onDone={onDone} />
        </Section>
      ) : null}
      <Section title="Organization">
        <MoveForm person={person} organizations={organizations} onDone={onDone} />
      </Section>
      {!self ? <Section title={person.banned ? "Ban" : "Ban from Riser"}>{person.banned ? <UnbanForm person={person} onDone={onDone} /> : <BanForm person={person} onDone={onDone} />}</Section> : null}
      <Section title="Force sign-out">
        <SignOutForm person={person} onDone={onDone} />
      </Section>
    </div>
  );
}
