"use client";

import { useTranslations } from "next-intl";
import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { inputFromPreset } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { flatFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function StoredWaterCalculator({ preset, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const defaults = useMemo(() => flatFormValues("stored-water", inputFromPreset("stored-water", preset)), [preset]);
  const state = useCalculator("stored-water", defaults);
  const units = useWatch({ control: state.form.control, name: "units" });
  return (
    <CalculatorShell id="stored-water" state={state} embedded={embedded}>
      <NumberField name="flow" label={t("designFlow")} unit={unitLabels(units).flow} hint={t("theSystemDemandSFlowAt")} />
      <NumberField name="duration" label={t("designDuration")} unit="min" hint={t("setByTheAdoptedCodeFor")} />
    </CalculatorShell>
  );
}
