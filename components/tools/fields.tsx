"use client";

import { useTranslations } from "next-intl";
import { useId, type SelectHTMLAttributes } from "react";
import { get, useFormContext } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { SelectField as PlainSelectField } from "@/components/ui/select-field";

/** a number typed as text (so a typo shows as a field error rather than vanishing), wired to the form */
export function NumberField({
  name,
  label,
  unit,
  hint,
  optional,
}: {
  name: string;
  label: string;
  unit?: string;
  hint?: string;
  optional?: boolean;
}) {
  const t = useTranslations("tools");
  const {
    register,
    formState: { errors },
  } = useFormContext();
  const error = (get(errors, name) as { message?: string } | undefined)?.message;
  return (
    <Field
      label={`${label}${unit ? ` (${unit})` : ""}${optional ? ` — ${t("optional")}` : ""}`}
      hint={hint}
      error={error}
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      className="font-mono"
      data-field={name}
      {...register(name)}
    />
  );
}

/** the shared labelled select (components/ui/select-field), wired to the form with its error */
export function SelectField({
  name,
  ...rest
}: { name: string; label: string; options: { value: string; label: string }[]; hint?: string } & SelectHTMLAttributes<HTMLSelectElement>) {
  const {
    register,
    formState: { errors },
  } = useFormContext();
  const error = (get(errors, name) as { message?: string } | undefined)?.message;
  return <PlainSelectField data-field={name} error={error} {...rest} {...register(name)} />;
}

export function TextField({ name, label }: { name: string; label: string }) {
  const {
    register,
    formState: { errors },
  } = useFormContext();
  return <Field label={label} error={(get(errors, name) as { message?: string } | undefined)?.message} autoComplete="off" data-field={name} {...register(name)} />;
}

/** US / SI switch: converts what is typed when flipped */
export function UnitSwitch({ units, onSwitch }: { units: "us" | "si"; onSwitch: (next: "us" | "si") => void }) {
  const t = useTranslations("tools");
  const name = useId();
  const options = [
    { value: "us" as const, label: t("unitsUs") },
    { value: "si" as const, label: t("unitsSi") },
  ];
  return (
    <fieldset className="flex flex-wrap items-center gap-3">
      <legend className="mb-1 font-bold">{t("units")}</legend>
      {options.map((o) => (
        <label
          key={o.value}
          className={`inline-flex min-h-11 cursor-pointer items-center gap-2 rounded border px-3 py-2 ${units === o.value ? "border-water bg-water-light" : "border-line bg-panel"}`}
        >
          <input type="radio" name={name} value={o.value} checked={units === o.value} onChange={() => onSwitch(o.value)} />
          {o.label}
        </label>
      ))}
    </fieldset>
  );
}
