"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError, FormNotice } from "@/components/ui/field";
import type { RosterPreview } from "@/lib/team";
import { LANGUAGE_NAMES, LOCALES, type Locale } from "@/lib/i18n/browser";
import { INVITE_ROLES, ROSTER_MAX_BYTES, ROSTER_MAX_ROWS, rosterRowText, type InviteRole, type RosterMessage } from "@/lib/team/browser";

type ImportResult = { imported: number; skipped: number; message: string };

type Failure = { ok: false; error: string; billing?: boolean; errorKey?: string; errorValues?: Record<string, string | number> };

async function send(url: string, form: FormData, offline: string): Promise<{ ok: true; data: unknown } | Failure> {
  try {
    const res = await fetch(url, { method: "POST", body: form });
    const data = await res.json().catch(() => ({}));
    if (!res.ok) {
      // a whole-file problem comes with its catalog key (bulk.file.*), shown in the reader's language
      const errorKey = typeof data.errorKey === "string" && data.errorKey.startsWith("bulk.file.") ? data.errorKey : undefined;
      return { ok: false, error: data.error ?? `Request failed (${res.status})`, billing: Boolean(data.billingUrl), errorKey, errorValues: data.errorValues };
    }
    return { ok: true, data };
  } catch {
    return { ok: false, error: offline };
  }
}

const SHOW_VALID = 100;

