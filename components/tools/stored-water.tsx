"use client";

import { useTranslations } from "next-intl";
import { useWatch } from "react-hook-form";
import type { CalculatorFormValues } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function StoredWaterCalculator({ initial, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const state = useCalculator<CalculatorFormValues["stored-water"]>("stored-water", initial);
  const units = useWatch({ control: state.form.control, name: "units" });
  return (
    <CalculatorShell id="stored-water" state={state} embedded={embedded}>
      <NumberField name="flow" label={t("designFlow")} unit={unitLabels(units).flow} hint={t("theSystemDemandSFlowAt")} />
      <NumberField name="duration" label={t("designDuration")} unit="min" hint={t("setByTheAdoptedCodeFor")} />
    </CalculatorShell>
  );
}
