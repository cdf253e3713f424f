"use client";

import { useMemo, useRef, useState } from "react";
import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { INPUT_CAPS, inputFromPreset } from "@/lib/hydraulics";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField, SelectField, TextField } from "./fields";
import { MATERIAL_OPTIONS, sizeOptions } from "./friction-loss";
import { emptySegment, systemDemandFormValues, type SystemDemandFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

/** one pipe run: material, size, length, rise and fittings */
function SegmentFields({ prefix, title }: { prefix: string; title: string }) {
  const { control } = useFormContext<SystemDemandFormValues>();
  const [units, material] = useWatch({ control, name: ["units", `${prefix}.material` as "units"] }) as [string, string];
  const u = unitLabels(units === "si" ? "si" : "us");
  const plastic = material === "cpvc" || material === "pex";
  return (
    <fieldset className="flex flex-col gap-3 rounded border border-line bg-panel p-3">
      <legend className="px-1 font-bold">{title}</legend>
      <TextField name={`${prefix}.label`} label="Label" />
      <SelectField name={`${prefix}.material`} label="Material" options={MATERIAL_OPTIONS} />
      <SelectField name={`${prefix}.nominalSize`} label="Nominal size" options={sizeOptions(material)} />
      <NumberField name={`${prefix}.length`} label="Length" unit={u.length} />
      <NumberField name={`${prefix}.elevation`} label="Rise toward the sprinkler" unit={u.length} optional hint="Negative if the pipe drops." />
      <NumberField
        name={`${prefix}.elbows`}
        label="90° elbows"
        optional
        hint={plastic ? "Steel and copper only: CPVC and PEX take the listed length below." : undefined}
      />
      <NumberField name={`${prefix}.teeBranches`} label="Tees, flow turned 90°" optional />
      <NumberField
        name={`${prefix}.listedFittingsLength`}
        label={plastic ? "Fittings, listed equivalent length" : "Other fittings, listed equivalent length"}
        unit={u.length}
        optional
      />
      <NumberField
        name={`${prefix}.insideDiameter`}
        label="Listed inside diameter"
        unit={u.diameter}
        optional
        hint={
          plastic
            ? "Blank uses the average bore of the pipe standard (smaller than OD minus twice the minimum wall). The pipe's listed value governs."
            : "Blank uses the published ID of the pipe standard."
        }
      />
    </fieldset>
  );
}

function DemandFields() {
  const { control } = useFormContext<SystemDemandFormValues>();
  const sprinklers = useFieldArray({ control, name: "sprinklers" });
  const segments = useFieldArray({ control, name: "segments" });
  const devices = useFieldArray({ control, name: "devices" });
  const units = useWatch({ control, name: "units" });
  const u = unitLabels(units);
  return (
    <>
      <h3 className="font-bold">Design sprinklers</h3>
      {sprinklers.fields.map((field, i) => (
        <fieldset key={field.id} className="flex flex-col gap-3 rounded border border-line p-3">
          <legend className="px-1 font-bold">Sprinkler {String.fromCharCode(65 + i)}</legend>
          <TextField name={`sprinklers.${i}.label`} label="Label" />
          <NumberField name={`sprinklers.${i}.k`} label="K-factor" unit={u.k} hint="From the sprinkler's listing." />
          <NumberField name={`sprinklers.${i}.minFlow`} label="Listed flow for the coverage" unit={u.flow} />
          <NumberField name={`sprinklers.${i}.minPressure`} label="Listed minimum pressure" unit={u.pressure} optional />
          <NumberField
            name={`sprinklers.${i}.coverageArea`}
            label="Coverage area"
            unit={u.area}
            optional
            hint="Checks NFPA 13D's minimum density of 0.05 gpm/ft². The 7 psi minimum pressure is always applied."
          />
          <SegmentFields prefix={`sprinklers.${i}.branch`} title="Branch from the split point (length 0 if none)" />
          {sprinklers.fields.length > 1 ? (
            <Button type="button" variant="secondary" onClick={() => sprinklers.remove(i)}>
              Remove this sprinkler
            </Button>
          ) : null}
        </fieldset>
      ))}
      {sprinklers.fields.length < 2 ? (
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            sprinklers.append({ label: "Sprinkler B", k: "4.9", minFlow: "13", minPressure: "", coverageArea: "", branch: { ...emptySegment("Branch B"), length: "0" } })
          }
        >
          Add a second design sprinkler
        </Button>
      ) : null}

      <h3 className="font-bold">Pipe from the source to the split point</h3>
      <p className="text-sm text-muted">List the runs from the water source toward the sprinklers.</p>
      {segments.fields.map((field, i) => (
        <div key={field.id} className="flex flex-col gap-2">
          <SegmentFields prefix={`segments.${i}`} title={`Pipe run ${i + 1}`} />
          <Button type="button" variant="secondary" onClick={() => segments.remove(i)}>
            Remove pipe run {i + 1}
          </Button>
        </div>
      ))}
      {segments.fields.length < INPUT_CAPS.pipeRuns ? (
        <Button type="button" variant="secondary" onClick={() => segments.append(emptySegment(`Pipe run ${segments.fields.length + 1}`))}>
          Add a pipe run
        </Button>
      ) : null}

      <h3 className="font-bold">Devices (loss at the design flow)</h3>
      <p className="text-sm text-muted">Meter, backflow preventer, valves: read each loss from the maker&apos;s flow-loss curve.</p>
      {devices.fields.map((field, i) => (
        <fieldset key={field.id} className="flex flex-col gap-3 rounded border border-line p-3">
          <legend className="px-1 font-bold">Device {i + 1}</legend>
          <TextField name={`devices.${i}.label`} label="Device" />
          <NumberField name={`devices.${i}.loss`} label="Loss" unit={u.pressure} />
          <Button type="button" variant="secondary" onClick={() => devices.remove(i)}>
            Remove device {i + 1}
          </Button>
        </fieldset>
      ))}
      {devices.fields.length < INPUT_CAPS.devices ? (
        <Button type="button" variant="secondary" onClick={() => devices.append({ label: "", loss: "" })}>
          Add a device
        </Button>
      ) : null}

      <NumberField
        name="additionalFlow"
        label="Additional flow at the same time"
        unit={u.flow}
        optional
        hint="For example domestic flow, where the adopted code requires it."
      />

      <SupplyFields />
    </>
  );
}

