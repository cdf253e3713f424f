"use client";

import { useTranslations } from "next-intl";
import { useWatch } from "react-hook-form";
import type { CalculatorFormValues } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function FlowTestCalculator({ initial, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const state = useCalculator<CalculatorFormValues["flow-test"]>("flow-test", initial);
  const units = useWatch({ control: state.form.control, name: "units" });
  const u = unitLabels(units);
  return (
    <CalculatorShell id="flow-test" state={state} embedded={embedded}>
      <NumberField name="staticPressure" label={t("staticPressure")} unit={u.pressure} hint={t("readWithNoWaterFlowing")} />
      <NumberField name="residualPressure" label={t("residualPressure")} unit={u.pressure} hint={t("readWhileTheTestFlowRuns")} />
      <NumberField name="testFlow" label={t("testFlow")} unit={u.flow} />
      <NumberField name="demandFlow" label={t("designFlow")} unit={u.flow} hint={t("theSystemSFlowAtThe")} />
      <NumberField
        name="demandPressure"
        label={t("pressureNeededAtTheDesignFlow")}
        unit={u.pressure}
        optional
        hint={t("fromTheSystemDemandGivesA")}
      />
      <NumberField
        name="residualTarget"
        label={t("residualForTheRatedFlow")}
        unit={u.pressure}
        optional
        hint={units === "si" ? t("blankUses14BarThe") : t("blankUses20PsiTheRating")}
      />
    </CalculatorShell>
  );
}
