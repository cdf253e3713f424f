"use client";

import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { inputFromPreset } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { flatFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function RoomCoverageCalculator({ preset, embedded }: CalculatorProps) {
  const defaults = useMemo(() => flatFormValues("room-coverage", inputFromPreset("room-coverage", preset)), [preset]);
  const state = useCalculator("room-coverage", defaults);
  const units = useWatch({ control: state.form.control, name: "units" });
  const u = unitLabels(units);
  return (
    <CalculatorShell id="room-coverage" state={state} embedded={embedded}>
      <NumberField name="length" label="Room length" unit={u.length} />
      <NumberField name="width" label="Room width" unit={u.length} />
      <NumberField name="maxSpacing" label="Listed maximum spacing" unit={u.length} hint="From the sprinkler's listing." />
      <NumberField name="maxArea" label="Listed maximum coverage area" unit={u.area} />
      <NumberField name="minSpacing" label="Listed minimum spacing" unit={u.length} optional />
      <NumberField name="maxWallDistance" label="Listed maximum distance to a wall" unit={u.length} optional />
    </CalculatorShell>
  );
}
