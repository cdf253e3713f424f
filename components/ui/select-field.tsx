import { forwardRef, useId, type SelectHTMLAttributes } from "react";
import { useErrorText } from "./use-error-text";

type Option = { value: string; label: string };
type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { label: string; options: Option[]; error?: string; hint?: string };

/** A labelled select with its own error, tied together for screen readers (same look as Field). */
export const SelectField = forwardRef<HTMLSelectElement, SelectProps>(function SelectField({ label, options, error, hint, id, className = "", ...props }, ref) {
  const shown = useErrorText()(error);
  const auto = useId();
  const selectId = id ?? auto;
  const described = [error ? `${selectId}-error` : null, hint ? `${selectId}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={selectId} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={`${selectId}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      ) : null}
      <select
        ref={ref}
        id={selectId}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className={`min-h-11 w-full min-w-0 rounded border bg-panel px-3 py-2 text-ink ${error ? "border-caution" : "border-ink/40"} ${className}`}
        {...props}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error ? (
        <p id={`${selectId}-error`} className="text-sm font-bold text-caution" role="alert">
          {shown}
        </p>
      ) : null}
    </div>
  );
});

// The textarea lives in components/ui/textarea-field.tsx; re-exported for existing imports.
export { TextAreaField } from "./textarea-field";
