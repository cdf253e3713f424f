"use client";
import { useTranslations } from "next-intl";
import { useFieldError } from "@/components/team/use-field-error";
import { useRouter } from "next/navigation";
import { useEffect, useId, useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { reviewInput } from "@/lib/signoffs/browser";

type Decision = "approve" | "return";

/** Approve, or return with a comment (required), one waiting sign-off. The server checks again. */
export function ReviewForm({ id, learnerName, skillTitle }: { id: string; learnerName: string; skillTitle: string }) {
  const t = useTranslations("signoffs");
  const tr = useFieldError();
  const fieldId = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<string | null>(null);
  const { register, getValues, setError, clearErrors, formState } = useForm<{ comment: string }>({ defaultValues: { comment: "" } });
  const [busy, setBusy] = useState<Decision | null>(null);
  const router = useRouter();
  // After a decision the queue and the Sign-offs tab's count update without a reload; the
  // confirmation stays readable for a moment first.
  useEffect(() => {
    if (!outcome) return;
    const timer = setTimeout(() => router.refresh(), 1500);
    return () => clearTimeout(timer);
  }, [outcome, router]);

  async function decide(decision: Decision) {
    setProblem(null);
    clearErrors();
    const parsed = reviewInput.safeParse({ decision, comment: getValues("comment") });
    if (!parsed.success) {
      const msg = parsed.error.issues.find((i) => i.path[0] === "comment")?.message;
      if (msg) setError("comment", { message: tr(msg) });
      else setProblem(tr(parsed.error.issues[0]?.message) ?? t("checkForm"));
      return;
    }
    setBusy(decision);
    const res = await postJson<{ status: string; moduleCompleted: boolean }>(`/api/sign-offs/${id}/review`, parsed.data);
    setBusy(null);
    if (!res.ok) {
      if (res.fieldErrors?.comment?.[0]) setError("comment", { message: tr(res.fieldErrors.comment[0]) });
      else setProblem(tr(res.error) ?? res.error);
      return;
    }
    setOutcome(
      res.data.status === "approved"
        ? t("approvedDone", { name: learnerName, completed: res.data.moduleCompleted ? "yes" : "no" })
        : t("returnedDone", { name: learnerName }),
    );
  }

  if (outcome) return <FormNotice message={outcome} />;
  const error = formState.errors.comment?.message;
  return (
    <form onSubmit={(e) => e.preventDefault()} noValidate className="flex flex-col gap-2" aria-label={t("reviewLabel", { skill: skillTitle, name: learnerName })}>
      <label htmlFor={fieldId} className="font-bold">
        {t("commentFor", { name: learnerName })}
      </label>
      <p id={`${fieldId}-hint`} className="text-sm text-muted">
        {t("commentHint")}
      </p>
      <textarea
        id={fieldId}
        rows={2}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${fieldId}-hint${error ? ` ${fieldId}-error` : ""}`}
        className={`rounded border bg-panel px-3 py-2 ${error ? "border-caution" : "border-ink/40"}`}
        {...register("comment")}
      />
      {error ? (
        <p id={`${fieldId}-error`} role="alert" className="text-sm font-bold text-caution">
          {error}
        </p>
      ) : null}
      <FormError message={problem} />
      <div className="flex flex-wrap gap-2">
        <Button type="button" onClick={() => decide("approve")} disabled={busy !== null}>
          {busy === "approve" ? t("approving") : t("approve")}
        </Button>
        <Button type="button" variant="secondary" onClick={() => decide("return")} disabled={busy !== null}>
          {busy === "return" ? t("returning") : t("return")}
        </Button>
      </div>
    </form>
  );
}
