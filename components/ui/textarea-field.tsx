import { forwardRef, useId, type TextareaHTMLAttributes } from "react";
import { useErrorText } from "./use-error-text";

type AreaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string; hint?: string };

/** A labelled textarea with its hint and error tied to it for screen readers (the textarea twin of Field). */
export const TextAreaField = forwardRef<HTMLTextAreaElement, AreaProps>(function TextAreaField({ label, error, hint, id, className = "", ...props }, ref) {
  const shown = useErrorText()(error);
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
          {shown}
        </p>
      ) : null}
    </div>
  );
});
