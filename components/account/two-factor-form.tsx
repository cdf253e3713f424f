"use client";
import { useRouter } from "next/navigation";
import QRCode from "qrcode";
import { useTranslations } from "next-intl";
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
  const t = useTranslations("account");
  const ta = useTranslations("auth");
  const router = useRouter();
  const [setup, setSetup] = useState<Setup | null>(null);
  const [codes, setCodes] = useState<string[] | null>(null);
  const [error, setFormError] = useState<string | null>(null);
  const pw = useForm<{ password: string }>({ defaultValues: { password: "" } });
  const verify = useForm<{ code: string }>({ defaultValues: { code: "" } });

  async function start({ password }: { password: string }) {
    setFormError(null);
    if (!password) return pw.setError("password", { message: t("enterPassword") });
    const { data, error } = await authClient.twoFactor.enable({ password });
    if (error || !data || !("totpURI" in data) || !data.totpURI) {
      if (error?.code === "INVALID_PASSWORD") return pw.setError("password", { message: t("notYourPassword") });
      return setFormError(error?.status === 429 ? t("tooManyAttempts") : (error?.message ?? t("startFailed")));
    }
    const key = new URL(data.totpURI).searchParams.get("secret") ?? "";
    setSetup({ uri: data.totpURI, key, qr: await QRCode.toDataURL(data.totpURI, { margin: 1, width: 220 }), backupCodes: data.backupCodes ?? [] });
    pw.reset({ password: "" });
  }

  async function confirm({ code }: { code: string }) {
    setFormError(null);
    const value = code.replace(/\s+/g, "");
    if (!/^\d{6}$/.test(value)) return verify.setError("code", { message: ta("sixDigits") });
    const { error } = await authClient.twoFactor.verifyTotp({ code: value });
    if (error) {
      if (error.status === 401) return verify.setError("code", { message: ta("codeWrong") });
      return setFormError(error.status === 429 ? t("tooManyAttempts") : (error.message ?? ta("codeCheckFailed")));
    }
    setCodes(setup?.backupCodes ?? []);
    setSetup(null);
  }

  async function turnOff({ password }: { password: string }) {
    setFormError(null);
    if (!password) return pw.setError("password", { message: t("enterPassword") });
    const { error } = await authClient.twoFactor.disable({ password });
    if (error) {
      if (error.code === "INVALID_PASSWORD") return pw.setError("password", { message: t("notYourPassword") });
      if (error.code === "PASSWORD_TOO_SHORT_FOR_ONE_FACTOR") return setFormError(t("lengthenBeforeTurnOff"));
      return setFormError(error.status === 429 ? t("tooManyAttempts") : (error.message ?? t("turnOffFailed")));
    }
    pw.reset({ password: "" });
    router.refresh();
  }

  if (codes) {
    return (
      <div className="flex max-w-md flex-col gap-3" data-testid="backup-codes">
        <FormNotice message={t("twoStepNowOn")} />
        <p className="font-bold">{t("backupCodes")}</p>
        <p className="text-sm text-muted">{t("backupCodesHint")}</p>
        <ul className="grid grid-cols-2 gap-2 font-mono">
          {codes.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
        <Button type="button" className="self-start" onClick={() => router.refresh()}>
          {t("savedThem")}
        </Button>
      </div>
    );
  }

  if (setup) {
    return (
      <form method="post" onSubmit={verify.handleSubmit(confirm)} noValidate className="flex max-w-md flex-col gap-3">
        <FormError message={error} />
        <p>{t("scan")}</p>
        {/* eslint-disable-next-line @next/next/no-img-element -- a data: URL made in the browser */}
        <img src={setup.qr} alt={t("qrAlt")} width={220} height={220} className="rounded border border-line bg-white" />
        <p className="text-sm">
          {t("key")} <code className="break-all font-mono" data-testid="totp-key">{setup.key}</code>
        </p>
        <Field label={t("codeFromApp")} inputMode="numeric" autoComplete="one-time-code" hint={t("codeFromAppHint")} {...verify.register("code")} error={verify.formState.errors.code?.message} />
        <Button type="submit" disabled={verify.formState.isSubmitting} className="self-start">
          {verify.formState.isSubmitting ? ta("checking") : t("switchOn")}
        </Button>
      </form>
    );
  }

  return (
    <form method="post" onSubmit={pw.handleSubmit(enabled ? turnOff : start)} noValidate className="flex max-w-md flex-col gap-3">
      {required && !enabled ? <FormError message={t("roleRequires")} /> : null}
      {enabled ? <FormNotice message={t("twoStepOn")} /> : null}
      <FormError message={error} />
      <Field label={t("yourPassword")} type="password" autoComplete="current-password" {...pw.register("password")} error={pw.formState.errors.password?.message} />
      <Button type="submit" disabled={pw.formState.isSubmitting} className="self-start">
        {enabled ? t("turnOff") : t("setUp")}
      </Button>
      {enabled && required ? <p className="text-sm text-muted">{t("roleRequiresNote")}</p> : null}
    </form>
  );
}
