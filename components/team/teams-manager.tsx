"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { postJson } from "@/lib/fetcher";
import { plural } from "@/lib/plural";
import { ActionButton } from "./action-button";

type TeamRow = { id: string; name: string; archived: boolean; people: number };

/** Create, rename, archive and restore the organization's teams. */
export function TeamsManager({ teams, org }: { teams: TeamRow[]; org: string | null }) {
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
          if (!res.ok) return setError(res.fieldErrors?.name?.[0] ? `${res.error} ${res.fieldErrors.name[0]}.` : res.error);
          setDone(res.data.message);
          setName("");
          router.refresh();
        }}
      >
        <Field label="New team" hint="A crew, a sales office or a design office, e.g. “North crew”." value={name} onChange={(e) => setName(e.target.value)} maxLength={120} error={error ?? undefined} />
        <Button type="submit" disabled={busy || !name.trim()}>
          {busy ? "Creating…" : "Create team"}
        </Button>
      </form>
      {done ? <p role="status" className="mb-4">{done}</p> : null}
      {teams.length === 0 ? (
        <p>No teams yet. Create the first one above; people can then be invited straight into it.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {teams.map((t) => (
            <TeamItem key={t.id} t={t} />
          ))}
        </ul>
      )}
    </>
  );
}

function TeamItem({ t }: { t: TeamRow }) {
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
            if (!res.ok) return setError(res.fieldErrors?.name?.[0] ?? res.error);
            setEditing(false);
            router.refresh();
          }}
        >
          <Field label={`New name for ${t.name}`} value={name} onChange={(e) => setName(e.target.value)} maxLength={120} error={error ?? undefined} />
          <Button type="submit">Save name</Button>
          <Button type="button" variant="secondary" onClick={() => setEditing(false)}>
            Cancel
          </Button>
        </form>
      ) : (
        <>
          <span className="font-bold">{t.name}</span>
          <span className="text-sm text-muted">
            {plural(t.people, "person")}
            {t.archived ? " · archived" : ""}
          </span>
          <span className="ml-auto flex flex-wrap gap-2">
            {t.people > 0 ? (
              <a
                href={`/api/team/teams/${t.id}/training-history`}
                download
                className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-3 font-bold"
                aria-label={`Download the training histories of ${t.name} (ZIP of each person's PDF and CSV)`}
              >
                Training histories (ZIP)
              </a>
            ) : null}
            <button type="button" className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold" onClick={() => setEditing(true)} aria-label={`Rename ${t.name}`}>
              Rename
            </button>
            {t.archived ? (
              <ActionButton url={`/api/team/teams/${t.id}`} body={{ archived: false }} label="Restore" busyLabel="Restoring…" ariaLabel={`Restore ${t.name}`} />
            ) : (
              <ActionButton
                url={`/api/team/teams/${t.id}`}
                body={{ archived: true }}
                label="Archive"
                busyLabel="Archiving…"
                ariaLabel={`Archive ${t.name}`}
                confirm={`Archive ${t.name}? Its people keep their records; the team leaves pickers, filters and new invitations.`}
              />
            )}
          </span>
        </>
      )}
    </li>
  );
}
