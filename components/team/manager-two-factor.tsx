"use client";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { useFieldError } from "./use-field-error";

/** The organization's rule: its managers must use two-step sign-in (switched on the server, audited). */
export function ManagerTwoFactor({ required, org }: { required: boolean; org: string | null }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <section aria-labelledby="manager-2fa-h" className="mt-10 flex max-w-prose flex-col gap-3 border-t border-line pt-6">
      <h2 id="manager-2fa-h" className="text-xl">
        {t("twoFactor.heading")}
      </h2>
      <p className="text-muted">{t("twoFactor.body")}</p>
      <FormError message={error} />
      <FormNotice message={done} />
      <label className="flex min-h-11 items-center gap-2">
        <input
          type="checkbox"
          className="size-5"
          checked={required}
          disabled={busy}
          onChange={async (e) => {
            setBusy(true);
            setError(null);
            setDone(null);
            const res = await postJson<{ message: string }>("/api/team/security", { requireManagerTwoFactor: e.target.checked, org: org ?? undefined });
            setBusy(false);
            if (!res.ok) return setError(tr(res.fieldErrors?.required?.[0]) ?? tr(res.error) ?? res.error);
            setDone(res.data.message);
            router.refresh();
          }}
        />
        {t("twoFactor.label")}
      </label>
    </section>
  );
}
