"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { signUpSchema, type SignUpInput } from "@/lib/auth/browser";
import { postJson } from "@/lib/fetcher";
import { ResendConfirmation } from "./resend-confirmation";

export function SignUpForm() {
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<{ message: string; email: string } | null>(null);
  const { register, handleSubmit, formState, setError: setFieldError, control } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema) });

  async function onSubmit(values: SignUpInput) {
    setError(null);
    const res = await postJson<{ message: string }>("/api/account/sign-up", values);
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) {
        setFieldError(field as keyof SignUpInput, { message: messages[0] });
      }
      setError(res.error);
      return;
    }
    setDone({ message: res.data.message, email: values.email });
  }

  if (done) {
    return (
      <div className="flex max-w-md flex-col gap-3" data-testid="sign-up-done">
        <FormNotice message={`Check your e-mail: we sent a link to ${done.email} to confirm the address. Open it within 24 hours, then sign in.`} />
        <p className="text-sm text-muted">Nothing arrived after a few minutes? Look in the spam folder, or send the link again. A wrong address? Reload this page and sign up with the right one.</p>
        <ResendConfirmation email={done.email} />
      </div>
    );
  }
  return (
    <form method="post" onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label="Your name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <Field label="Work e-mail" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Field label="Password" type="password" autoComplete="new-password" hint="At least 15 characters; a few unrelated words work well." {...register("password")} error={formState.errors.password?.message} />
      <Field label="Company" autoComplete="organization" hint="Your sprinkler contractor or home-building company." {...register("organizationName")} error={formState.errors.organizationName?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Creating…" : "Create the account"}
      </Button>
      <p className="text-sm text-muted">
        You become your company&apos;s training manager, with 3 trial seats for 30 days.
      </p>
    </form>
  );
}
