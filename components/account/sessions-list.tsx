"use client";
import { useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import type { OwnSession } from "@/lib/account";
import { authClient } from "@/components/auth/auth-client";
import { getJson } from "@/lib/fetcher";
import { serverFirst } from "@/components/ui/server-first";
import { utcStamp } from "@/lib/dates";

const when = (iso: string) => utcStamp(iso);

/** Where the person is signed in, with "sign out everywhere else" (better-auth revokeOtherSessions). */
const KEY = "/api/account/sessions";

/** `initial`: the sessions the server page already listed (not fetched again on mount). */
export function SessionsList({ initial }: { initial?: { sessions: OwnSession[] } }) {
  const { data, error, isLoading, mutate } = useSWR<{ sessions: OwnSession[] }>(KEY, getJson, serverFirst(KEY, initial && { key: KEY, data: initial }));
  const [busy, setBusy] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [actionError, setActionError] = useState<string | null>(null);
  const others = data ? data.sessions.filter((s) => !s.current).length : 0;

  async function signOutOthers() {
    setBusy(true);
    setNotice(null);
    setActionError(null);
    const { error } = await authClient.revokeOtherSessions();
    setBusy(false);
    if (error) return setActionError(error.message ?? "Could not sign out the other devices. Try again.");
    setNotice(`Signed out everywhere else (${others} session${others === 1 ? "" : "s"} ended).`);
    void mutate();
  }

  return (
    <div className="flex flex-col gap-3" aria-busy={isLoading}>
      <div aria-live="polite">
        <FormNotice message={notice} />
      </div>
      <FormError message={actionError} />
      {error ? (
        <div role="alert" className="flex flex-wrap items-center gap-3 rounded border border-caution bg-caution-light px-3 py-2 text-caution">
          <span>Could not load your sessions: {(error as Error).message}</span>
          <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-caution bg-panel px-3 font-bold">
            Try again
          </button>
        </div>
      ) : null}
      {!data && isLoading ? <p className="text-muted">Loading your sessions…</p> : null}
      {data && data.sessions.length === 0 ? <p>No active sessions.</p> : null}
      {data && data.sessions.length > 0 ? (
        <ul className="flex flex-col gap-2" data-testid="session-list">
          {data.sessions.map((s) => (
            <li key={s.id} className="rounded border border-line bg-panel p-3">
              <p className="font-bold">
                {s.device}
                {s.current ? <span className="ml-2 rounded bg-pass-light px-2 py-0.5 text-sm text-pass">This device</span> : null}
              </p>
              <p className="text-sm text-muted">
                Signed in <span className="font-mono">{when(s.createdAt)}</span> · last active <span className="font-mono">{when(s.lastActiveAt)}</span>
                {s.ipAddress ? (
                  <>
                    {" "}
                    · from <span className="font-mono">{s.ipAddress}</span>
                  </>
                ) : null}
              </p>
            </li>
          ))}
        </ul>
      ) : null}
      <Button type="button" variant="secondary" onClick={signOutOthers} disabled={busy || !data || others === 0} className="self-start">
        {busy ? "Signing out…" : "Sign out everywhere else"}
      </Button>
      {data && others === 0 ? <p className="text-sm text-muted">You are signed in on this device only.</p> : null}
    </div>
  );
}
