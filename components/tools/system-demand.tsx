"use client";

import { useTranslations } from "next-intl";
import { memo, useRef, useState } from "react";
import { useFieldArray, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { INPUT_CAPS } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField, SelectField, TextField, useFormParts } from "./fields";
import { sizeOptions, useMaterialOptions } from "./friction-loss";
import { emptySegment, type SystemDemandFormValues } from "./form-values";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

/**
 * The form is some 7,000 px tall on a phone: each group below the first screen is laid out and
 * painted only as it comes near the screen (content-visibility: auto; it stays in the page, in the
 * accessibility tree, in find-in-page and in the tab order). The sizes are rough phone heights kept
 * until the group has been laid out once, after which the browser remembers the real one.
 */
const OFFSCREEN = {
  sprinkler: "[content-visibility:auto] [contain-intrinsic-size:auto_1500px]",
  pipeRun: "[content-visibility:auto] [contain-intrinsic-size:auto_1000px]",
  device: "[content-visibility:auto] [contain-intrinsic-size:auto_260px]",
};

/** one pipe run: material, size, length, rise and fittings */
function SegmentFields({ prefix, title }: { prefix: string; title: string }) {
  const t = useTranslations("tools");
  const { control, words } = useFormParts<SystemDemandFormValues>();
  const [units, material] = useWatch({ control, name: ["units", `${prefix}.material` as "units"] }) as [string, string];
  const u = unitLabels(units === "si" ? "si" : "us");
  const plastic = material === "cpvc" || material === "pex";
  const materialOptions = useMaterialOptions(words);
  return (
    <fieldset className="flex flex-col gap-3 rounded border border-line bg-panel p-3">
      <legend className="px-1 font-bold">{title}</legend>
      <TextField name={`${prefix}.label`} label={t("label")} />
      <SelectField name={`${prefix}.material`} label={t("material")} options={materialOptions} />
      <SelectField name={`${prefix}.nominalSize`} label={t("nominalSize")} options={sizeOptions(material)} />
      <NumberField name={`${prefix}.length`} label={t("length")} unit={u.length} />
      <NumberField name={`${prefix}.elevation`} label={t("riseTowardTheSprinkler")} unit={u.length} optional hint={t("negativeIfThePipeDrops")} />
      <NumberField
        name={`${prefix}.elbows`}
        label={t("90Elbows")}
        optional
        hint={plastic ? t("steelAndCopperOnlyCpvcAnd") : undefined}
      />
      <NumberField name={`${prefix}.teeBranches`} label={t("teesFlowTurned90")} optional />
      <NumberField
        name={`${prefix}.listedFittingsLength`}
        label={plastic ? t("fittingsListedEquivalentLength") : t("otherFittingsListedEquivalentLength")}
        unit={u.length}
        optional
      />
      <NumberField
        name={`${prefix}.insideDiameter`}
        label={t("listedInsideDiameter")}
        unit={u.diameter}
        optional
        hint={
          plastic
            ? t("idHintPlasticShort")
            : t("idHintSteelShort")
        }
      />
    </fieldset>
  );
}

