"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";
import { postJson } from "@/lib/fetcher";
import { acceptInviteSchema, type AcceptInviteInput } from "@/lib/team/browser";

/** The invitee chooses a name and a password; the account is created and they are signed in. */
export function AcceptInviteForm({ token, email, name }: { token: string; email: string; name: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [created, setCreated] = useState(false);
  const { register, handleSubmit, formState, setError: setFieldError, control } = useForm<AcceptInviteInput>({
    resolver: zodResolver(acceptInviteSchema),
    defaultValues: { token, name, password: "", confirm: "" },
  });

  async function onSubmit(values: AcceptInviteInput) {
    setError(null);
    const res = await postJson<{ email: string }>("/api/invite/accept", values);
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) setFieldError(field as keyof AcceptInviteInput, { message: messages[0] });
      setError(res.error);
      return;
    }
    setCreated(true);
    const signedIn = await authClient.signIn.email({ email: res.data.email, password: values.password });
    if (!signedIn.error) {
      router.push("/learn");
      router.refresh();
    }
  }

  if (created) {
    return (
      <div className="flex max-w-md flex-col gap-3">
        <FormNotice message="Your account is ready. Signing you in…" />
        <p>
          If nothing happens, <Link href="/sign-in">sign in</Link> with {email} and the password you chose.
        </p>
      </div>
    );
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-md flex-col gap-4">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <div className="flex flex-col gap-1">
        <span className="font-bold">E-mail</span>
        <span className="break-all rounded border border-line bg-paper px-3 py-2">{email}</span>
      </div>
      <input type="hidden" {...register("token")} />
      <Field label="Your name" autoComplete="name" {...register("name")} error={formState.errors.name?.message} />
      <Field label="Password" type="password" autoComplete="new-password" hint="At least 15 characters; a few unrelated words work well." {...register("password")} error={formState.errors.password?.message} />
      <Field label="Password again" type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Creating your account…" : "Create my account"}
      </Button>
    </form>
  );
}
