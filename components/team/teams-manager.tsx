"use client";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { ActionButton } from "./action-button";
import { useFieldError } from "./use-field-error";

type TeamRow = { id: string; name: string; archived: boolean; people: number };

/** Create, rename, archive and restore the organization's teams. */
export function TeamsManager({ teams, org }: { teams: TeamRow[]; org: string | null }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const [name, setName] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <>
      <form
        className="mb-8 grid gap-3 sm:grid-cols-[1fr_auto] sm:items-end"
        onSubmit={async (e) => {
          e.preventDefault();
          setBusy(true);
          setError(null);
          setDone(null);
          const res = await postJson<{ message: string }>("/api/team/teams", { name, org: org ?? undefined });
          setBusy(false);
          if (!res.ok) return setError(res.fieldErrors?.name?.[0] ? `${tr(res.error)} ${tr(res.fieldErrors.name[0])}.` : (tr(res.error) ?? res.error));
          setDone(res.data.message);
          setName("");
          router.refresh();
        }}
      >
        <Field label={t("teams.new")} hint={t("teams.newHint")} value={name} onChange={(e) => setName(e.target.value)} maxLength={120} error={error ?? undefined} />
        <Button type="submit" disabled={busy || !name.trim()}>
          {busy ? t("teams.creating") : t("teams.create")}
        </Button>
      </form>
      {done ? <p role="status" className="mb-4">{done}</p> : null}
      {teams.length === 0 ? (
        <p>{t("teams.none")}</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {teams.map((x) => (
            <TeamItem key={x.id} t={x} />
          ))}
        </ul>
      )}
    </>
  );
}

function TeamItem({ t }: { t: TeamRow }) {
  const tt = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(t.name);
  const [error, setError] = useState<string | null>(null);
  return (
    <li className="flex flex-wrap items-center gap-3 rounded border border-line bg-panel px-3 py-2">
      {editing ? (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={async (e) => {
            e.preventDefault();
            const res = await postJson<{ message: string }>(`/api/team/teams/${t.id}`, { name });
            if (!res.ok) return setError(tr(res.fieldErrors?.name?.[0] ?? res.error) ?? res.error);
            setEditing(false);
            router.refresh();
          }}
        >
          <Field label={tt("teams.newName", { name: t.name })} value={name} onChange={(e) => setName(e.target.value)} maxLength={120} error={error ?? undefined} />
          <Button type="submit">{tt("teams.saveName")}</Button>
          <Button type="button" variant="secondary" onClick={() => setEditing(false)}>
            {tt("cancel")}
          </Button>
        </form>
      ) : (
        <>
          <span className="font-bold">{t.name}</span>
          <span className="text-sm text-muted">
            {tt("teams.people", { count: t.people })}
            {t.archived ? ` · ${tt("teams.archived")}` : ""}
          </span>
          <span className="ml-auto flex flex-wrap gap-2">
            {t.people > 0 ? (
              <a
                href={`/api/team/teams/${t.id}/training-history`}
                download
                className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-3 font-bold"
                aria-label={tt("teams.historiesLabel", { name: t.name })}
              >
                {tt("teams.histories")}
              </a>
            ) : null}
            <button type="button" className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold" onClick={() => setEditing(true)} aria-label={tt("teams.renameLabel", { name: t.name })}>
              {tt("teams.rename")}
            </button>
            {t.archived ? (
              <ActionButton url={`/api/team/teams/${t.id}`} body={{ archived: false }} label={tt("teams.restore")} busyLabel={tt("teams.restoring")} ariaLabel={tt("teams.restoreLabel", { name: t.name })} />
            ) : (
              <ActionButton
                url={`/api/team/teams/${t.id}`}
                body={{ archived: true }}
                label={tt("teams.archive")}
                busyLabel={tt("teams.archiving")}
                ariaLabel={tt("teams.archiveLabel", { name: t.name })}
                confirm={tt("teams.archiveConfirm", { name: t.name })}
              />
            )}
          </span>
        </>
      )}
    </li>
  );
}
