"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";

type Values = { code: string };

/**
 * The second step of a sign-in (the password was right; the account uses two-step sign-in): a code
 * from the authenticator app, or one of the backup codes. Field errors say what went wrong.
 */
export function SecondStepForm({ onDone, onRestart }: { onDone: () => void; onRestart: (message: string) => void }) {
  const t = useTranslations("auth");
  const [backup, setBackup] = useState(false);
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, reset } = useForm<Values>({ defaultValues: { code: "" } });

  async function onSubmit({ code }: Values) {
    setFormError(null);
    const value = backup ? code.trim() : code.replace(/\s+/g, "");
    if (!backup && !/^\d{6}$/.test(value)) return setError("code", { message: t("sixDigits") });
    if (backup && !/^[A-Za-z0-9]{5}-?[A-Za-z0-9]{5}$/.test(value)) return setError("code", { message: t("backupFormat") });
    const normalized = backup && !value.includes("-") ? `${value.slice(0, 5)}-${value.slice(5)}` : value;
    const { error } = backup ? await authClient.twoFactor.verifyBackupCode({ code: normalized }) : await authClient.twoFactor.verifyTotp({ code: normalized });
    if (!error) return onDone();
    if (error.status === 429) return setFormError(error.message ?? t("tooManyAttemptsFew"));
    if (error.code === "INVALID_TWO_FACTOR_COOKIE" || error.code === "TOO_MANY_ATTEMPTS_REQUEST_NEW_CODE") {
      return onRestart(t("signInAgain"));
    }
    if (error.status === 401) return setError("code", { message: backup ? t("backupWrong") : t("codeWrong") });
    setFormError(error.message ?? t("codeCheckFailed"));
  }

  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4" aria-labelledby="second-step-h">
      <h2 id="second-step-h" className="text-xl">
        {t("twoStep")}
      </h2>
      <FormError message={error} />
      <Field
        label={backup ? t("backupCode") : t("appCode")}
        inputMode={backup ? "text" : "numeric"}
        autoComplete="one-time-code"
        autoFocus
        hint={backup ? t("backupHint") : t("appHint")}
        {...register("code", { required: backup ? t("enterBackup") : t("enterCode") })}
        error={formState.errors.code?.message}
      />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? t("checking") : t("continue")}
      </Button>
      <button
        type="button"
        className="self-start text-sm underline"
        onClick={() => {
          setBackup(!backup);
          setFormError(null);
          reset({ code: "" });
        }}
      >
        {backup ? t("useApp") : t("useBackup")}
      </button>
    </form>
  );
}
