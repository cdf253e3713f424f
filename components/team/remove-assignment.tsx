"use client";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { postJson } from "@/lib/fetcher";

export function RemoveAssignment({ id, label }: { id: number; label: string }) {
  const t = useTranslations("team");
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-col items-start">
      <button
        type="button"
        disabled={busy}
        aria-label={t("assign.removeLabel", { label })}
        onClick={async () => {
          setBusy(true);
          setError(null);
          const res = await postJson(`/api/team/assignments/${id}`, {}, "DELETE");
          setBusy(false);
          if (!res.ok) return setError(res.error);
          router.refresh();
        }}
        className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold disabled:opacity-50"
      >
        {busy ? t("assign.removing") : t("assign.remove")}
      </button>
      {error ? <span role="alert" className="text-sm text-caution">{error}</span> : null}
    </span>
  );
}
