"use client";
import { useEffect, useId, useRef, useState, type MouseEvent } from "react";
import { useTranslations } from "next-intl";
import { useFormState, type Control, type FieldValues } from "react-hook-form";
import { useErrorText } from "./use-error-text";

export type SummaryItem = { field: string; message: string };

/** The field element a summary line points at: a form control by name, else an element by id. */
function fieldElement(form: HTMLFormElement | null, field: string): HTMLElement | null {
  const named = form?.elements.namedItem(field);
  const el = named instanceof RadioNodeList ? (named[0] as HTMLElement | undefined) : named;
  if (el instanceof HTMLElement) return el;
  return document.getElementById(field);
}

/** The label a person sees beside the field (its <label>, aria-label or fieldset legend). */
function fieldLabel(el: HTMLElement): string {
  const own = (el as HTMLInputElement).labels?.[0]?.textContent;
  const legend = el.closest("fieldset")?.querySelector("legend")?.textContent;
  return (own ?? el.getAttribute("aria-label") ?? legend ?? "").trim();
}

type Line = SummaryItem & { href: string | null; label: string };

/**
 * The error summary of a react-hook-form form (the public-sector error summary pattern): after a
 * submit that ends with errors it lists each one as a link to its field and takes the focus, so a
 * keyboard or screen-reader user hears what went wrong and can jump to each field. Errors that
 * appear while typing never move the focus. `extra` adds errors the form keeps outside
 * react-hook-form (a file input).
 */
export function ErrorSummary<T extends FieldValues>({ control, extra = [] }: { control: Control<T>; extra?: (SummaryItem | null)[] }) {
  const t = useTranslations("ui");
  const errorText = useErrorText();
  const { errors, submitCount, isSubmitting } = useFormState({ control });
  const box = useRef<HTMLDivElement>(null);
  const handled = useRef(0);
  const titleId = useId();
  const [resolved, setResolved] = useState<{ key: string; lines: Line[] }>({ key: "[]", lines: [] });
  const lines = resolved.lines;
  const items: SummaryItem[] = [
    ...Object.entries(errors).flatMap(([field, e]) => {
      const message = (e as { message?: unknown } | undefined)?.message;
      return typeof message === "string" && message ? [{ field, message: errorText(message) }] : [];
    }),
    ...extra.filter((x): x is SummaryItem => Boolean(x?.message)).map((x) => ({ ...x, message: errorText(x.message) })),
  ];
  const key = JSON.stringify(items);

  // Links need the fields' ids and labels, which only the rendered form knows.
  useEffect(() => {
    const form = box.current?.closest("form") ?? null;
    const parsed = JSON.parse(key) as SummaryItem[];
    setResolved({
      key,
      lines: parsed.map((i) => {
        const el = fieldElement(form, i.field);
        if (el && !el.id) el.id = `field-${i.field}`;
        return { ...i, href: el ? `#${el.id}` : null, label: el ? fieldLabel(el) : "" };
      }),
    });
  }, [key]);

  // Focus moves here once per submit that ended with errors.
  useEffect(() => {
    if (isSubmitting || submitCount === handled.current) return;
    if (resolved.key !== key) return; // the links are not resolved yet
    handled.current = submitCount;
    if (lines.length > 0) box.current?.focus();
  }, [submitCount, isSubmitting, resolved, key, lines]);

  function jump(e: MouseEvent<HTMLAnchorElement>, href: string) {
    const el = document.getElementById(href.slice(1));
    if (!el) return;
    e.preventDefault();
    el.focus();
    el.scrollIntoView({ block: "center" });
  }

  return (
    <div ref={box} tabIndex={-1} aria-labelledby={lines.length ? titleId : undefined} hidden={lines.length === 0} data-testid="error-summary" className="col-span-full rounded border-2 border-caution bg-panel p-3">
      {lines.length ? (
        <>
          <h2 id={titleId} className="text-lg text-caution">
            {t("problemTitle")}
          </h2>
          <ul className="mt-1 list-disc pl-5">
            {lines.map((l) => (
              <li key={l.field}>
                {l.href ? (
                  <a href={l.href} onClick={(e) => jump(e, l.href!)} className="font-bold text-caution">
                    {l.label && !l.message.startsWith(l.label) ? `${l.label}: ${l.message}` : l.message}
                  </a>
                ) : (
                  <span className="font-bold text-caution">{l.message}</span>
                )}
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </div>
  );
}
