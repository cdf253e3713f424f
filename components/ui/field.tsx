import { forwardRef, useId, type InputHTMLAttributes } from "react";
import { useErrorText } from "./use-error-text";

type FieldProps = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: string };

/** A labelled input with its own error, tied together for screen readers. */
export const Field = forwardRef<HTMLInputElement, FieldProps>(function Field({ label, error, hint, id, className = "", ...props }, ref) {
  const auto = useId();
  const shown = useErrorText()(error);
  const inputId = id ?? auto;
  const errorId = `${inputId}-error`;
  const hintId = `${inputId}-hint`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-muted">
          {hint}
        </p>
      ) : null}
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={[error ? errorId : null, hint ? hintId : null].filter(Boolean).join(" ") || undefined}
        className={`min-h-11 rounded border bg-panel px-3 py-2 text-ink ${error ? "border-caution" : "border-ink/40"} ${className}`}
        {...props}
      />
      {error ? (
        <p id={errorId} className="text-sm font-bold text-caution" role="alert">
          {shown}
        </p>
      ) : null}
    </div>
  );
});

export function FormError({ message }: { message?: string | null }) {
  const shown = useErrorText()(message);
  if (!shown) return null;
  return (
    <p role="alert" className="rounded border border-caution bg-caution-light px-3 py-2 text-caution">
      {shown}
    </p>
  );
}

export function FormNotice({ message }: { message?: string | null }) {
  const shown = useErrorText()(message);
  if (!shown) return null;
  return (
    <p role="status" className="rounded border border-pass bg-pass-light px-3 py-2 text-pass">
      {shown}
    </p>
  );
}
