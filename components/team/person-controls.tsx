"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { postJson } from "@/lib/fetcher";
import { INVITE_ROLES, ROLE_LABELS, type InviteRole } from "@/lib/team/browser";
import { ActionButton } from "./action-button";
import { FormError, FormNotice } from "@/components/ui/field";

/** The manager's changes on a person's page: team, role (never admin), removal from the organization. */
export function PersonControls({ person, teams, self }: { person: { id: string; name: string; teamId: string | null; role: string }; teams: { id: string; name: string }[]; self: boolean }) {
  const router = useRouter();
  const [teamId, setTeamId] = useState(person.teamId ?? "");
  const [role, setRole] = useState(person.role);
  const [busy, setBusy] = useState(false);
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const roleOptions = INVITE_ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));
  return (
    <section aria-labelledby="manage" className="mb-8 rounded border border-line bg-panel p-4">
      <h2 id="manage" className="mb-3 text-2xl">Team and role</h2>
      <form
        className="grid gap-3 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
        onSubmit={async (e) => {
          e.preventDefault();
          setBusy(true);
          setMsg(null);
          const body: { teamId: string | null; role?: InviteRole } = { teamId: teamId || null };
          if (!self) body.role = role as InviteRole;
          const res = await postJson<{ message: string }>(`/api/team/people/${person.id}`, body);
          setBusy(false);
          if (!res.ok) return setMsg({ ok: false, text: Object.values(res.fieldErrors ?? {})[0]?.[0] ?? res.error });
          setMsg({ ok: true, text: res.data.message });
          router.refresh();
        }}
      >
        <SelectField label="Team" value={teamId} onChange={(e) => setTeamId(e.target.value)} options={[{ value: "", label: "No team" }, ...teams.map((t) => ({ value: t.id, label: t.name }))]} />
        <SelectField
          label="Role"
          value={role}
          disabled={self}
          hint={self ? "You cannot change your own role." : undefined}
          onChange={(e) => setRole(e.target.value)}
          options={roleOptions}
        />
        <Button type="submit" disabled={busy}>
          {busy ? "Saving…" : "Save changes"}
        </Button>
      </form>
      <div className="mt-2">{msg ? msg.ok ? <FormNotice message={msg.text} /> : <FormError message={msg.text} /> : null}</div>
      {self ? null : (
        <div className="mt-4 border-t border-line pt-4">
          <h3 className="mb-1 font-bold">Remove from the organization</h3>
          <p className="mb-2 text-sm text-muted">Frees the seat at once. {person.name} keeps their account, and their certificates stay verifiable.</p>
          <ActionButton
            url={`/api/team/people/${person.id}/remove`}
            label="Remove from organization"
            busyLabel="Removing…"
            danger
            redirectTo="/team"
            confirm={`Remove ${person.name} from your organization? Their assignments here end; their certificates stay verifiable.`}
          />
        </div>
      )}
    </section>
  );
}
