"use client";
import { useState } from "react";
import type { MailRow } from "@/lib/admin";
import { DataTable, When, type Column } from "@/components/ui/data-table";
import { SelectField } from "@/components/ui/select-field";
import { useDebounced } from "@/components/ui/use-debounced";

export function MailLog({ bodiesVisible }: { bodiesVisible: boolean }) {
  const [q, setQ] = useState("");
  const [status, setStatus] = useState("");
  const search = useDebounced(q.trim());
  const columns: Column<MailRow>[] = [
    { key: "at", label: "Time", sort: "at", render: (m) => <When iso={m.at} /> },
    { key: "to", label: "Recipient", sort: "to", render: (m) => <span className="whitespace-nowrap">{m.to}</span> },
    {
      key: "subject",
      label: "Subject",
      sort: "subject",
      render: (m) => (
        <>
          {m.subject}
          <span className="block font-mono text-xs text-muted">{m.kind}</span>
          {bodiesVisible && m.body ? (
            <details className="mt-1">
              <summary className="cursor-pointer text-water">Show the message</summary>
              <pre className="mt-1 max-w-[60ch] whitespace-pre-wrap break-words rounded bg-paper p-2 font-mono text-xs">{m.body}</pre>
            </details>
          ) : null}
        </>
      ),
    },
    {
      key: "status",
      label: "Status",
      sort: "status",
      render: (m) =>
        m.status === "sent" ? (
          <span className="text-pass">Sent</span>
        ) : (
          <span className="font-bold text-caution">
            Failed{m.error ? <span className="block font-normal break-words">{m.error}</span> : null}
          </span>
        ),
    },
  ];
  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-prose text-muted">
        {bodiesVisible
          ? "This is a development or test instance, so message bodies are shown. On a production instance only the recipient, subject, status and time are kept."
          : "Message bodies are not kept on this production instance: they hold sign-in and reset links."}
      </p>
      <form role="search" aria-label="Filter the mail log" onSubmit={(e) => e.preventDefault()} className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="mail-q" className="font-bold">
            Search recipient or subject
          </label>
          <input id="mail-q" type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={200} autoComplete="off" className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-3 py-2" />
        </div>
        <SelectField
          label="Status"
          value={status}
          onChange={(e) => setStatus(e.target.value)}
          options={[
            { value: "", label: "Sent and failed" },
            { value: "sent", label: "Sent" },
            { value: "failed", label: "Failed" },
          ]}
        />
      </form>
      <DataTable<MailRow>
        endpoint="/api/admin/mail"
        filters={{ q: search || undefined, status: status || undefined }}
        columns={columns}
        rowKey={(m) => String(m.id)}
        initialSort={{ key: "at", dir: "desc" }}
        caption="Outgoing mail"
        noun="messages"
        emptyText="No outgoing mail matches. Riser sends mail for sign-up confirmation, password resets, e-mail changes and invitations."
      />
    </div>
  );
}
