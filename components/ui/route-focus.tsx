"use client";
import { usePathname } from "next/navigation";
import { useEffect, useRef } from "react";

/**
 * After a client-side navigation the focus moves to the new page's heading (its h1, made
 * focusable with tabindex=-1), so keyboard and screen-reader users start reading the new page
 * instead of staying on the link they left. The first load keeps the browser's own focus order
 * (the skip link first). Changes of the query only (filters, search) keep the focus where it is.
 */
export function RouteFocus() {
  const pathname = usePathname();
  const last = useRef<string | null>(null);
  useEffect(() => {
    const before = last.current;
    last.current = pathname;
    if (before === null || before === pathname) return;
    let frames = 0;
    let raf = 0;
    const tryFocus = () => {
      const h1 = document.querySelector<HTMLElement>("main h1");
      if (!h1) {
        if (frames++ < 120) raf = requestAnimationFrame(tryFocus);
        return;
      }
      if (!h1.hasAttribute("tabindex")) h1.setAttribute("tabindex", "-1");
      h1.focus({ preventScroll: true });
    };
    tryFocus();
    return () => cancelAnimationFrame(raf);
  }, [pathname]);
  return null;
}