/** Upload a CSV, see every row's problems, then import the valid rows (nothing is written before). */
export function BulkInvite({ org, defaultLanguage }: { org: string | null; defaultLanguage: Locale }) {
  const t = useTranslations("team");
  const router = useRouter();
  const inputId = useId();
  const languageId = useId();
  const [language, setLanguage] = useState<Locale>(defaultLanguage);
  const fileRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; billing?: boolean } | null>(null);
  const [preview, setPreview] = useState<RosterPreview | null>(null);
  const [result, setResult] = useState<ImportResult | null>(null);
  const [showAll, setShowAll] = useState(false);

  const failureText = (f: Failure) => (f.errorKey && t.has(f.errorKey as never) ? t(f.errorKey as never, (f.errorValues ?? {}) as never) : f.error);

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
    if (!file) return setError({ message: t("bulk.chooseFirst") });
    if (file.size > ROSTER_MAX_BYTES) return setError({ message: t("bulk.tooLarge", { kb: Math.round(file.size / 1024), mb: ROSTER_MAX_BYTES / (1024 * 1024) }) });
    setBusy(true);
    const res = await send("/api/team/invites/preview", formFor(file), t("bulk.offline"));
    setBusy(false);
    if (!res.ok) return setError({ message: failureText(res) });
    setPreview(res.data as RosterPreview);
  }

  async function doImport() {
    if (!file || !preview) return;
    setError(null);
    setBusy(true);
    const res = await send("/api/team/invites/import", formFor(file, { fileHash: preview.fileHash, language }), t("bulk.offline"));
    setBusy(false);
    if (!res.ok) return setError({ message: failureText(res), billing: res.billing });
    setResult(res.data as ImportResult);
    setPreview(null);
    setFile(null);
    if (fileRef.current) fileRef.current.value = "";
    router.refresh();
  }

  // a row's problems and notes in the reader's language (the English text when an older server sent no keys)
  const rowText = (messages: RosterMessage[] | undefined, english: string[]) => rosterRowText(messages, english, (key, values) => t(key as never, values as never));
  const problemRows = preview?.rows.filter((r) => r.problems.length > 0) ?? [];
  const validRows = preview?.rows.filter((r) => r.problems.length === 0) ?? [];
  const shownValid = showAll ? validRows : validRows.slice(0, SHOW_VALID);

  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-prose">
        {t.rich("bulk.intro", { rows: ROSTER_MAX_ROWS, mb: ROSTER_MAX_BYTES / (1024 * 1024), code: (c) => <code>{c}</code> })}{" "}
        <a href={`/api/team/invites/template.csv${org ? `?org=${encodeURIComponent(org)}` : ""}`} download>
          {t("bulk.template")}
        </a>
        .
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex min-w-0 max-w-full flex-col gap-1">
          <label htmlFor={inputId} className="font-bold">{t("bulk.file")}</label>
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
        <div className="flex flex-col gap-1">
          <label htmlFor={languageId} className="font-bold">{t("bulk.language")}</label>
          <select id={languageId} value={language} onChange={(e) => setLanguage(e.target.value as Locale)} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
            {LOCALES.map((l) => (
              <option key={l} value={l} lang={l}>{LANGUAGE_NAMES[l]}</option>
            ))}
          </select>
        </div>
        <Button type="button" variant="secondary" onClick={check} disabled={busy || !file}>
          {busy && !preview ? t("bulk.checking") : t("bulk.check")}
        </Button>
      </div>
      {error ? (
        <div className="flex flex-col gap-1">
          <FormError message={error.message} />
          {error.billing ? <Link href="/team/billing">{t("invite.billingLink")}</Link> : null}
        </div>
      ) : null}
      {result ? <FormNotice message={result.message} /> : null}
      {preview ? (
        <div className="flex flex-col gap-3" aria-live="polite">
          <p role="status" className="font-bold">
            {t("bulk.previewSummary", { total: preview.total, file: preview.fileName, valid: preview.valid, invalid: preview.invalid })}
          </p>
          <p className="text-sm text-muted">
            {t("bulk.seats", { used: preview.seats.used, seats: preview.seats.seats })}
          </p>
          <div role="region" aria-label={t("bulk.rowsRegion")} tabIndex={0} className="relative max-h-[32rem] overflow-auto rounded border border-line bg-panel">
            <table className="w-full border-collapse text-sm">
              <caption className="sr-only">{t("bulk.caption")}</caption>
              <thead className="sticky top-0 bg-paper">
                <tr className="border-b border-line text-left">
                  <th scope="col" className="px-2 py-2">{t("bulk.line")}</th>
                  <th scope="col" className="px-2 py-2">{t("invite.email")}</th>
                  <th scope="col" className="px-2 py-2">{t("col.name")}</th>
                  <th scope="col" className="px-2 py-2">{t("invite.role")}</th>
                  <th scope="col" className="px-2 py-2">{t("invite.team")}</th>
                  <th scope="col" className="px-2 py-2">{t("bulk.checkCol")}</th>
                </tr>
              </thead>
              <tbody>
                {[...problemRows, ...shownValid].map((r) => (
                  <tr key={r.line} className={`border-b border-line align-top last:border-0 ${r.problems.length ? "bg-caution-light" : ""}`} data-line={r.line}>
                    <td className="px-2 py-2 font-mono">{r.line}</td>
                    <td className="px-2 py-2 [overflow-wrap:anywhere]">{r.email || <span className="text-muted">{t("bulk.empty")}</span>}</td>
                    <td className="px-2 py-2">{r.name}</td>
                    <td className="px-2 py-2">{r.roleValue && (INVITE_ROLES as readonly string[]).includes(r.roleValue) ? t(`role.${r.roleValue as InviteRole}`) : r.role}</td>
                    <td className="px-2 py-2">{r.team}</td>
                    <td className="px-2 py-2">
                      {r.problems.length ? (
                        <ul className="font-bold text-caution">
                          {rowText(r.problemMessages, r.problems).map((p) => (
                            <li key={p}>{p}</li>
                          ))}
                        </ul>
                      ) : (
                        <span className="text-pass">{t("bulk.ready")}{r.notes.length ? ` — ${rowText(r.noteMessages, r.notes).join("; ")}` : ""}</span>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {validRows.length > SHOW_VALID && !showAll ? (
            <button type="button" onClick={() => setShowAll(true)} className="self-start underline">
              {t("bulk.showAll", { count: validRows.length })}
            </button>
          ) : null}
          <div className="flex flex-wrap gap-3">
            <Button type="button" onClick={doImport} disabled={busy || preview.valid === 0}>
              {busy ? t("bulk.importing") : t("bulk.import", { count: preview.valid })}
            </Button>
            <Button type="button" variant="secondary" onClick={() => setPreview(null)} disabled={busy}>
              {t("cancel")}
            </Button>
          </div>
          {preview.invalid > 0 ? <p className="text-sm">{t("bulk.skipNote")}</p> : null}
        </div>
      ) : null}
    </div>
  );
}
