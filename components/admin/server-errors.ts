import type { FieldValues, Path, UseFormSetError } from "react-hook-form";

/** Puts a route handler's `fieldErrors` next to their fields; returns the message for the form when none matched. */
export function applyServerErrors<T extends FieldValues>(setError: UseFormSetError<T>, fields: readonly string[], result: { error: string; fieldErrors?: Record<string, string[]> }): string | null {
  let placed = false;
  for (const [name, messages] of Object.entries(result.fieldErrors ?? {})) {
    if (fields.includes(name) && messages[0]) {
      setError(name as Path<T>, { type: "server", message: messages[0] });
      placed = true;
    }
  }
  return placed ? null : result.error;
}
