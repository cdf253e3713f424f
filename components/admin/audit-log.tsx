"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import type { AuditRow } from "@/lib/admin";
import { DataTable, When, type Column } from "@/components/ui/data-table";
import { SelectField } from "@/components/ui/select-field";
import { useDebounced } from "@/components/ui/use-debounced";

type Org = { id: string; name: string };

function Details({ value }: { value: unknown }) {
  if (value == null) return null;
  const entries = typeof value === "object" && !Array.isArray(value) ? Object.entries(value as Record<string, unknown>) : [["value", value]];
  if (!entries.length) return null;
  return (
    <ul className="mt-1 font-mono text-xs text-muted">
      {entries.map(([k, v]) => (
        <li key={String(k)} className="wrap-anywhere">
          {String(k)}: {typeof v === "object" ? JSON.stringify(v) : String(v)}
        </li>
      ))}
    </ul>
  );
}

export function AuditLog({ organizations }: { organizations: Org[] }) {
  const t = useTranslations("adminConsole");
  const [action, setAction] = useState("");
  const [actor, setActor] = useState("");
  const [organizationId, setOrganizationId] = useState("");
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  const [actions, setActions] = useState<string[]>([]);
  const actorSearch = useDebounced(actor.trim());
  const filters = { action: action || undefined, actor: actorSearch || undefined, organizationId: organizationId || undefined, from: from || undefined, to: to || undefined };
  const exportQs = new URLSearchParams(Object.entries(filters).filter((e): e is [string, string] => Boolean(e[1]))).toString();
  const rangeError = from && to && from > to ? t("rangeError") : null;

  const columns: Column<AuditRow>[] = [
    { key: "at", label: t("time"), sort: "at", render: (r) => <When iso={r.at} /> },
    { key: "action", label: t("action"), sort: "action", render: (r) => <span className="font-mono">{r.action}</span> },
    { key: "actor", label: t("who"), sort: "actor", render: (r) => <span className="whitespace-nowrap">{r.actorEmail ?? <span className="text-muted">{t("riserItself")}</span>}</span> },
    {
      key: "target",
      label: t("what"),
      sort: "target",
      render: (r) => (
        <>
          <span className="whitespace-nowrap">{r.targetLabel ?? r.targetId}</span>
          <span className="block font-mono text-xs text-muted">{r.targetType}</span>
          {r.organization ? <span className="block text-xs">{r.organization}</span> : null}
        </>
      ),
    },
    {
      key: "reason",
      label: t("reasonAndDetails"),
      render: (r) => (
        <>
          {r.reason ? <span>“{r.reason}”</span> : <span className="text-muted">{t("noReasonGiven")}</span>}
          <Details value={r.details} />
        </>
      ),
    },
    { key: "ip", label: t("address"), render: (r) => <span className="font-mono text-xs">{r.ip ?? "—"}</span> },
  ];

  return (
    <div className="flex flex-col gap-4">
      <form role="search" aria-label={t("filterTheAuditLog")} onSubmit={(e) => e.preventDefault()} className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-5">
        <SelectField label={t("action")} value={action} onChange={(e) => setAction(e.target.value)} options={[{ value: "", label: t("everyAction") }, ...actions.map((a) => ({ value: a, label: a }))]} />
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="audit-actor" className="font-bold">
            {t("auditWho")}
          </label>
          <input id="audit-actor" type="search" value={actor} onChange={(e) => setActor(e.target.value)} maxLength={200} autoComplete="off" className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-3 py-2" />
        </div>
        <SelectField
          label={t("organization")}
          value={organizationId}
          onChange={(e) => setOrganizationId(e.target.value)}
          options={[{ value: "", label: t("everyOrganization") }, { value: "none", label: t("noneInstanceWide") }, ...organizations.map((o) => ({ value: o.id, label: o.name }))]}
        />
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="audit-from" className="font-bold">
            {t("auditFrom")}
          </label>
          <input id="audit-from" type="date" value={from} onChange={(e) => setFrom(e.target.value)} className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-3 py-2" />
        </div>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="audit-to" className="font-bold">
            {t("auditTo")}
          </label>
          <input
            id="audit-to"
            type="date"
            value={to}
            onChange={(e) => setTo(e.target.value)}
            aria-invalid={rangeError ? true : undefined}
            aria-describedby={rangeError ? "audit-range-error" : undefined}
            className={`min-h-11 w-full min-w-0 rounded border bg-panel px-3 py-2 ${rangeError ? "border-caution" : "border-ink/40"}`}
          />
          {rangeError ? (
            <p id="audit-range-error" role="alert" className="text-sm font-bold text-caution">
              {rangeError}
            </p>
          ) : null}
        </div>
      </form>
      <p>
        <a href={`/api/admin/audit/export${exportQs ? `?${exportQs}` : ""}`} download className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 font-bold text-ink no-underline hover:bg-paper">
          {t("downloadTheseRowsAsCsv")}
        </a>
        <span className="ml-2 text-sm text-muted">{t("theDownloadItselfIsRecordedIn")}</span>
      </p>
      <DataTable<AuditRow, { actions: string[] }>
        endpoint="/api/admin/audit"
        filters={filters}
        columns={columns}
        rowKey={(r) => String(r.id)}
        initialSort={{ key: "at", dir: "desc" }}
        caption={t("auditLog")}
        noun={t("auditEntries")}
        emptyText={t("noAuditEntriesMatchTheseFilters")}
        onData={(d) => setActions((prev) => (prev.join() === d.actions.join() ? prev : d.actions))}
      />
    </div>
  );
}
