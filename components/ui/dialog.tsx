"use client";
import { useTranslations } from "next-intl";
import { useEffect, useId, useRef, type KeyboardEvent } from "react";

const FOCUSABLE = 'a[href], button:not([disabled]), input:not([disabled]):not([type="hidden"]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

/**
 * A modal on the browser's own <dialog> (showModal: the page behind is inert, Escape closes it).
 * Tab and Shift+Tab cycle inside the dialog, and focus goes back to whatever had it before the
 * dialog opened (WAI-ARIA Authoring Practices, "Dialog (Modal)" pattern).
 */
export function Dialog({ open, title, onClose, children }: { open: boolean; title: string; onClose: () => void; children: React.ReactNode }) {
  const t = useTranslations("ui");
  const ref = useRef<HTMLDialogElement>(null);
  const opener = useRef<HTMLElement | null>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      opener.current = document.activeElement instanceof HTMLElement ? document.activeElement : null;
      d.showModal();
    }
    if (!open && d.open) d.close();
  }, [open]);

  function restoreFocus() {
    const el = opener.current;
    opener.current = null;
    if (el && el.isConnected) el.focus();
  }

  function trapTab(e: KeyboardEvent<HTMLDialogElement>) {
    if (e.key !== "Tab" || !ref.current) return;
    const items = [...ref.current.querySelectorAll<HTMLElement>(FOCUSABLE)].filter((el) => el.offsetParent !== null || el === document.activeElement);
    const first = items[0];
    const last = items[items.length - 1];
    if (!first || !last) return;
    if (e.shiftKey && document.activeElement === first) {
      e.preventDefault();
      last.focus();
    } else if (!e.shiftKey && document.activeElement === last) {
      e.preventDefault();
      first.focus();
    }
  }

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={() => {
        onClose();
        restoreFocus();
      }}
      onKeyDown={trapTab}
      className="m-auto w-[min(40rem,calc(100vw-1.5rem))] rounded border border-line bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/60"
    >
      {open ? (
        <div className="flex max-h-[85vh] flex-col">
          <div className="flex items-start justify-between gap-4 border-b border-line px-4 py-3">
            <h2 id={titleId} className="text-xl">
              {title}
            </h2>
            <button type="button" onClick={onClose} className="min-h-11 rounded border border-ink/40 bg-panel px-3 text-sm">
              {t("close")}
            </button>
          </div>
          <div className="overflow-y-auto px-4 py-4">{children}</div>
        </div>
      ) : null}
    </dialog>
  );
}
