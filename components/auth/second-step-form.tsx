"use client";
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
  const [backup, setBackup] = useState(false);
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, reset } = useForm<Values>({ defaultValues: { code: "" } });

  async function onSubmit({ code }: Values) {
    setFormError(null);
    const value = backup ? code.trim() : code.replace(/\s+/g, "");
    if (!backup && !/^\d{6}$/.test(value)) return setError("code", { message: "Enter the 6 digits your authenticator app shows" });
    if (backup && !/^[A-Za-z0-9]{5}-?[A-Za-z0-9]{5}$/.test(value)) return setError("code", { message: "A backup code looks like ab12C-3dEf4" });
    const normalized = backup && !value.includes("-") ? `${value.slice(0, 5)}-${value.slice(5)}` : value;
    const { error } = backup ? await authClient.twoFactor.verifyBackupCode({ code: normalized }) : await authClient.twoFactor.verifyTotp({ code: normalized });
    if (!error) return onDone();
    if (error.status === 429) return setFormError(error.message ?? "Too many attempts. Wait a few minutes and try again.");
    if (error.code === "INVALID_TWO_FACTOR_COOKIE" || error.code === "TOO_MANY_ATTEMPTS_REQUEST_NEW_CODE") {
      return onRestart("Sign in again: that sign-in expired or had too many wrong codes.");
    }
    if (error.status === 401) return setError("code", { message: backup ? "That backup code is not right or was already used" : "That code is not right. Check the time on your phone and try the newest code" });
    setFormError(error.message ?? "Could not check the code. Try again.");
  }

  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4" aria-labelledby="second-step-h">
      <h2 id="second-step-h" className="text-xl">
        Two-step sign-in
      </h2>
      <FormError message={error} />
      <Field
        label={backup ? "Backup code" : "Code from your authenticator app"}
        inputMode={backup ? "text" : "numeric"}
        autoComplete="one-time-code"
        autoFocus
        hint={backup ? "Each backup code works once." : "6 digits; a new code appears every 30 seconds."}
        {...register("code", { required: backup ? "Enter one of your backup codes" : "Enter the code" })}
        error={formState.errors.code?.message}
      />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Checking…" : "Continue"}
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
        {backup ? "Use a code from the authenticator app" : "Lost your phone? Use a backup code"}
      </button>
    </form>
  );
}
