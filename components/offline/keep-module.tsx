"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { keepModule, removeModule } from "@/lib/offline/browser";
import { formatBytes, formatWhen } from "./format";
import { useOfflineState, useOnline } from "./use-offline";

/**
 * "Keep on this phone" on a module page: stores the module's lessons, the cards they link to, the
 * glossary and the calculators so they open with no signal (lib/offline).
 */
export function KeepModule({ module }: { module: string }) {
  const { ready, supported, saved } = useOfflineState();
  const online = useOnline();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const kept = saved.find((s) => s.module === module);
  if (!ready) return null;
  if (!supported) return <p className="text-sm text-muted">This browser cannot keep pages for use without a connection.</p>;

  async function keep() {
    setBusy(true);
    setProblem(null);
    try {
      await keepModule(module);
    } catch (err) {
      setProblem(err instanceof Error ? err.message : String(err));
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="keep-h" className="max-w-prose rounded border border-line bg-panel p-4" data-testid="keep-module">
      <h2 id="keep-h" className="text-xl">Use it with no signal</h2>
      {kept ? (
        <p className="mt-2" role="status" data-testid="kept-status">
          ✓ Kept on this phone: {kept.pages} pages, {formatBytes(kept.bytes)}, saved {formatWhen(kept.savedAt)}. Lessons, linked cards,
          the glossary and the calculators open without a connection. Quizzes still need one.
        </p>
      ) : (
        <p className="mt-2 text-muted">Store this module&apos;s lessons, the code cards they link to, the glossary and the field calculators on this phone for basements, attics and sites with no signal.</p>
      )}
      <div className="mt-3 flex flex-wrap gap-3">
        {kept ? (
          <Button variant="secondary" onClick={() => void removeModule(module)} disabled={busy}>Remove from this phone</Button>
        ) : (
          <Button onClick={keep} disabled={busy || !online}>{busy ? "Saving…" : "Keep on this phone"}</Button>
        )}
        <Link href="/offline" className="inline-flex min-h-11 items-center">What this phone keeps</Link>
      </div>
      {!online && !kept ? <p className="mt-2 text-sm text-muted">Saving needs a connection.</p> : null}
      {problem ? <p role="alert" className="mt-2 text-caution">{problem}</p> : null}
    </section>
  );
}
