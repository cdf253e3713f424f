"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { emailChangeSchema, nameSchema } from "@/lib/account/browser";
import { authClient } from "@/components/auth/auth-client";

export function NameForm({ name }: { name: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, formState, control } = useForm<z.infer<typeof nameSchema>>({ resolver: zodResolver(nameSchema), defaultValues: { name } });
  async function onSubmit(v: z.infer<typeof nameSchema>) {
    setError(null);
    setNotice(null);
    const { error } = await authClient.updateUser({ name: v.name });
    if (error) return setError(error.message ?? "Could not save the name. Try again.");
    setNotice("Your name is saved. It appears on new certificates.");
    router.refresh();
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <FormNotice message={notice} />
      <Field label="Name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Saving…" : "Save the name"}
      </Button>
    </form>
  );
}

export function EmailForm({ email }: { email: string }) {
  const [error, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, reset, control } = useForm<z.infer<typeof emailChangeSchema>>({ resolver: zodResolver(emailChangeSchema), defaultValues: { email: "", password: "" } });
  async function onSubmit(v: z.infer<typeof emailChangeSchema>) {
    setFormError(null);
    setNotice(null);
    if (v.email === email.toLowerCase()) return setError("email", { message: "That is already your e-mail address" });
    // the current password travels with the request (checked in lib/auth/guards.ts)
    const { error } = await authClient.changeEmail({ newEmail: v.email, callbackURL: "/account?email=changed", password: v.password } as Parameters<typeof authClient.changeEmail>[0]);
    if (error) {
      if (error.status === 429) return setFormError("Too many requests. Wait a minute and try again.");
      if (error.code === "INVALID_PASSWORD" || error.code === "CURRENT_PASSWORD_REQUIRED") return setError("password", { message: error.message ?? "The current password is not right." });
      return setFormError(error.message ?? "Could not start the change. Try again.");
    }
    reset();
    setNotice(`We sent a confirmation link to ${v.email}. Your address changes when you open it; until then you keep signing in with ${email}. Your other sessions are signed out.`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-3">
      <ErrorSummary control={control} />
      <p>
        Current address: <strong className="wrap-anywhere">{email}</strong>
      </p>
      <FormError message={error} />
      <FormNotice message={notice} />
      <Field label="New e-mail address" type="email" autoComplete="email" {...register("email")} error={formState.errors.email?.message} />
      <Field label="Your password (to confirm the change)" type="password" autoComplete="current-password" {...register("password")} error={formState.errors.password?.message} />
      <Button type="submit" variant="secondary" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Sending…" : "Send the confirmation link"}
      </Button>
    </form>
  );
}
