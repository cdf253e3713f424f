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

export function ElevationCalculator({ preset, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const defaults = useMemo(() => flatFormValues("elevation", inputFromPreset("elevation", preset)), [preset]);
  const state = useCalculator("elevation", defaults);
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
