"use client";

import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { inputFromPreset } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { flatFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function ElevationCalculator({ preset, embedded }: CalculatorProps) {
  const defaults = useMemo(() => flatFormValues("elevation", inputFromPreset("elevation", preset)), [preset]);
  const state = useCalculator("elevation", defaults);
  const units = useWatch({ control: state.form.control, name: "units" });
  return (
    <CalculatorShell id="elevation" state={state} embedded={embedded}>
      <NumberField
        name="height"
        label="Height of the highest sprinkler above the gauge"
        unit={unitLabels(units).length}
        hint="Measure from the gauge or the water main connection to the sprinkler's deflector."
      />
    </CalculatorShell>
  );
}
