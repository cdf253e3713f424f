import { forwardRef, useId, type SelectHTMLAttributes, type TextareaHTMLAttributes } from "react";

type Option = { value: string; label: string };
type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & { label: string; options: Option[]; error?: string; hint?: string };

/** A labelled select with its own error, tied together for screen readers (same look as Field). */
export const SelectField = forwardRef<HTMLSelectElement, SelectProps>(function SelectField({ label, options, error, hint, id, className = "", ...props }, ref) {
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
          {error}
        </p>
      ) : null}
    </div>
  );
});

type AreaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string; hint?: string };

export const TextAreaField = forwardRef<HTMLTextAreaElement, AreaProps>(function TextAreaField({ label, error, hint, id, className = "", ...props }, ref) {
  const auto = useId();
  const areaId = id ?? auto;
  const described = [error ? `${areaId}-error` : null, hint ? `${areaId}-hint` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={areaId} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={`${areaId}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      ) : null}
      <textarea
        ref={ref}
        id={areaId}
        rows={2}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        className={`rounded border bg-panel px-3 py-2 text-ink ${error ? "border-caution" : "border-ink/40"} ${className}`}
        {...props}
      />
      {error ? (
        <p id={`${areaId}-error`} className="text-sm font-bold text-caution" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
});
