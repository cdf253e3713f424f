"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useTranslations } from "next-intl";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { FormError } from "@/components/ui/field";
import { useErrorText } from "@/components/ui/use-error-text";
import { postJson } from "@/lib/fetcher";
import { revokeInput, type RevokeInput } from "@/lib/certificates/browser";

/** Revoke one certificate with a reason (managers of its organization, admins). */
export function RevokeForm({ id, serial, holderName }: { id: number; serial: string; holderName: string }) {
  const t = useTranslations("certificates");
  const errorText = useErrorText();
  const router = useRouter();
  const fieldId = useId();
  const [open, setOpen] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, control } = useForm<RevokeInput>({ resolver: zodResolver(revokeInput) });

  async function onSubmit(values: RevokeInput) {
    setProblem(null);
    const res = await postJson<{ status: string }>(`/api/certificates/${id}/revoke`, values);
    if (!res.ok) {
      if (res.fieldErrors?.reason?.[0]) setError("reason", { message: res.fieldErrors.reason[0] });
      else setProblem(res.error);
      return;
    }
    setOpen(false);
    router.refresh();
  }

  if (!open) {
    return (
      <Button type="button" variant="secondary" onClick={() => setOpen(true)} aria-label={t("revokeLabel", { serial, name: holderName })}>
        {t("revokeOpen")}
      </Button>
    );
  }
  const error = formState.errors.reason?.message;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-2 rounded border border-caution bg-caution-light p-3">
      <ErrorSummary control={control} />
      <label htmlFor={fieldId} className="font-bold">
        {t("whyRevoke", { serial, name: holderName })}
      </label>
      <textarea
        id={fieldId}
        rows={2}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        className={`rounded border bg-panel px-3 py-2 ${error ? "border-caution" : "border-ink/40"}`}
        {...register("reason")}
      />
      {error ? (
        <p id={`${fieldId}-error`} role="alert" className="text-sm font-bold text-caution">
          {errorText(error)}
        </p>
      ) : null}
      <FormError message={problem} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? t("revoking") : t("revoke")}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setOpen(false)}>
          {t("cancel")}
        </Button>
      </div>
    </form>
  );
}
