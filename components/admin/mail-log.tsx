"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import type { MailRow } from "@/lib/admin";
import { DataTable, When, type Column } from "@/components/ui/data-table";
import { SelectField } from "@/components/ui/select-field";
import { useDebounced } from "@/components/ui/use-debounced";

export function MailLog({ bodiesVisible }: { bodiesVisible: boolean }) {
  const t = useTranslations("admin");
  const [q, setQ] = useState("");
  const [status, setStatus] = useState("");
  const search = useDebounced(q.trim());
  const columns: Column<MailRow>[] = [
    { key: "at", label: t("mail.time"), sort: "at", render: (m) => <When iso={m.at} /> },
    { key: "to", label: t("mail.recipient"), sort: "to", render: (m) => <span className="whitespace-nowrap">{m.to}</span> },
    {
      key: "subject",
      label: t("mail.subject"),
      sort: "subject",
      render: (m) => (
        <>
          {m.subject}
          <span className="block font-mono text-xs text-muted">{m.kind}</span>
          {bodiesVisible && m.body ? (
            <details className="mt-1">
              <summary className="cursor-pointer text-water">{t("mail.show")}</summary>
              <pre className="mt-1 max-w-[60ch] whitespace-pre-wrap break-words rounded bg-paper p-2 font-mono text-xs">{m.body}</pre>
            </details>
          ) : null}
        </>
      ),
    },
    {
      key: "status",
      label: t("mail.status"),
      sort: "status",
      render: (m) =>
        m.status === "sent" ? (
          <span className="text-pass">{t("mail.sent")}</span>
        ) : (
          <span className="font-bold text-caution">
            {t("mail.failed")}{m.error ? <span className="block font-normal break-words">{m.error}</span> : null}
          </span>
        ),
    },
  ];
  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-prose text-muted">
        {bodiesVisible
          ? t("mail.bodiesShown")
          : t("mail.bodiesHidden")}
      </p>
      <form role="search" aria-label={t("mail.filter")} onSubmit={(e) => e.preventDefault()} className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="mail-q" className="font-bold">
            {t("mail.search")}
          </label>
          <input id="mail-q" type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={200} autoComplete="off" className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-3 py-2" />
        </div>
        <SelectField
          label={t("mail.status")}
          value={status}
          onChange={(e) => setStatus(e.target.value)}
          options={[
            { value: "", label: t("mail.both") },
            { value: "sent", label: t("mail.sent") },
            { value: "failed", label: t("mail.failed") },
          ]}
        />
      </form>
      <DataTable<MailRow>
        endpoint="/api/admin/mail"
        filters={{ q: search || undefined, status: status || undefined }}
        columns={columns}
        rowKey={(m) => String(m.id)}
        initialSort={{ key: "at", dir: "desc" }}
        caption={t("mail.caption")}
        noun={t("mail.noun")}
        emptyText={t("mail.empty")}
      />
    </div>
  );
}