/**
 * The flow-test comparison. Unticking clears the three readings (blank readings mean "no supply" to
 * the schema) and keeps them to put back if the box is ticked again.
 */
function SupplyFields() {
  const { control, getValues, setValue } = useFormContext<SystemDemandFormValues>();
  const units = useWatch({ control, name: "units" });
  const u = unitLabels(units);
  const [on, setOn] = useState(() => Object.values(getValues("supply")).some((v) => String(v ?? "").trim() !== ""));
  const kept = useRef<SystemDemandFormValues["supply"] | null>(null);
  function toggle(next: boolean) {
    setOn(next);
    if (!next) {
      kept.current = getValues("supply");
      setValue("supply", { staticPressure: "", residualPressure: "", testFlow: "" }, { shouldDirty: true });
    } else if (kept.current) {
      setValue("supply", kept.current, { shouldDirty: true });
    }
  }
  return (
    <>
      <label className="inline-flex min-h-11 items-center gap-2">
        <input type="checkbox" checked={on} onChange={(e) => toggle(e.target.checked)} />
        Compare with a hydrant flow test
      </label>
      {on ? (
        <fieldset className="flex flex-col gap-3 rounded border border-line p-3">
          <legend className="px-1 font-bold">Water supply (flow test)</legend>
          <NumberField name="supply.staticPressure" label="Static pressure" unit={u.pressure} />
          <NumberField name="supply.residualPressure" label="Residual pressure" unit={u.pressure} />
          <NumberField name="supply.testFlow" label="Test flow" unit={u.flow} />
        </fieldset>
      ) : null}
    </>
  );
}

export function SystemDemandCalculator({ preset, embedded }: CalculatorProps) {
  const defaults = useMemo(() => systemDemandFormValues(inputFromPreset("system-demand", preset)), [preset]);
  const state = useCalculator("system-demand", defaults);
  return (
    <CalculatorShell id="system-demand" state={state} embedded={embedded}>
      <DemandFields />
    </CalculatorShell>
  );
}
