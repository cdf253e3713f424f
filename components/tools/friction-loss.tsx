"use client";

import { useTranslations } from "next-intl";
import { useMemo } from "react";
import { useWatch } from "react-hook-form";
import { PIPE_MATERIALS, sizesFor, type CalculatorFormValues } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField, SelectField } from "./fields";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps, CalculatorWords } from "./types";

/** the pipe materials with their names in the reader's language (from the server: ./initial-state.ts) */
export function useMaterialOptions(words: CalculatorWords) {
  return useMemo(() => PIPE_MATERIALS.map((m) => ({ value: m, label: words.materials[m] ?? m })), [words]);
}
export const sizeOptions = (material: string | undefined) =>
  sizesFor((PIPE_MATERIALS as readonly string[]).includes(material ?? "") ? (material as (typeof PIPE_MATERIALS)[number]) : "copper-l").map(
    (s) => ({ value: s, label: `${s} in` }),
  );

export function FrictionLossCalculator({ initial, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const materialOptions = useMaterialOptions(initial.words);
  const state = useCalculator<CalculatorFormValues["friction-loss"]>("friction-loss", initial);
  const [units, material] = useWatch({ control: state.form.control, name: ["units", "material"] });
  const u = unitLabels(units);
  const plastic = material === "cpvc" || material === "pex";
  return (
    <CalculatorShell id="friction-loss" state={state} embedded={embedded}>
      <SelectField name="material" label={t("pipeMaterial")} options={materialOptions} />
      <SelectField name="nominalSize" label={t("nominalSize")} options={sizeOptions(material)} />
      <NumberField name="flow" label={t("flow")} unit={u.flow} />
      <NumberField name="length" label={t("pipeLength")} unit={u.length} />
      <NumberField
        name="elbows"
        label={t("90Elbows")}
        optional
        hint={plastic ? t("steelAndCopperOnlyNfpa13") : t("equivalentLengthsFromNfpa13S")}
      />
      <NumberField name="teeBranches" label={t("teesWithTheFlowTurned90")} optional />
      <NumberField
        name="listedFittingsLength"
        label={plastic ? t("fittingsTotalListedEquivalentLength") : t("otherFittingsListedEquivalentLength")}
        unit={u.length}
        optional
        hint={plastic ? t("cpvcAndPexFittingsUseThe") : undefined}
      />
      <details className="rounded border border-line bg-panel p-3">
        <summary className="cursor-pointer font-bold">{t("makerSListedValuesOptional")}</summary>
        <div className="mt-3 flex flex-col gap-4">
          <NumberField
            name="insideDiameter"
            label={t("listedInsideDiameter")}
            unit={u.diameter}
            optional
            hint={
              plastic
                ? t("idHintPlastic")
                : t("idHintSteel")
            }
          />
          <NumberField name="cFactor" label={t("cFactor")} optional hint={t("leaveBlankForTheNfpa13")} />
        </div>
      </details>
    </CalculatorShell>
  );
}
