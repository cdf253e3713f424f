"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";

type Outcome = { ok: true; counts: Record<string, number> } | { ok: false; problems: string[] };

/** "Sync now": the server reads content/ afresh and updates the catalog (audited as content.sync). */
export function SyncButton({ onSynced }: { onSynced: () => void }) {
  const t = useTranslations("admin");
  const [busy, setBusy] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);

  async function sync() {
    setBusy(true);
    setNotice(null);
    setError(null);
    const r = await postJson<Outcome>("/api/admin/content/sync", {});
    setBusy(false);
    if (r.ok && r.data.ok) {
      const c = r.data.counts;
      setNotice(t("sync.done", { modules: c.modules ?? 0, lessons: c.lessons ?? 0, cards: c.cards ?? 0, questions: c.questions ?? 0, retired: c.retired ?? 0 }));
      onSynced();
      return;
    }
    // The failed run and its problems show in "Last sync" once the page refreshes.
    setError(r.ok ? t("sync.unfinished") : r.error);
    onSynced();
  }

  return (
    <div className="flex flex-col gap-3" aria-live="polite">
      <Button type="button" onClick={sync} disabled={busy} className="self-start">
        {busy ? t("sync.busy") : t("sync.now")}
      </Button>
      <FormNotice message={notice} />
      <FormError message={error} />
    </div>
  );
}
