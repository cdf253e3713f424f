"use client";

import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { inputFromPreset } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { flatFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function FlowTestCalculator({ preset, embedded }: CalculatorProps) {
  const defaults = useMemo(() => flatFormValues("flow-test", inputFromPreset("flow-test", preset)), [preset]);
  const state = useCalculator("flow-test", defaults);
  const units = useWatch({ control: state.form.control, name: "units" });
  const u = unitLabels(units);
  return (
    <CalculatorShell id="flow-test" state={state} embedded={embedded}>
      <NumberField name="staticPressure" label="Static pressure" unit={u.pressure} hint="Read with no water flowing." />
      <NumberField name="residualPressure" label="Residual pressure" unit={u.pressure} hint="Read while the test flow runs." />
      <NumberField name="testFlow" label="Test flow" unit={u.flow} />
      <NumberField name="demandFlow" label="Design flow" unit={u.flow} hint="The system's flow at the source." />
      <NumberField
        name="demandPressure"
        label="Pressure needed at the design flow"
        unit={u.pressure}
        optional
        hint="From the system demand; gives a pass or short result and a chart point."
      />
      <NumberField
        name="residualTarget"
        label="Residual for the rated flow"
        unit={u.pressure}
        optional
        hint={units === "si" ? "Blank uses 1.4 bar, the rating pressure NFPA 291 uses." : "Blank uses 20 psi, the rating pressure NFPA 291 uses."}
      />
    </CalculatorShell>
  );
}
