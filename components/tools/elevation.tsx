"use client";

import { useTranslations } from "next-intl";
import { useWatch } from "react-hook-form";
import type { CalculatorFormValues } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function ElevationCalculator({ initial, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const state = useCalculator<CalculatorFormValues["elevation"]>("elevation", initial);
  const units = useWatch({ control: state.form.control, name: "units" });
  return (
    <CalculatorShell id="elevation" state={state} embedded={embedded}>
      <NumberField
        name="height"
        label={t("heightOfTheHighestSprinklerAbove")}
        unit={unitLabels(units).length}
        hint={t("measureFromTheGaugeOrThe")}
      />
    </CalculatorShell>
  );
}
