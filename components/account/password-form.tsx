"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useSWRConfig } from "swr";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { passwordChangeSchema } from "@/lib/account/browser";
import { authClient } from "@/components/auth/auth-client";

type Values = z.infer<typeof passwordChangeSchema>;

export function PasswordForm() {
  const { mutate } = useSWRConfig();
  const [error, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, reset, control } = useForm<Values>({
    resolver: zodResolver(passwordChangeSchema),
    defaultValues: { currentPassword: "", newPassword: "", confirm: "", signOutOthers: true },
  });
  async function onSubmit(v: Values) {
    setFormError(null);
    setNotice(null);
    const { error } = await authClient.changePassword({ currentPassword: v.currentPassword, newPassword: v.newPassword, revokeOtherSessions: v.signOutOthers });
    if (error) {
      if (error.code === "INVALID_PASSWORD") return setError("currentPassword", { message: "That is not your current password" });
      if (error.status === 429) return setFormError("Too many attempts. Wait a minute and try again.");
      return setFormError(error.message ?? "Could not change the password. Try again.");
    }
    reset({ currentPassword: "", newPassword: "", confirm: "", signOutOthers: v.signOutOthers });
    setNotice(v.signOutOthers ? "Your password is changed, and your other devices are signed out." : "Your password is changed.");
    void mutate("/api/account/sessions");
  }
  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <FormNotice message={notice} />
      <Field label="Current password" type="password" autoComplete="current-password" {...register("currentPassword")} error={formState.errors.currentPassword?.message} />
      <Field label="New password" type="password" autoComplete="new-password" hint="At least 15 characters; a few unrelated words work well." {...register("newPassword")} error={formState.errors.newPassword?.message} />
      <Field label="New password again" type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" className="size-5" {...register("signOutOthers")} />
        Also sign out my other devices
      </label>
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Changing…" : "Change the password"}
      </Button>
    </form>
  );
}
