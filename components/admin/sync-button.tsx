"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";

type Outcome = { ok: true; counts: Record<string, number> } | { ok: false; problems: string[] };

/** "Sync now": the server reads content/ afresh and updates the catalog (audited as content.sync). */
export function SyncButton({ onSynced }: { onSynced: () => void }) {
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
      setNotice(`Synced: ${c.modules} modules, ${c.lessons} lessons, ${c.cards} code cards, ${c.questions} questions; ${c.retired} newly retired.`);
      onSynced();
      return;
    }
    // The failed run and its problems show in "Last sync" once the page refreshes.
    setError(r.ok ? "The sync did not finish." : r.error);
    onSynced();
  }

  return (
    <div className="flex flex-col gap-3" aria-live="polite">
      <Button type="button" onClick={sync} disabled={busy} className="self-start">
        {busy ? "Syncing…" : "Sync now"}
      </Button>
      <FormNotice message={notice} />
      <FormError message={error} />
    </div>
  );
}
