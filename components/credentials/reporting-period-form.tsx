"use client";
import { useFormatter, useTranslations } from "next-intl";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { PERIOD_LENGTHS, type PeriodSetting } from "@/lib/credentials/browser";
import { postJson } from "@/lib/fetcher";

type Values = { startYear: string; startMonth: string; lengthMonths: string };

/** How the organization totals CE hours in training histories: calendar years or its licence period. */
export function ReportingPeriodForm({ current, text }: { current: PeriodSetting; text: string }) {
  const t = useTranslations("certificates");
  const format = useFormatter();
  const months = Array.from({ length: 12 }, (_, i) => format.dateTime(new Date(Date.UTC(2000, i, 1)), { month: "long", timeZone: "UTC" }));
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<Values>({
    defaultValues: { startYear: String(current.startMonth === 1 && current.lengthMonths === 12 ? new Date().getUTCFullYear() : current.startYear), startMonth: String(current.startMonth), lengthMonths: String(current.lengthMonths) },
  });

  async function onSubmit(v: Values) {
    setProblem(null);
    setNotice(null);
    const res = await postJson<{ message: string }>("/api/team/reporting-period", v);
    if (!res.ok) {
      for (const key of ["startYear", "startMonth", "lengthMonths"] as const) {
        const msg = res.fieldErrors?.[key]?.[0];
        if (msg) setError(key, { message: msg });
      }
      if (!res.fieldErrors) setProblem(res.error);
      return;
    }
    setNotice(res.data.message);
    router.refresh();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-2xl flex-col gap-3 rounded border border-line bg-panel p-4" data-testid="reporting-period-form">
      <p>
        {t.rich("periodIntro", { text, strong: (c) => <strong>{c}</strong> })}
      </p>
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField label={t("periodStarts")} options={months.map((m, i) => ({ value: String(i + 1), label: m }))} error={formState.errors.startMonth?.message} {...register("startMonth")} />
        <Field label={t("periodYear")} inputMode="numeric" error={formState.errors.startYear?.message} {...register("startYear")} />
        <SelectField
          label={t("periodLength")}
          options={PERIOD_LENGTHS.map((n) => ({ value: String(n), label: n % 12 === 0 ? t("years", { count: n / 12 }) : t("months", { count: n }) }))}
          error={formState.errors.lengthMonths?.message}
          {...register("lengthMonths")}
        />
      </div>
      <FormError message={problem} />
      <FormNotice message={notice} />
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? t("saving") : t("savePeriod")}
        </Button>
      </div>
    </form>
  );
}
