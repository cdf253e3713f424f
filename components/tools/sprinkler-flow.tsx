"use client";

import { useTranslations } from "next-intl";
import { useWatch } from "react-hook-form";
import type { CalculatorFormValues } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField, SelectField } from "./fields";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function SprinklerFlowCalculator({ initial, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const state = useCalculator<CalculatorFormValues["sprinkler-flow"]>("sprinkler-flow", initial);
  const [units, solveFor] = useWatch({ control: state.form.control, name: ["units", "solveFor"] });
  const u = unitLabels(units);
  return (
    <CalculatorShell id="sprinkler-flow" state={state} embedded={embedded}>
      <SelectField
        name="solveFor"
        label={t("find")}
        options={[
          { value: "flow", label: "Flow at a pressure" },
          { value: "pressure", label: "Pressure for a flow" },
        ]}
      />
      <NumberField name="k" label={t("kFactor")} unit={u.k} hint={t("fromTheSprinklerSListing")} />
      {solveFor === "pressure" ? (
        <NumberField name="flow" label={t("flowWanted")} unit={u.flow} hint={t("theListedFlowForTheCoverage")} />
      ) : (
        <NumberField name="pressure" label={t("pressureAtTheSprinkler")} unit={u.pressure} />
      )}
    </CalculatorShell>
  );
}