/** memo: no props, so the calculator's own re-renders (every change of the form's state) stop here */
const DemandFields = memo(function DemandFields() {
  const t = useTranslations("tools");
  const { control } = useFormParts<SystemDemandFormValues>();
  const sprinklers = useFieldArray({ control, name: "sprinklers" });
  const segments = useFieldArray({ control, name: "segments" });
  const devices = useFieldArray({ control, name: "devices" });
  const units = useWatch({ control, name: "units" });
  const u = unitLabels(units);
  return (
    <>
      <h3 className="font-bold">{t("designSprinklers")}</h3>
      {sprinklers.fields.map((field, i) => (
        <fieldset key={field.id} className={`flex flex-col gap-3 rounded border border-line p-3 ${OFFSCREEN.sprinkler}`}>
          <legend className="px-1 font-bold">{t("sprinklerN", { letter: String.fromCharCode(65 + i) })}</legend>
          <TextField name={`sprinklers.${i}.label`} label={t("label")} />
          <NumberField name={`sprinklers.${i}.k`} label={t("kFactor")} unit={u.k} hint={t("fromTheSprinklerSListing")} />
          <NumberField name={`sprinklers.${i}.minFlow`} label={t("listedFlowForTheCoverage")} unit={u.flow} />
          <NumberField name={`sprinklers.${i}.minPressure`} label={t("listedMinimumPressure")} unit={u.pressure} optional />
          <NumberField
            name={`sprinklers.${i}.coverageArea`}
            label={t("coverageArea")}
            unit={u.area}
            optional
            hint={t("checksNfpa13dSMinimumDensity")}
          />
          <SegmentFields prefix={`sprinklers.${i}.branch`} title={t("branchFromTheSplitPointLength")} />
          {sprinklers.fields.length > 1 ? (
            <Button type="button" variant="secondary" onClick={() => sprinklers.remove(i)}>
              {t("removeThisSprinkler")}
            </Button>
          ) : null}
        </fieldset>
      ))}
      {sprinklers.fields.length < 2 ? (
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            sprinklers.append({ label: t("sprinklerN", { letter: "B" }), k: "4.9", minFlow: "13", minPressure: "", coverageArea: "", branch: { ...emptySegment(t("branchN", { letter: "B" })), length: "0" } })
          }
        >
          {t("addASecondDesignSprinkler")}
        </Button>
      ) : null}

      <h3 className="font-bold">{t("pipeFromTheSourceToThe")}</h3>
      <p className="text-sm text-muted">{t("listTheRunsFromTheWater")}</p>
      {segments.fields.map((field, i) => (
        <div key={field.id} className={`flex flex-col gap-2 ${OFFSCREEN.pipeRun}`}>
          <SegmentFields prefix={`segments.${i}`} title={t("pipeRunN", { n: i + 1 })} />
          <Button type="button" variant="secondary" onClick={() => segments.remove(i)}>
            {t("removePipeRun", { n: i + 1 })}
          </Button>
        </div>
      ))}
      {segments.fields.length < INPUT_CAPS.pipeRuns ? (
        <Button type="button" variant="secondary" onClick={() => segments.append(emptySegment(t("pipeRunN", { n: segments.fields.length + 1 })))}>
          {t("addAPipeRun")}
        </Button>
      ) : null}

      <h3 className="font-bold">{t("devicesLossAtTheDesignFlow")}</h3>
      <p className="text-sm text-muted">{t("meterBackflowPreventerValvesReadEach")}</p>
      {devices.fields.map((field, i) => (
        <fieldset key={field.id} className={`flex flex-col gap-3 rounded border border-line p-3 ${OFFSCREEN.device}`}>
          <legend className="px-1 font-bold">{t("deviceN", { n: i + 1 })}</legend>
          <TextField name={`devices.${i}.label`} label={t("device")} />
          <NumberField name={`devices.${i}.loss`} label={t("loss")} unit={u.pressure} />
          <Button type="button" variant="secondary" onClick={() => devices.remove(i)}>
            {t("removeDevice", { n: i + 1 })}
          </Button>
        </fieldset>
      ))}
      {devices.fields.length < INPUT_CAPS.devices ? (
        <Button type="button" variant="secondary" onClick={() => devices.append({ label: "", loss: "" })}>
          {t("addADevice")}
        </Button>
      ) : null}

      <NumberField
        name="additionalFlow"
        label={t("additionalFlowAtTheSameTime")}
        unit={u.flow}
        optional
        hint={t("forExampleDomesticFlowWhereThe")}
      />

      <SupplyFields />
    </>
  );
});

/**
 * The flow-test comparison. Unticking clears the three readings (blank readings mean "no supply" to
 * the schema) and keeps them to put back if the box is ticked again.
 */
function SupplyFields() {
  const t = useTranslations("tools");
  const { control, getValues, setValue } = useFormParts<SystemDemandFormValues>();
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
        {t("compareWithAHydrantFlowTest")}
      </label>
      {on ? (
        <fieldset className="flex flex-col gap-3 rounded border border-line p-3">
          <legend className="px-1 font-bold">{t("waterSupplyFlowTest")}</legend>
          <NumberField name="supply.staticPressure" label={t("staticPressure")} unit={u.pressure} />
          <NumberField name="supply.residualPressure" label={t("residualPressure")} unit={u.pressure} />
          <NumberField name="supply.testFlow" label={t("testFlow")} unit={u.flow} />
        </fieldset>
      ) : null}
    </>
  );
}

export function SystemDemandCalculator({ initial, embedded }: CalculatorProps) {
  // the first values come from the server with the example's labels in the reader's language (./initial-state.ts)
  const state = useCalculator<SystemDemandFormValues>("system-demand", initial);
  return (
    <CalculatorShell id="system-demand" state={state} embedded={embedded}>
      <DemandFields />
    </CalculatorShell>
  );
}
