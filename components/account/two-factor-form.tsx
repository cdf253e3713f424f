"use client";
import { useRouter } from "next/navigation";
import QRCode from "qrcode";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { authClient } from "@/components/auth/auth-client";

type Setup = { uri: string; key: string; qr: string; backupCodes: string[] };

/**
 * Two-step sign-in on the account page (better-auth's twoFactor plugin): turn on with the password →
 * scan the QR code (or type the key) → a first code from the app switches it on → the backup codes are
 * shown once. Turning it off needs the password.
 */
export function TwoFactorForm({ enabled, required }: { enabled: boolean; required: boolean }) {
  const router = useRouter();
  const [setup, setSetup] = useState<Setup | null>(null);
  const [codes, setCodes] = useState<string[] | null>(null);
  const [error, setFormError] = useState<string | null>(null);
  const pw = useForm<{ password: string }>({ defaultValues: { password: "" } });
  const verify = useForm<{ code: string }>({ defaultValues: { code: "" } });

  async function start({ password }: { password: string }) {
    setFormError(null);
    if (!password) return pw.setError("password", { message: "Enter your password" });
    const { data, error } = await authClient.twoFactor.enable({ password });
    if (error || !data || !("totpURI" in data) || !data.totpURI) {
      if (error?.code === "INVALID_PASSWORD") return pw.setError("password", { message: "That is not your password" });
      return setFormError(error?.status === 429 ? "Too many attempts. Wait a minute and try again." : (error?.message ?? "Could not start. Try again."));
    }
    const key = new URL(data.totpURI).searchParams.get("secret") ?? "";
    setSetup({ uri: data.totpURI, key, qr: await QRCode.toDataURL(data.totpURI, { margin: 1, width: 220 }), backupCodes: data.backupCodes ?? [] });
    pw.reset({ password: "" });
  }

  async function confirm({ code }: { code: string }) {
    setFormError(null);
    const value = code.replace(/\s+/g, "");
    if (!/^\d{6}$/.test(value)) return verify.setError("code", { message: "Enter the 6 digits your authenticator app shows" });
    const { error } = await authClient.twoFactor.verifyTotp({ code: value });
    if (error) {
      if (error.status === 401) return verify.setError("code", { message: "That code is not right. Check the time on your phone and try the newest code" });
      return setFormError(error.status === 429 ? "Too many attempts. Wait a minute and try again." : (error.message ?? "Could not check the code. Try again."));
    }
    setCodes(setup?.backupCodes ?? []);
    setSetup(null);
  }

  async function turnOff({ password }: { password: string }) {
    setFormError(null);
    if (!password) return pw.setError("password", { message: "Enter your password" });
    const { error } = await authClient.twoFactor.disable({ password });
    if (error) {
      if (error.code === "INVALID_PASSWORD") return pw.setError("password", { message: "That is not your password" });
      return setFormError(error.status === 429 ? "Too many attempts. Wait a minute and try again." : (error.message ?? "Could not turn it off. Try again."));
    }
    pw.reset({ password: "" });
    router.refresh();
  }

  if (codes) {
    return (
      <div className="flex max-w-md flex-col gap-3" data-testid="backup-codes">
        <FormNotice message="Two-step sign-in is on. From now on Riser asks for a code from your app after your password." />
        <p className="font-bold">Your backup codes — shown only now</p>
        <p className="text-sm text-muted">Each works once, in place of a code from the app, if you lose your phone. Print them or keep them in a password manager.</p>
        <ul className="grid grid-cols-2 gap-2 font-mono">
          {codes.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
        <Button type="button" className="self-start" onClick={() => router.refresh()}>
          I have saved them
        </Button>
      </div>
    );
  }

  if (setup) {
    return (
      <form method="post" onSubmit={verify.handleSubmit(confirm)} noValidate className="flex max-w-md flex-col gap-3">
        <FormError message={error} />
        <p>Scan this with an authenticator app on your phone, or type the key into it.</p>
        {/* eslint-disable-next-line @next/next/no-img-element -- a data: URL made in the browser */}
        <img src={setup.qr} alt="QR code for your authenticator app" width={220} height={220} className="rounded border border-line bg-white" />
        <p className="text-sm">
          Key: <code className="break-all font-mono" data-testid="totp-key">{setup.key}</code>
        </p>
        <Field label="Code from the app" inputMode="numeric" autoComplete="one-time-code" hint="It is switched on only when this code is right." {...verify.register("code")} error={verify.formState.errors.code?.message} />
        <Button type="submit" disabled={verify.formState.isSubmitting} className="self-start">
          {verify.formState.isSubmitting ? "Checking…" : "Switch on two-step sign-in"}
        </Button>
      </form>
    );
  }

  return (
    <form method="post" onSubmit={pw.handleSubmit(enabled ? turnOff : start)} noValidate className="flex max-w-md flex-col gap-3">
      {required && !enabled ? <FormError message="Your role requires two-step sign-in: set it up here before using the team or admin pages." /> : null}
      {enabled ? <FormNotice message="Two-step sign-in is on: Riser asks for a code from your authenticator app after your password." /> : null}
      <FormError message={error} />
      <Field label="Your password" type="password" autoComplete="current-password" {...pw.register("password")} error={pw.formState.errors.password?.message} />
      <Button type="submit" disabled={pw.formState.isSubmitting} className="self-start">
        {enabled ? "Turn off two-step sign-in" : "Set up two-step sign-in"}
      </Button>
      {enabled && required ? <p className="text-sm text-muted">Your role requires it: without it the team and admin pages stay closed to you.</p> : null}
    </form>
  );
}
