"use client";
import { useEffect, useRef, useState } from "react";

/**
 * A polite live region for screen readers that speaks a message once it has stopped changing for
 * `delay` ms, and never repeats the same words twice in a row: typing in a search box, answering
 * quiz questions or a rising upload percentage give one announcement per pause, not one per
 * keystroke. The visible text beside it stays out of any live region. Empty messages say nothing.
 */
export function LiveMessage({ message, delay = 800, testId }: { message: string; delay?: number; testId?: string }) {
  const [spoken, setSpoken] = useState("");
  const lastSaid = useRef("");
  useEffect(() => {
    if (!message) return;
    const t = setTimeout(() => {
      if (message === lastSaid.current) return;
      lastSaid.current = message;
      setSpoken(message);
    }, delay);
    return () => clearTimeout(t);
  }, [message, delay]);
  return (
    <p role="status" aria-live="polite" aria-atomic="true" className="sr-only" data-testid={testId}>
      {spoken}
    </p>
  );
}
