"use client";

import { useTranslations } from "next-intl";
import { useWatch } from "react-hook-form";
import type { CalculatorFormValues } from "@/lib/hydraulics/browser";
import { CalculatorShell, useCalculator } from "./calculator-shell";
import { NumberField } from "./fields";
import { unitLabels } from "./unit-labels";
import type { CalculatorProps } from "./types";

export function RoomCoverageCalculator({ initial, embedded }: CalculatorProps) {
  const t = useTranslations("tools");
  const state = useCalculator<CalculatorFormValues["room-coverage"]>("room-coverage", initial);
  const units = useWatch({ control: state.form.control, name: "units" });
  const u = unitLabels(units);
  return (
    <CalculatorShell id="room-coverage" state={state} embedded={embedded}>
      <NumberField name="length" label={t("roomLength")} unit={u.length} />
      <NumberField name="width" label={t("roomWidth")} unit={u.length} />
      <NumberField name="maxSpacing" label={t("listedMaximumSpacing")} unit={u.length} hint={t("fromTheSprinklerSListing")} />
      <NumberField name="maxArea" label={t("listedMaximumCoverageArea")} unit={u.area} />
      <NumberField name="minSpacing" label={t("listedMinimumSpacing")} unit={u.length} optional />
      <NumberField name="maxWallDistance" label={t("listedMaximumDistanceToAWall")} unit={u.length} optional />
    </CalculatorShell>
  );
}
