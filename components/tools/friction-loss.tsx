"use client";

import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { PIPE_DATA, PIPE_MATERIALS, inputFromPreset, sizesFor } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField, SelectField } from "./fields";
import { flatFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export const MATERIAL_OPTIONS = PIPE_MATERIALS.map((m) => ({ value: m, label: PIPE_DATA[m].label }));
export const sizeOptions = (material: string | undefined) =>
  sizesFor((PIPE_MATERIALS as readonly string[]).includes(material ?? "") ? (material as (typeof PIPE_MATERIALS)[number]) : "copper-l").map(
    (s) => ({ value: s, label: `${s} in` }),
  );

export function FrictionLossCalculator({ preset, embedded }: CalculatorProps) {
  const defaults = useMemo(() => flatFormValues("friction-loss", inputFromPreset("friction-loss", preset)), [preset]);
  const state = useCalculator("friction-loss", defaults);
  const [units, material] = useWatch({ control: state.form.control, name: ["units", "material"] });
  const u = unitLabels(units);
  const plastic = material === "cpvc" || material === "pex";
  return (
    <CalculatorShell id="friction-loss" state={state} embedded={embedded}>
      <SelectField name="material" label="Pipe material" options={MATERIAL_OPTIONS} />
      <SelectField name="nominalSize" label="Nominal size" options={sizeOptions(material)} />
      <NumberField name="flow" label="Flow" unit={u.flow} />
      <NumberField name="length" label="Pipe length" unit={u.length} />
      <NumberField
        name="elbows"
        label="90° elbows"
        optional
        hint={plastic ? "Steel and copper only (NFPA 13's chart): for CPVC and PEX use the listed length below." : "Equivalent lengths from NFPA 13's steel pipe chart."}
      />
      <NumberField name="teeBranches" label="Tees with the flow turned 90°" optional />
      <NumberField
        name="listedFittingsLength"
        label={plastic ? "Fittings, total listed equivalent length" : "Other fittings, listed equivalent length"}
        unit={u.length}
        optional
        hint={plastic ? "CPVC and PEX fittings use the pipe maker's listed equivalent lengths." : undefined}
      />
      <details className="rounded border border-line bg-panel p-3">
        <summary className="cursor-pointer font-bold">Maker&apos;s listed values (optional)</summary>
        <div className="mt-3 flex flex-col gap-4">
          <NumberField
            name="insideDiameter"
            label="Listed inside diameter"
            unit={u.diameter}
            optional
            hint={
              plastic
                ? "Blank uses the average bore of the pipe standard (OD minus twice the average wall), smaller than OD minus twice the minimum wall. Enter the pipe's listed value: it governs."
                : "Blank uses the published ID of the pipe standard. A listed value you enter governs."
            }
          />
          <NumberField name="cFactor" label="C-factor" optional hint="Leave blank for the NFPA 13 table value." />
        </div>
      </details>
    </CalculatorShell>
  );
}
