"use client";
import { useTranslations } from "next-intl";
import { useFieldError, useTranslatedResolver } from "@/components/team/use-field-error";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldValues, type Path, type UseFormSetError } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { TextAreaField } from "@/components/ui/textarea-field";
import { postJson, type Result } from "@/lib/fetcher";
import { AMENDMENT_MAX, EDITIONS, TOPIC_LABELS, amendmentSchema, jurisdictionSchema, type AmendmentInput, type JurisdictionInput } from "@/lib/editions/browser";

/** Puts the server's field errors on the form's fields; returns the message for the rest. */
function applyErrors<T extends FieldValues>(res: Extract<Result<unknown>, { ok: false }>, setError: UseFormSetError<T>, fields: string[], tr: (m: string) => string | undefined): string {
  let placed = false;
  for (const [k, msgs] of Object.entries(res.fieldErrors ?? {})) {
    if (fields.includes(k) && msgs[0]) {
      setError(k as Path<T>, { message: tr(msgs[0]) ?? msgs[0] });
      placed = true;
    }
  }
  return (placed ? tr("Some fields need attention.") : tr(res.error)) ?? res.error;
}

/** Add a jurisdiction with its adopted NFPA 13D edition and whether IRC P2904 is in force. */
export function JurisdictionForm({ org }: { org: string | null }) {
  const t = useTranslations("editions");
  const tr = useFieldError();
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<JurisdictionInput>({
    resolver: useTranslatedResolver(zodResolver(jurisdictionSchema)),
    defaultValues: { name: "", state: "", edition: 2022, ircP2904: false, isDefault: false },
  });
  const e = formState.errors;
  return (
    <form
      noValidate
      className="grid gap-3 rounded border border-line bg-panel p-4 sm:grid-cols-2"
      onSubmit={handleSubmit(async (values) => {
        setProblem(null);
        setDone(null);
        const res = await postJson<{ message: string }>("/api/team/jurisdictions", { ...values, org: org ?? undefined });
        if (!res.ok) return setProblem(applyErrors(res, setError, ["name", "state", "edition", "ircP2904", "isDefault"], tr));
        setDone(res.data.message);
        reset();
        router.refresh();
      })}
    >
      <Field label={t("form.city")} maxLength={120} error={e.name?.message} {...register("name")} />
      <Field label={t("form.state")} maxLength={60} error={e.state?.message} {...register("state")} />
      <SelectField label={t("form.edition")} options={EDITIONS.map((y) => ({ value: String(y), label: String(y) }))} error={e.edition?.message} {...register("edition")} />
      <div className="flex flex-col justify-end gap-2">
        <label className="flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" {...register("ircP2904")} /> {t("form.irc")}
        </label>
        <label className="flex min-h-11 items-center gap-2">
          <input type="checkbox" className="size-5" {...register("isDefault")} /> {t("form.default")}
        </label>
      </div>
      <div className="sm:col-span-2 flex flex-col gap-2">
        <FormError message={problem} />
        <FormNotice message={done} />
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? t("form.saving") : t("form.addPlace")}
        </Button>
      </div>
    </form>
  );
}

/** Write or replace the organization's local rule on one topic. */
export function AmendmentForm({ org }: { org: string | null }) {
  const t = useTranslations("editions");
  const tr = useFieldError();
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<AmendmentInput>({ resolver: useTranslatedResolver(zodResolver(amendmentSchema)), defaultValues: { topic: "freeze", body: "" } });
  const e = formState.errors;
  return (
    <form
      noValidate
      className="flex flex-col gap-3 rounded border border-line bg-panel p-4"
      onSubmit={handleSubmit(async (values) => {
        setProblem(null);
        setDone(null);
        const res = await postJson<{ message: string }>("/api/team/amendments", { ...values, org: org ?? undefined });
        if (!res.ok) return setProblem(applyErrors(res, setError, ["topic", "body"], tr));
        setDone(res.data.message);
        reset();
        router.refresh();
      })}
    >
      <SelectField label={t("form.topic")} options={Object.keys(TOPIC_LABELS).map((value) => ({ value, label: t(`topic.${value}`) }))} error={e.topic?.message} {...register("topic")} />
      <TextAreaField label={t("form.rule")} hint={t("form.ruleHint", { max: AMENDMENT_MAX })} rows={3} maxLength={AMENDMENT_MAX} error={e.body?.message} {...register("body")} />
      <FormError message={problem} />
      <FormNotice message={done} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? t("form.saving") : t("form.saveRule")}
      </Button>
    </form>
  );
}

/** A POST or DELETE with a confirmation; the page refreshes after. */
export function RowAction({ url, method, body, label, confirm, ariaLabel }: { url: string; method: "POST" | "DELETE"; body?: unknown; label: string; confirm?: string; ariaLabel: string }) {
  const tr = useFieldError();
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setErrorText] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-col items-start">
      <button
        type="button"
        disabled={busy}
        aria-label={ariaLabel}
        className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold disabled:opacity-50"
        onClick={async () => {
          if (confirm && !window.confirm(confirm)) return;
          setBusy(true);
          setErrorText(null);
          const res = await postJson<{ message: string }>(url, body ?? {}, method);
          setBusy(false);
          if (!res.ok) return setErrorText(tr(res.error) ?? res.error);
          router.refresh();
        }}
      >
        {label}
      </button>
      {error ? (
        <span role="alert" className="text-sm text-caution">
          {error}
        </span>
      ) : null}
    </span>
  );
}
