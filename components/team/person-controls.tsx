"use client";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/select-field";
import { postJson } from "@/lib/fetcher";
import { INVITE_ROLES, type InviteRole } from "@/lib/team/browser";
import { useFieldError } from "./use-field-error";
import { ActionButton } from "./action-button";
import { FormError, FormNotice } from "@/components/ui/field";

/** The manager's changes on a person's page: team, role (never admin), removal from the organization. */
export function PersonControls({ person, teams, self }: { person: { id: string; name: string; teamId: string | null; role: string }; teams: { id: string; name: string }[]; self: boolean }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const [teamId, setTeamId] = useState(person.teamId ?? "");
  const [role, setRole] = useState(person.role);
  const [busy, setBusy] = useState(false);
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const roleOptions = INVITE_ROLES.map((r) => ({ value: r, label: t(`role.${r}`) }));
  return (
    <section aria-labelledby="manage" className="mb-8 rounded border border-line bg-panel p-4">
      <h2 id="manage" className="mb-3 text-2xl">{t("person.manage")}</h2>
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
          if (!res.ok) return setMsg({ ok: false, text: tr(Object.values(res.fieldErrors ?? {})[0]?.[0] ?? res.error) ?? res.error });
          setMsg({ ok: true, text: res.data.message });
          router.refresh();
        }}
      >
        <SelectField label={t("invite.team")} value={teamId} onChange={(e) => setTeamId(e.target.value)} options={[{ value: "", label: t("noTeam") }, ...teams.map((x) => ({ value: x.id, label: x.name }))]} />
        <SelectField
          label={t("invite.role")}
          value={role}
          disabled={self}
          hint={self ? t("person.ownRole") : undefined}
          onChange={(e) => setRole(e.target.value)}
          options={roleOptions}
        />
        <Button type="submit" disabled={busy}>
          {busy ? t("saving") : t("person.save")}
        </Button>
      </form>
      <div className="mt-2">{msg ? msg.ok ? <FormNotice message={msg.text} /> : <FormError message={msg.text} /> : null}</div>
      {self ? null : (
        <div className="mt-4 border-t border-line pt-4">
          <h3 className="mb-1 font-bold">{t("person.removeHeading")}</h3>
          <p className="mb-2 text-sm text-muted">{t("person.removeBody", { name: person.name })}</p>
          <ActionButton
            url={`/api/team/people/${person.id}/remove`}
            label={t("person.remove")}
            busyLabel={t("assign.removing")}
            danger
            redirectTo="/team"
            confirm={t("person.removeConfirm", { name: person.name })}
          />
        </div>
      )}
    </section>
  );
}
