"use client";

import { useTranslations } from "next-intl";
import { createContext, useContext, useId, useMemo, type ReactNode, type SelectHTMLAttributes } from "react";
import { get, useFormState, type FieldValues, type UseFormReturn } from "react-hook-form";
import { useErrorText } from "@/components/ui/use-error-text";
import type { CalculatorWords } from "./types";

/** the parts of a form that never change while it lives, and the catalog words its fields show */
type FormParts<T extends FieldValues> = Pick<UseFormReturn<T>, "control" | "register" | "getValues" | "setValue"> & { words: CalculatorWords };
const PartsContext = createContext<FormParts<FieldValues> | null>(null);

/**
 * Gives the fields below it the form's fixed parts. Unlike react-hook-form's FormProvider, whose
 * value changes with every change of the form's state, this one never changes: each field
 * re-renders on its own subscriptions (its errors, the values it watches), not on every change
 * anywhere in the form (which re-rendered every field of a long form, once more right after the
 * page hydrated).
 */
export function FormPartsProvider<T extends FieldValues>({
  form,
  words,
  children,
}: {
  form: Omit<FormParts<T>, "words">;
  words: CalculatorWords;
  children: ReactNode;
}) {
  const { control, register, getValues, setValue } = form;
  const value = useMemo(() => ({ control, register, getValues, setValue, words }), [control, register, getValues, setValue, words]);
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

/**
 * The error under a field, in the reader's language (components/ui/use-error-text). Its own
 * component, rendered only while there is an error, so the dozens of error-free fields of a long
 * form do not each read the errors catalog when the page hydrates.
 */
function FieldErrorText({ id, error }: { id: string; error: string }) {
  const shown = useErrorText()(error);
  return (
    <p id={id} className="text-sm font-bold text-caution" role="alert">
      {shown}
    </p>
  );
}

/** the ids that tie a field's label, hint and error to its control, for screen readers */
function useFieldIds(name: string, error: string | undefined, hint: string | undefined) {
  const id = useId();
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return {
    id,
    errorId,
    hintId,
    controlProps: {
      id,
      "data-field": name,
      "aria-invalid": error ? true : undefined,
      "aria-describedby": [error ? errorId : null, hint ? hintId : null].filter(Boolean).join(" ") || undefined,
    },
  };
}

/**
 * Label, hint, the control and its error: the same markup as the shared components/ui Field and
 * SelectField, written out here as a plain function (no hooks) that each field calls, so each
 * calculator field is one component rather than two (a system demand form has some seventy fields
 * to hydrate).
 */
function fieldFrame({ id, label, hint, hintId, error, errorId, children }: { id: string; label: string; hint?: string; hintId: string; error?: string; errorId: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-muted">
          {hint}
        </p>
      ) : null}
      {children}
      {error ? <FieldErrorText id={errorId} error={error} /> : null}
    </div>
  );
}

const inputClass = (error: string | undefined) => `min-h-11 rounded border bg-panel px-3 py-2 text-ink ${error ? "border-caution" : "border-ink/40"}`;

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
  const { id, errorId, hintId, controlProps } = useFieldIds(name, error, hint);
  const full = `${label}${unit ? ` (${unit})` : ""}${optional ? ` — ${t("optional")}` : ""}`;
  return fieldFrame({
    id,
    label: full,
    hint,
    hintId,
    error,
    errorId,
    children: <input inputMode="decimal" autoComplete="off" spellCheck={false} className={`${inputClass(error)} font-mono`} {...controlProps} {...register(name)} />,
  });
}

/** a labelled select wired to the form with its error (the look of components/ui/select-field) */
export function SelectField({
  name,
  label,
  options,
  hint,
  ...rest
}: { name: string; label: string; options: { value: string; label: string }[]; hint?: string } & SelectHTMLAttributes<HTMLSelectElement>) {
  const { register } = useFormParts();
  const error = useFieldError(name);
  const { id, errorId, hintId, controlProps } = useFieldIds(name, error, hint);
  return fieldFrame({
    id,
    label,
    hint,
    hintId,
    error,
    errorId,
    children: (
      <select className={`${inputClass(error)} w-full min-w-0`} {...rest} {...controlProps} {...register(name)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    ),
  });
}

export function TextField({ name, label }: { name: string; label: string }) {
  const { register } = useFormParts();
  const error = useFieldError(name);
  const { id, errorId, hintId, controlProps } = useFieldIds(name, error, undefined);
  return fieldFrame({ id, label, hintId, error, errorId, children: <input autoComplete="off" className={inputClass(error)} {...controlProps} {...register(name)} /> });
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
