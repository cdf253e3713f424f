"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useTranslations } from "next-intl";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field } from "@/components/ui/field";
import { verifyCodeInput, type VerifyCodeInput } from "@/lib/certificates/browser";
import { parseVerifyInput, verifyPathSegment } from "@/lib/certificates/browser";

/**
 * Type or paste a certificate's code (or its whole link). Works without JavaScript too: the form
 * falls back to GET /verify?code=…, which the page redirects.
 */
export function VerifyForm({ initial, serverError }: { initial?: string; serverError?: string }) {
  const t = useTranslations("verify");
  const router = useRouter();
  const { register, handleSubmit, formState, control } = useForm<VerifyCodeInput>({
    resolver: zodResolver(verifyCodeInput),
    defaultValues: { code: initial ?? "" },
  });
  const error = formState.errors.code?.message ?? (formState.isSubmitted ? undefined : serverError);

  return (
    <form
      action="/verify"
      method="get"
      noValidate
      onSubmit={handleSubmit((v) => router.push(`/verify/${encodeURIComponent(verifyPathSegment(parseVerifyInput(v.code)!))}`))}
      className="flex max-w-xl flex-col gap-4 rounded border border-line bg-panel p-4"
    >
      <ErrorSummary control={control} />
      <Field
        label={t("codeLabel")}
        hint={t("codeHint")}
        autoComplete="off"
        spellCheck={false}
        className="font-mono"
        {...register("code")}
        error={error}
      />
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>
          {t("check")}
        </Button>
      </div>
    </form>
  );
}
