"use client";

import { useTranslations } from "next-intl";
import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { inputFromPreset } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField, SelectField } from "./fields";
import { flatFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function SprinklerFlowCalculator({ preset, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const defaults = useMemo(() => flatFormValues("sprinkler-flow", inputFromPreset("sprinkler-flow", preset)), [preset]);
  const state = useCalculator("sprinkler-flow", defaults);
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
