"use client";
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

const KIND_LABEL: Record<string, string> = { contractor: "Sprinkler contractor", builder: "Home builder" };

function CreateForm({ onDone }: { onDone: (m: string) => void }) {
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
    onDone(`${v.name} is created with ${v.seats} seat${v.seats === 1 ? "" : "s"}.`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="grid grid-cols-1 gap-3 rounded border border-line bg-panel p-4 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-start">
      <ErrorSummary control={control} />
      <div className="sm:col-span-4">
        <FormError message={error} />
      </div>
      <Field label="Organization name" {...register("name")} error={formState.errors.name?.message} />
      <SelectField
        label="Kind"
        options={[
          { value: "contractor", label: KIND_LABEL.contractor! },
          { value: "builder", label: KIND_LABEL.builder! },
        ]}
        {...register("kind")}
        error={formState.errors.kind?.message}
      />
      <Field label="Seats" inputMode="numeric" {...register("seats")} error={formState.errors.seats?.message} />
      <Button type="submit" disabled={formState.isSubmitting} className="sm:mt-8">
        {formState.isSubmitting ? "Creating…" : "Create"}
      </Button>
    </form>
  );
}

function RenameForm({ org, onDone }: { org: OrganizationRow; onDone: (m: string) => void }) {
  const [error, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, control } = useForm<z.input<typeof renameOrganizationSchema>, unknown, z.output<typeof renameOrganizationSchema>>({
    resolver: zodResolver(renameOrganizationSchema),
    defaultValues: { name: org.name },
  });
  async function onSubmit(v: z.output<typeof renameOrganizationSchema>) {
    setFormError(null);
    const r = await postJson(`/api/admin/organizations/${org.id}`, v);
    if (!r.ok) return setFormError(applyServerErrors(setError, ["name"], r));
    onDone(`${org.name} is now called ${v.name}.`);
  }
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3">
      <ErrorSummary control={control} />
      <FormError message={error} />
      <Field label="New name" {...register("name")} error={formState.errors.name?.message} />
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? "Renaming…" : "Rename"}
      </Button>
    </form>
  );
}

export function OrganizationsConsole() {
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
    { key: "name", label: "Name", sort: "name", render: (o) => <span className="font-bold">{o.name}</span> },
    { key: "kind", label: "Kind", sort: "kind", render: (o) => KIND_LABEL[o.kind] ?? o.kind },
    { key: "seats", label: "Seats", sort: "seats", render: (o) => <span className="font-mono">{o.seats}</span>, className: "text-right" },
    {
      key: "members",
      label: "People",
      sort: "members",
      render: (o) => <span className={`font-mono ${o.members > o.seats ? "font-bold text-caution" : ""}`}>{o.members}{o.members > o.seats ? " (over)" : ""}</span>,
      className: "text-right",
    },
    { key: "teams", label: "Teams", render: (o) => <span className="font-mono">{o.teams}</span>, className: "text-right" },
    { key: "trial", label: "Trial ends", render: (o) => <When iso={o.trialEndsAt} /> },
    { key: "createdAt", label: "Created", sort: "createdAt", render: (o) => <When iso={o.createdAt} /> },
    {
      key: "rename",
      label: "Actions",
      render: (o) => (
        <button type="button" onClick={() => setRenaming(o)} className="min-h-11 rounded border border-ink/40 bg-panel px-3 font-bold">
          Rename<span className="sr-only"> {o.name}</span>
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
          Create an organization
        </h2>
        <CreateForm onDone={done} />
      </section>
      <section aria-labelledby="all-orgs" className="flex flex-col gap-3">
        <h2 id="all-orgs" className="text-2xl">
          All organizations
        </h2>
        <form role="search" aria-label="Filter organizations" onSubmit={(e) => e.preventDefault()} className="flex max-w-md flex-col gap-1">
          <label htmlFor="org-q" className="font-bold">
            Search by name
          </label>
          <input id="org-q" type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={200} autoComplete="off" className="min-h-11 rounded border border-ink/40 bg-panel px-3 py-2" />
        </form>
        <DataTable<OrganizationRow>
          endpoint="/api/admin/organizations"
          filters={{ q: search || undefined }}
          columns={columns}
          rowKey={(o) => o.id}
          initialSort={{ key: "name", dir: "asc" }}
          caption="Organizations with seats, people and teams"
          noun="organizations"
          emptyText={search ? "No organization has that in its name." : "No organizations yet. Create the first one above."}
        />
      </section>
      <Dialog open={renaming !== null} title={renaming ? `Rename ${renaming.name}` : "Rename"} onClose={() => setRenaming(null)}>
        {renaming ? <RenameForm key={renaming.id} org={renaming} onDone={done} /> : null}
      </Dialog>
    </div>
  );
}
