"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { SelectField } from "@/components/ui/select-field";
import { postJson } from "@/lib/fetcher";
import { useFieldError } from "./use-field-error";

type Invitee = { id: string; email: string; name: string | null; items: { kind: string; slug: string; dueAt: string }[] };
type Item = { slug: string; title: string };

/**
 * People invited but not joined yet: they are not in the people picker until they accept, so work
 * for them is attached to the invitation and assigned on acceptance.
 */
export function InviteeWork({ invitees, modules, paths, org }: { invitees: Invitee[]; modules: Item[]; paths: Item[]; org: string | null }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const [who, setWho] = useState(invitees[0]?.id ?? "");
  const [what, setWhat] = useState(modules[0] ? `module:${modules[0].slug}` : "");
  const [due, setDue] = useState("");
  const [msg, setMsg] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const title = (kind: string, slug: string) => (kind === "path" ? paths : modules).find((x) => x.slug === slug)?.title ?? slug;
  return (
    <section aria-labelledby="invitees" className="mt-10 rounded border border-line bg-panel p-4">
      <h2 id="invitees" className="mb-2 text-2xl">{t("invitees.heading")}</h2>
      <p className="mb-3 text-sm text-muted">
        {t("invitees.body")}{" "}
        <Link href={`/team/invite${org ? `?org=${org}` : ""}`}>{t("invitees.all")}</Link>.
      </p>
      {invitees.length === 0 ? (
        <p>{t("invitePage.noOpen")}</p>
      ) : (
        <>
          <ul className="mb-4 flex flex-col gap-1 text-sm">
            {invitees.map((i) => (
              <li key={i.id}>
                <span className="font-bold">{i.name ?? i.email}</span> <span className="text-muted">({i.email})</span>
                {i.items.length ? ` · ${t("invitees.onAcceptance", { items: i.items.map((x) => t("invitees.item", { title: title(x.kind, x.slug), due: x.dueAt })).join("; ") })}` : ` · ${t("invitees.noWork")}`}
              </li>
            ))}
          </ul>
          <form
            className="grid gap-3 sm:grid-cols-4 sm:items-end"
            onSubmit={async (e) => {
              e.preventDefault();
              const [kind, slug] = what.split(":");
              setBusy(true);
              setMsg(null);
              const res = await postJson<{ message: string }>(`/api/team/invites/${who}/assign`, { items: [{ kind, slug, dueAt: due }] });
              setBusy(false);
              if (!res.ok) return setMsg({ ok: false, text: tr(Object.values(res.fieldErrors ?? {})[0]?.[0] ?? res.error) ?? res.error });
              setMsg({ ok: true, text: res.data.message });
              router.refresh();
            }}
          >
            <SelectField label={t("invitees.person")} value={who} onChange={(e) => setWho(e.target.value)} options={invitees.map((i) => ({ value: i.id, label: i.name ? `${i.name} (${i.email})` : i.email }))} />
            <SelectField
              label={t("assign.item")}
              value={what}
              onChange={(e) => setWhat(e.target.value)}
              options={[...modules.map((m) => ({ value: `module:${m.slug}`, label: t("invitees.moduleOption", { title: m.title }) })), ...paths.map((p) => ({ value: `path:${p.slug}`, label: t("invitees.pathOption", { title: p.title }) }))]}
            />
            <Field label={t("assign.due")} type="date" value={due} onChange={(e) => setDue(e.target.value)} required />
            <Button type="submit" disabled={busy || !who || !due}>
              {busy ? t("saving") : t("invitees.assign")}
            </Button>
          </form>
          <div className="mt-2">{msg ? msg.ok ? <FormNotice message={msg.text} /> : <FormError message={msg.text} /> : null}</div>
        </>
      )}
    </section>
  );
}
