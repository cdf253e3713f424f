"use client";
import { useTranslations } from "next-intl";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useSWRConfig } from "swr";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import type { OrganizationRow } from "@/lib/admin";
import { createOrganizationSchema, renameOrganizationSchema } from "@/lib/admin/browser";
import { postJson } from "@/lib/fetcher";
import { DataTable, tableKey, When, type Column } from "@/components/ui/data-table";
import { Dialog } from "@/components/ui/dialog";
import { SelectField } from "@/components/ui/select-field";
import { useDebounced } from "@/components/ui/use-debounced";
import { applyServerErrors } from "./server-errors";


function CreateForm({ onDone }: { onDone: (m: string) => void }) {
  const t = useTranslations("adminConsole");
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState, control } = useForm<z.input<typeof createOrganizationSchema>, unknown, z.output<typeof createOrganizationSchema>>({
    resolver: zodResolver(createOrganizationSchema),
    defaultValues: { name: "", kind: "contractor", seats: 3 },
  });
  async function onSubmit(v: z.output<typeof createOrganizationSchema>) {
    setFormError(null);
    const r = await postJson("/api/admin/organizations", v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["name", "kind", "seats"], r));
    reset();
    onDone(t("done.created", { name: v.name, seats: v.seats }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="grid grid-cols-1 gap-3 rounded border border-line bg-panel p-4 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-start">
      <ErrorSummary control={control} />
      <div className="sm:col-span-4">
        <FormError message={error} />
      </div>
      <Field label={t("organizationName")} {...register("name")} error={formState.errors.name?.message} />
      <SelectField
        label={t("kind")}
        options={[
          { value: "contractor", label: t("kindName.contractor") },
          { value: "builder", label: t("kindName.builder") },
        ]}
        {...register("kind")}
        error={formState.errors.kind?.message}
      />
      <Field label={t("seats")} inputMode="numeric" {...register("seats")} error={formState.errors.seats?.message} />
      <Button type="submit" disabled={formState.isSubmitting} className="sm:mt-8">
        {formState.isSubmitting ? t("btn.creating") : t("btn.create")}
      </Button>
    </form>
  );
}

function RenameForm({ org, onDone }: { org: OrganizationRow; onDone: (m: string) => void }) {
  const t = useTranslations("adminConsole");
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof renameOrganizationSchema>, unknown, z.output<typeof renameOrganizationSchema>>({
    resolver: zodResolver(renameOrganizationSchema),
    defaultValues: { name: org.name },
  });
  async function onSubmit(v: z.output<typeof renameOrganizationSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/organizations/${org.id}`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["name"], r));
    onDone(t("done.renamed", { old: org.name, name: v.name }));
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label={t("newName")} {...register("name")} error={formState.errors.name?.message} />
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("btn.renaming") : t("rename")}
      </Button>
    </form>
  );
}

export function OrganizationsConsole() {
  const t = useTranslations("adminConsole");
  const router = useRouter();
  const { mutate } = useSWRConfig();
  const [q, setQ] = useState("");
  const [renaming, setRenaming] = useState<OrganizationRow | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const search = useDebounced(q.trim());

  function done(message: string) {
    setRenaming(null);
    setNotice(message);
    void mutate(tableKey("/api/admin/organizations"));
    router.refresh();
  }

  const columns: Column<OrganizationRow>[] = [
    { key: "name", label: t("name"), sort: "name", render: (o) => <span className="font-bold">{o.name}</span> },
    { key: "kind", label: t("kind"), sort: "kind", render: (o) => (o.kind === "contractor" || o.kind === "builder" ? t(`kindName.${o.kind}`) : o.kind) },
    { key: "seats", label: t("seats"), sort: "seats", render: (o) => <span className="font-mono">{o.seats}</span>, className: "text-right" },
    {
      key: "members",
      label: t("people2"),
      sort: "members",
      render: (o) => <span className={`font-mono ${o.members > o.seats ? "font-bold text-caution" : ""}`}>{o.members}{o.members > o.seats ? " (over)" : ""}</span>,
      className: "text-right",
    },
    { key: "teams", label: t("teams"), render: (o) => <span className="font-mono">{o.teams}</span>, className: "text-right" },
    { key: "trial", label: t("trialEnds"), render: (o) => <When iso={o.trialEndsAt} /> },
    { key: "createdAt", label: t("created"), sort: "createdAt", render: (o) => <When iso={o.createdAt} /> },
    {
      key: "rename",
      label: t("actions"),
      render: (o) => (
        <button type="button" onClick={() => setRenaming(o)} className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold">
          {t("rename")}<span className="sr-only">{` ${o.name}`}</span>
        </button>
      ),
    },
  ];

  return (
    <div className="flex flex-col gap-6">
      <div aria-live="polite">
        <FormNotice message={notice} />
      </div>
      <section aria-labelledby="create-org" className="flex flex-col gap-3">
        <h2 id="create-org" className="text-2xl">
          {t("createAnOrganization")}
        </h2>
        <CreateForm onDone={done} />
      </section>
      <section aria-labelledby="all-orgs" className="flex flex-col gap-3">
        <h2 id="all-orgs" className="text-2xl">
          {t("allOrganizations")}
        </h2>
        <form role="search" aria-label={t("filterOrganizations")} onSubmit={(e) => e.preventDefault()} className="flex max-w-md flex-col gap-1">
          <label htmlFor="org-q" className="font-bold">
            {t("searchByName")}
          </label>
          <input id="org-q" type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={200} autoComplete="off" className="min-h-11 rounded border border-ink/40 bg-panel px-3 py-2" />
        </form>
        <DataTable<OrganizationRow>
          endpoint="/api/admin/organizations"
          filters={{ q: search || undefined }}
          columns={columns}
          rowKey={(o) => o.id}
          initialSort={{ key: "name", dir: "asc" }}
          caption={t("organizationsWithSeatsPeopleAndTeams")}
          noun={t("organizations")}
          emptyText={search ? t("orgs.noMatch") : t("orgs.none")}
        />
      </section>
      <Dialog open={renaming !== null} title={renaming ? t("renameName", { name: renaming.name }) : t("rename")} onClose={() => setRenaming(null)}>
        {renaming ? <RenameForm key={renaming.id} org={renaming} onDone={done} /> : null}
      </Dialog>
    </div>
  );
}
