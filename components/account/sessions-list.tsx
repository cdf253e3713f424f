"use client";
import { useFormatter, useTranslations } from "next-intl";
import { useState } from "react";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import type { OwnSession } from "@/lib/account";
import { authClient } from "@/components/auth/auth-client";
import { getJson } from "@/lib/fetcher";
import { serverFirst } from "@/components/ui/server-first";


/** Where the person is signed in, with "sign out everywhere else" (better-auth revokeOtherSessions). */
const KEY = "/api/account/sessions";

/** `initial`: the sessions the server page already listed (not fetched again on mount). */
export function SessionsList({ initial }: { initial?: { sessions: OwnSession[] } }) {
  const t = useTranslations("account");
  const format = useFormatter();
  const when = (iso: string) => format.dateTime(new Date(iso), { year: "numeric", month: "short", day: "numeric", hour: "numeric", minute: "2-digit", timeZoneName: "short" });
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
    if (error) return setActionError(error.message ?? t("signOutFailed"));
    setNotice(t("signedOutElsewhere", { count: others }));
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
          <span>{t("sessionsFailed", { message: (error as Error).message })}</span>
          <button type="button" onClick={() => mutate()} className="min-h-11 rounded border border-caution bg-panel px-3 font-bold">
            {t("tryAgain")}
          </button>
        </div>
      ) : null}
      {!data && isLoading ? <p className="text-muted">{t("loadingSessions")}</p> : null}
      {data && data.sessions.length === 0 ? <p>{t("noSessions")}</p> : null}
      {data && data.sessions.length > 0 ? (
        <ul className="flex flex-col gap-2" data-testid="session-list">
          {data.sessions.map((s) => (
            <li key={s.id} className="rounded border border-line bg-panel p-3">
              <p className="font-bold">
                {s.device}
                {s.current ? <span className="ml-2 rounded bg-pass-light px-2 py-0.5 text-sm text-pass">{t("thisDevice")}</span> : null}
              </p>
              <p className="text-sm text-muted">
                {t("signedIn")} <span className="font-mono">{when(s.createdAt)}</span> · {t("lastActive")} <span className="font-mono">{when(s.lastActiveAt)}</span>
                {s.ipAddress ? (
                  <>
                    {" "}
                    · {t("from")} <span className="font-mono">{s.ipAddress}</span>
                  </>
                ) : null}
              </p>
            </li>
          ))}
        </ul>
      ) : null}
      <Button type="button" variant="secondary" onClick={signOutOthers} disabled={busy || !data || others === 0} className="self-start">
        {busy ? t("signingOut") : t("signOutElsewhere")}
      </Button>
      {data && others === 0 ? <p className="text-sm text-muted">{t("onlyThisDevice")}</p> : null}
    </div>
  );
}
