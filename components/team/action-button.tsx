"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { postJson } from "@/lib/fetcher";

/**
 * One POST with an optional confirmation, then the page refreshes; the server's message (or its
 * refusal) is shown beside the button.
 */
export function ActionButton({ url, body = {}, label, busyLabel, confirm, ariaLabel, danger, redirectTo }: { redirectTo?: string; url: string; body?: unknown; label: string; busyLabel: string; confirm?: string; ariaLabel?: string; danger?: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <span className="inline-flex flex-col items-start">
      <button
        type="button"
        disabled={busy}
        aria-label={ariaLabel}
        onClick={async () => {
          if (confirm && !window.confirm(confirm)) return;
          setBusy(true);
          setMsg(null);
          const res = await postJson<{ message: string }>(url, body);
          setBusy(false);
          if (!res.ok) return setMsg({ ok: false, text: res.error });
          setMsg({ ok: true, text: res.data.message });
          if (redirectTo) router.push(redirectTo);
          else router.refresh();
        }}
        className={`min-h-11 rounded border px-3 font-bold disabled:opacity-50 ${danger ? "border-caution text-caution" : "border-ink/40"} bg-panel`}
      >
        {busy ? busyLabel : label}
      </button>
      {msg ? (
        <span role={msg.ok ? "status" : "alert"} className={`text-sm ${msg.ok ? "text-ink" : "text-caution"}`}>
          {msg.text}
        </span>
      ) : null}
    </span>
  );
}
