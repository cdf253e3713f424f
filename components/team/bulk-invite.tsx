"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import type { RosterPreview } from "@/lib/team";
import { ROLE_LABELS, ROSTER_MAX_BYTES, ROSTER_MAX_ROWS, type InviteRole } from "@/lib/team/browser";
import { plural } from "@/lib/plural";

type ImportResult = { imported: number; skipped: number; message: string };

async function send(url: string, form: FormData): Promise<{ ok: true; data: unknown } | { ok: false; error: string; billing?: boolean }> {
  try {
    const res = await fetch(url, { method: "POST", body: form });
    const data = await res.json().catch(() => ({}));
    if (!res.ok) return { ok: false, error: data.error ?? `Request failed (${res.status})`, billing: Boolean(data.billingUrl) };
    return { ok: true, data };
  } catch {
    return { ok: false, error: "No connection. Check the network and try again; nothing was written." };
  }
}

const SHOW_VALID = 100;

/** Upload a CSV, see every row's problems, then import the valid rows (nothing is written before). */
export function BulkInvite({ org }: { org: string | null }) {
  const router = useRouter();
  const inputId = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; billing?: boolean } | null>(null);
  const [preview, setPreview] = useState<RosterPreview | null>(null);
  const [result, setResult] = useState<ImportResult | null>(null);
  const [showAll, setShowAll] = useState(false);

  function formFor(f: File, extra: Record<string, string> = {}) {
    const form = new FormData();
    form.set("file", f);
    if (org) form.set("org", org);
    for (const [k, v] of Object.entries(extra)) form.set(k, v);
    return form;
  }

  async function check() {
    setError(null);
    setResult(null);
    setPreview(null);
    if (!file) return setError({ message: "Choose a CSV file first." });
    if (file.size > ROSTER_MAX_BYTES) return setError({ message: `The file is ${Math.round(file.size / 1024)} KB; the limit is ${ROSTER_MAX_BYTES / (1024 * 1024)} MB. Split it into smaller files.` });
    setBusy(true);
    const res = await send("/api/team/invites/preview", formFor(file));
    setBusy(false);
    if (!res.ok) return setError({ message: res.error });
    setPreview(res.data as RosterPreview);
  }

  async function doImport() {
    if (!file || !preview) return;
    setError(null);
    setBusy(true);
    const res = await send("/api/team/invites/import", formFor(file, { fileHash: preview.fileHash }));
    setBusy(false);
    if (!res.ok) return setError({ message: res.error, billing: res.billing });
    setResult(res.data as ImportResult);
    setPreview(null);
    setFile(null);
    if (fileRef.current) fileRef.current.value = "";
    router.refresh();
  }

  const problemRows = preview?.rows.filter((r) => r.problems.length > 0) ?? [];
  const validRows = preview?.rows.filter((r) => r.problems.length === 0) ?? [];
  const shownValid = showAll ? validRows : validRows.slice(0, SHOW_VALID);

  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-prose">
        One row per person with the columns <code>email</code>, <code>name</code>, <code>role</code> (learner, sales or manager; empty means learner) and <code>team</code> (a team name as on the board; empty means no team). Up to {ROSTER_MAX_ROWS.toLocaleString("en-US")} rows and {ROSTER_MAX_BYTES / (1024 * 1024)} MB per file, saved as “CSV UTF-8”.{" "}
        <a href={`/api/team/invites/template.csv${org ? `?org=${encodeURIComponent(org)}` : ""}`} download>
          Download the template
        </a>
        .
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex min-w-0 max-w-full flex-col gap-1">
          <label htmlFor={inputId} className="font-bold">Roster file (.csv)</label>
          <input
            ref={fileRef}
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setPreview(null);
              setResult(null);
              setError(null);
            }}
            className="min-h-11 w-full max-w-full rounded border border-ink/40 bg-panel px-2 py-2"
          />
        </div>
        <Button type="button" variant="secondary" onClick={check} disabled={busy || !file}>
          {busy && !preview ? "Checking…" : "Check the file"}
        </Button>
      </div>
      {error ? (
        <div className="flex flex-col gap-1">
          <FormError message={error.message} />
          {error.billing ? <Link href="/team/billing">Go to the billing page to add seats</Link> : null}
        </div>
      ) : null}
      {result ? <FormNotice message={result.message} /> : null}
      {preview ? (
        <div className="flex flex-col gap-3" aria-live="polite">
          <p role="status" className="font-bold">
            {plural(preview.total, "row")} in {preview.fileName}: {preview.valid} ready to invite, {preview.invalid} with problems. Nothing has been written yet.
          </p>
          <p className="text-sm text-muted">
            Seats: {preview.seats.used} of {preview.seats.seats} taken (members and open invitations).
          </p>
          <div role="region" aria-label="Rows of the file" tabIndex={0} className="relative max-h-[32rem] overflow-auto rounded border border-line bg-panel">
            <table className="w-full border-collapse text-sm">
              <caption className="sr-only">Every row of the uploaded file with its problems</caption>
              <thead className="sticky top-0 bg-paper">
                <tr className="border-b border-line text-left">
                  <th scope="col" className="px-2 py-2">Line</th>
                  <th scope="col" className="px-2 py-2">E-mail</th>
                  <th scope="col" className="px-2 py-2">Name</th>
                  <th scope="col" className="px-2 py-2">Role</th>
                  <th scope="col" className="px-2 py-2">Team</th>
                  <th scope="col" className="px-2 py-2">Check</th>
                </tr>
              </thead>
              <tbody>
                {[...problemRows, ...shownValid].map((r) => (
                  <tr key={r.line} className={`border-b border-line align-top last:border-0 ${r.problems.length ? "bg-caution-light" : ""}`} data-line={r.line}>
                    <td className="px-2 py-2 font-mono">{r.line}</td>
                    <td className="px-2 py-2 [overflow-wrap:anywhere]">{r.email || <span className="text-muted">(empty)</span>}</td>
                    <td className="px-2 py-2">{r.name}</td>
                    <td className="px-2 py-2">{r.roleValue ? ROLE_LABELS[r.roleValue as InviteRole] : r.role}</td>
                    <td className="px-2 py-2">{r.team}</td>
                    <td className="px-2 py-2">
                      {r.problems.length ? (
                        <ul className="font-bold text-caution">
                          {r.problems.map((p) => (
                            <li key={p}>{p}</li>
                          ))}
                        </ul>
                      ) : (
                        <span className="text-pass">✓ Ready{r.notes.length ? ` — ${r.notes.join("; ")}` : ""}</span>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {validRows.length > SHOW_VALID && !showAll ? (
            <button type="button" onClick={() => setShowAll(true)} className="self-start underline">
              Show all {validRows.length} ready rows
            </button>
          ) : null}
          <div className="flex flex-wrap gap-3">
            <Button type="button" onClick={doImport} disabled={busy || preview.valid === 0}>
              {busy ? "Importing…" : `Invite the ${preview.valid} ready ${preview.valid === 1 ? "person" : "people"}`}
            </Button>
            <Button type="button" variant="secondary" onClick={() => setPreview(null)} disabled={busy}>
              Cancel
            </Button>
          </div>
          {preview.invalid > 0 ? <p className="text-sm">Rows with problems are skipped. To include them, fix the file and check it again.</p> : null}
        </div>
      ) : null}
    </div>
  );
}
