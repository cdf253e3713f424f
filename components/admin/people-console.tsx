"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { useSWRConfig } from "swr";
import { FormNotice } from "@/components/ui/field";
import { ROLES } from "@/lib/access/browser";
import type { PersonRow } from "@/lib/admin";
import { DataTable, tableKey, When, type Column } from "@/components/ui/data-table";
import { Dialog } from "@/components/ui/dialog";
import { SelectField } from "@/components/ui/select-field";
import { PersonActions, roleLabel } from "./person-actions";
import { useDebounced } from "@/components/ui/use-debounced";

type Org = { id: string; name: string };

function Status({ p }: { p: PersonRow }) {
  const t = useTranslations("adminConsole");
  if (p.banned) return <span className="rounded bg-caution-light px-2 py-0.5 font-bold text-caution">{p.banExpires ? t("bannedTo", { date: p.banExpires.slice(0, 10) }) : t("banned")}</span>;
  if (!p.emailVerified) return <span className="text-muted">{t("eMailNotConfirmed")}</span>;
  return <span className="text-pass">{t("active")}</span>;
}

export function PeopleConsole({ organizations, viewerId }: { organizations: Org[]; viewerId: string }) {
  const t = useTranslations("adminConsole");
  const tt = useTranslations("team");
  const { mutate } = useSWRConfig();
  const [q, setQ] = useState("");
  const [role, setRole] = useState("");
  const [organizationId, setOrganizationId] = useState("");
  const [status, setStatus] = useState("");
  const [selected, setSelected] = useState<PersonRow | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const search = useDebounced(q.trim());

  const columns: Column<PersonRow>[] = [
    {
      key: "name",
      label: t("name"),
      sort: "name",
      render: (p) => (
        <>
          <span className="font-bold">{p.name}</span>
          <br />
          <span className="whitespace-nowrap text-muted">{p.email}</span>
        </>
      ),
    },
    { key: "role", label: t("role"), sort: "role", render: (p) => roleLabel(tt, p.role) },
    { key: "organization", label: t("organization"), sort: "organization", render: (p) => (p.organization ? <>{p.organization}{p.team ? <span className="block text-muted">{p.team}</span> : null}</> : <span className="text-muted">{t("none")}</span>) },
    { key: "status", label: t("status"), render: (p) => <Status p={p} /> },
    { key: "sessions", label: t("sessions"), render: (p) => <span className="font-mono">{p.sessions}</span> },
    { key: "createdAt", label: t("joined"), sort: "createdAt", render: (p) => <When iso={p.createdAt} /> },
    {
      key: "manage",
      label: t("actions"),
      render: (p) => (
        <button type="button" onClick={() => setSelected(p)} className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold">
          {t("manage")}<span className="sr-only">{` ${p.name}`}</span>
        </button>
      ),
    },
  ];

  function done(message: string) {
    setSelected(null);
    setNotice(message);
    void mutate(tableKey("/api/admin/people"));
  }

  return (
    <div className="flex flex-col gap-4">
      <div aria-live="polite">
        <FormNotice message={notice} />
      </div>
      <form role="search" aria-label={t("filterPeople")} onSubmit={(e) => e.preventDefault()} className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="people-q" className="font-bold">
            {t("searchNameOrEMail")}
          </label>
          <input id="people-q" type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={200} autoComplete="off" className="min-h-11 w-full min-w-0 rounded border border-ink/40 bg-panel px-3 py-2" />
        </div>
        <SelectField label={t("role")} value={role} onChange={(e) => setRole(e.target.value)} options={[{ value: "", label: t("everyRole") }, ...ROLES.map((r) => ({ value: r, label: roleLabel(tt, r) }))]} />
        <SelectField
          label={t("organization")}
          value={organizationId}
          onChange={(e) => setOrganizationId(e.target.value)}
          options={[{ value: "", label: t("everyOrganization") }, { value: "none", label: t("noOrganization") }, ...organizations.map((o) => ({ value: o.id, label: o.name }))]}
        />
        <SelectField
          label={t("status")}
          value={status}
          onChange={(e) => setStatus(e.target.value)}
          options={[
            { value: "", label: t("everyone") },
            { value: "active", label: t("notBanned") },
            { value: "banned", label: t("banned") },
          ]}
        />
      </form>
      <DataTable<PersonRow>
        endpoint="/api/admin/people"
        filters={{ q: search || undefined, role: role || undefined, organizationId: organizationId || undefined, status: status || undefined }}
        columns={columns}
        rowKey={(p) => p.id}
        initialSort={{ key: "name", dir: "asc" }}
        caption={t("peopleAcrossOrganizations")}
        noun={t("people")}
        emptyText={t("nobodyMatchesTheseFiltersClearA")}
      />
      <Dialog open={selected !== null} title={selected ? t("manageName", { name: selected.name }) : t("manage")} onClose={() => setSelected(null)}>
        {selected ? <PersonActions key={selected.id} person={selected} organizations={organizations} viewerId={viewerId} onDone={done} /> : null}
      </Dialog>
    </div>
  );
}
