"use client";
import { useTranslations } from "next-intl";
import { useEffect, useId, useRef, useState } from "react";

/**
 * A glossary term: a button that shows its definition; Escape or a second press closes it.
 * `english` (Spanish lessons): a line naming the English term, e.g. "En inglés: Sprinkler riser".
 */
export function TermPopover({ term, definition, english, children }: { term: string; definition: string; english?: string; children: React.ReactNode }) {
  const t = useTranslations("lesson");
  const [open, setOpen] = useState(false);
  const id = useId();
  const ref = useRef<HTMLSpanElement>(null);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && setOpen(false);
    const onClick = (e: MouseEvent) => ref.current && !ref.current.contains(e.target as Node) && setOpen(false);
    document.addEventListener("keydown", onKey);
    document.addEventListener("mousedown", onClick);
    return () => {
      document.removeEventListener("keydown", onKey);
      document.removeEventListener("mousedown", onClick);
    };
  }, [open]);
  return (
    <span ref={ref} className="relative inline">
      <button
        type="button"
        className="cursor-help border-b-2 border-dotted border-water text-left text-ink"
        aria-expanded={open}
        aria-controls={id}
        onClick={() => setOpen((o) => !o)}
      >
        {children}
        <span className="sr-only">{` ${t("glossaryTerm")}`}</span>
      </button>
      <span
        id={id}
        role="note"
        hidden={!open}
        className="absolute left-0 top-full z-20 mt-1 block w-72 max-w-[80vw] rounded border border-ink/30 bg-panel p-3 text-sm shadow-lg"
      >
        <strong className="block">{term}</strong>
        {english ? <span className="block text-muted" data-testid="term-english">{english}</span> : null}
        {definition}
      </span>
    </span>
  );
}
