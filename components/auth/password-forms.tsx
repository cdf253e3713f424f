"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";
import { forgotSchema, resetSchema } from "@/lib/auth/browser";

export function ForgotPasswordForm() {
  const [sent, setSent] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<z.infer<typeof forgotSchema>>({ resolver: zodResolver(forgotSchema) });
  async function onSubmit(v: z.infer<typeof forgotSchema>) {
    setError(null);
    const { error } = await authClient.requestPasswordReset({ email: v.email, redirectTo: "/reset-password" });
    if (error && error.status === 429) return setError("Too many requests. Wait a minute and try again.");
    if (error && error.status >= 500) return setError("We could not send the mail right now. Try again shortly.");
    setSent(true); // same answer whether or not the address has an account
  }
  if (sent) return <FormNotice message="If that address has a Riser account, a reset link is on its way. It works for one hour." />;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label="E-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>Send the reset link</Button>
    </form>
  );
}

export function ResetPasswordForm({ token }: { token: string | null }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<z.infer<typeof resetSchema>>({ resolver: zodResolver(resetSchema) });
  if (!token) return <FormError message="This reset link is incomplete or has expired. Ask for a new one." />;
  async function onSubmit(v: z.infer<typeof resetSchema>) {
    setError(null);
    const { error } = await authClient.resetPassword({ newPassword: v.password, token: token! });
    if (error) return setError(error.status === 400 ? "This reset link has expired or was used. Ask for a new one." : (error.message ?? "Could not change the password."));
    router.push("/sign-in?reset=1");
  }
  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label="New password" type="password" autoComplete="new-password" hint="At least 15 characters; a few unrelated words work well." {...register("password")} error={formState.errors.password?.message} />
      <Field label="New password again" type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>Change the password</Button>
    </form>
  );
}
