"use client";

import { useTranslations } from "next-intl";
import { createContext, useContext, useId, useMemo, type ReactNode, type SelectHTMLAttributes } from "react";
import { get, useFormState, type FieldValues, type UseFormReturn } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { SelectField as PlainSelectField } from "@/components/ui/select-field";

/** the parts of a form that never change while it lives */
type FormParts<T extends FieldValues> = Pick<UseFormReturn<T>, "control" | "register" | "getValues" | "setValue">;
const PartsContext = createContext<FormParts<FieldValues> | null>(null);

/**
 * Gives the fields below it the form's fixed parts. Unlike react-hook-form's FormProvider, whose
 * value changes with every change of the form's state, this one never changes: each field
 * re-renders on its own subscriptions (its errors, the values it watches), not on every change
 * anywhere in the form (which re-rendered every field of a long form, once more right after the
 * page hydrated).
 */
export function FormPartsProvider<T extends FieldValues>({ form, children }: { form: FormParts<T>; children: ReactNode }) {
  const { control, register, getValues, setValue } = form;
  const value = useMemo(() => ({ control, register, getValues, setValue }), [control, register, getValues, setValue]);
  return <PartsContext.Provider value={value as unknown as FormParts<FieldValues>}>{children}</PartsContext.Provider>;
}

export function useFormParts<T extends FieldValues = FieldValues>(): FormParts<T> {
  const parts = useContext(PartsContext);
  if (!parts) throw new Error("a calculator field outside its form");
  return parts as unknown as FormParts<T>;
}

/** the field's current error message, from a subscription to the form's errors */
function useFieldError(name: string): string | undefined {
  const { control } = useFormParts();
  const { errors } = useFormState({ control });
  return (get(errors, name) as { message?: string } | undefined)?.message;
}

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
  const { register } = useFormParts();
  const error = useFieldError(name);
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
  const { register } = useFormParts();
  const error = useFieldError(name);
  return <PlainSelectField data-field={name} error={error} {...rest} {...register(name)} />;
}

export function TextField({ name, label }: { name: string; label: string }) {
  const { register } = useFormParts();
  return <Field label={label} error={useFieldError(name)} autoComplete="off" data-field={name} {...register(name)} />;
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
