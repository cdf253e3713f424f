"use client";
import { useEffect, useId, useRef } from "react";

/** A modal on the browser's own <dialog>: focus stays inside, Escape closes it, focus returns afterwards. */
export function Dialog({ open, title, onClose, children }: { open: boolean; title: string; onClose: () => void; children: React.ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={onClose}
      className="m-auto w-[min(40rem,calc(100vw-1.5rem))] rounded border border-line bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/60"
    >
      {open ? (
        <div className="flex max-h-[85vh] flex-col">
          <div className="flex items-start justify-between gap-4 border-b border-line px-4 py-3">
            <h2 id={titleId} className="text-xl">
              {title}
            </h2>
            <button type="button" onClick={onClose} className="min-h-11 rounded border border-ink/40 bg-panel px-3 text-sm">
              Close
            </button>
          </div>
          <div className="overflow-y-auto px-4 py-4">{children}</div>
        </div>
      ) : null}
    </dialog>
  );
}
