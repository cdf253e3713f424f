import type { Metadata } from "next";
import { getTranslations } from "next-intl/server";
import Link from "next/link";
import { BulkInvite } from "@/components/team/bulk-invite";
import { ActionButton } from "@/components/team/action-button";
import { InviteForm } from "@/components/team/invite-form";
import { OrgPicker } from "@/components/team/org-picker";
import { TeamNav } from "@/components/team/team-nav";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { INVITE_ROLES, listInvitations, orgDefaultLanguage, type InviteRole } from "@/lib/team";
import { isLocale, LANGUAGE_NAMES } from "@/lib/i18n/browser";
import { allOrganizations, pageScope, teamsInScope } from "@/lib/access";
import { BILLING_PATH, seatUsage } from "@/lib/billing";

export async function generateMetadata(): Promise<Metadata> {
  const t = await getTranslations("team");
  return { title: t("nav.invite") };
}

export default async function InvitePage({ searchParams }: { searchParams: Promise<{ org?: string }> }) {
  const viewer = await requireViewer("manager", "/team/invite");
  const t = await getTranslations("team");
  const { org } = await searchParams;
  const scope = await pageScope(viewer, org);
  const adminOrg = viewer.role === "admin" ? scope.orgId : null;
  const head = (
    <>
      <PageTitle title={t("nav.invite")} lead={t("invitePage.lead")} />
      <TeamNav current="/team/invite" org={adminOrg} />
      {viewer.role === "admin" ? <OrgPicker orgs={await allOrganizations()} current={scope.orgId} allowAll={false} action="/team/invite" /> : null}
    </>
  );
  if (!scope.orgId) {
    return (
      <>
        {head}
        <p>{t("invitePage.chooseOrg")}</p>
      </>
    );
  }
  const [teams, usage, all, defaultLanguage] = await Promise.all([teamsInScope(scope), seatUsage(scope.orgId), listInvitations(scope.orgId), orgDefaultLanguage(scope.orgId)]);
  const open = all.filter((i) => i.status === "pending" || i.status === "expired");
  const closed = all.filter((i) => i.status !== "pending" && i.status !== "expired").slice(0, 50);
  const q = adminOrg ? `?org=${adminOrg}` : "";
  const used = usage.members + usage.pending;
  return (
    <>
      {head}
      <p className="mb-6 rounded border border-line bg-panel px-3 py-2">
        <strong>{scope.orgName}</strong>: {t("invitePage.seats", { used, seats: usage.seats, members: usage.members, pending: usage.pending })}{" "}
        {used >= usage.seats ? <strong className="text-caution">{t("invitePage.full")} </strong> : null}
        <Link href={BILLING_PATH}>{t("invitePage.billing")}</Link>
      </p>
      <div className="grid gap-10">
        <section aria-labelledby="one" className="min-w-0">
          <h2 id="one" className="mb-3 text-2xl">{t("invitePage.one")}</h2>
          <InviteForm teams={teams.map((x) => ({ id: x.id, name: x.name }))} org={adminOrg} defaultLanguage={defaultLanguage} />
        </section>
        <section aria-labelledby="bulk" className="min-w-0">
          <h2 id="bulk" className="mb-3 text-2xl">{t("invitePage.bulk")}</h2>
          <BulkInvite org={adminOrg} defaultLanguage={defaultLanguage} />
        </section>
      </div>
      <section aria-labelledby="open" className="mt-10">
        <h2 id="open" className="mb-3 text-2xl">{t("invitePage.invitations")}</h2>
        <p className="mb-3 text-sm text-muted">
          {t("invitePage.openNote")}
        </p>
        {open.length === 0 ? <p>{t("invitePage.noOpen")}</p> : <InviteTable rows={open} actions q={q} />}
        {closed.length ? (
          <details className="mt-4">
            <summary className="cursor-pointer font-bold">{t("invitePage.closed", { count: closed.length })}</summary>
            <InviteTable rows={closed} q={q} />
          </details>
        ) : null}
      </section>
    </>
  );
}

type Row = Awaited<ReturnType<typeof listInvitations>>[number];

async function InviteTable({ rows, actions, q }: { rows: Row[]; actions?: boolean; q: string }) {
  const t = await getTranslations("team");
  const day = (d: Date | null) => (d ? d.toISOString().slice(0, 10) : "—");
  return (
    <div role="region" aria-label={t("invitePage.invitations")} tabIndex={0} className="relative overflow-x-auto rounded border border-line bg-panel">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-line bg-paper text-left">
            <th scope="col" className="px-2 py-2">{t("invite.email")}</th>
            <th scope="col" className="px-2 py-2">{t("col.name")}</th>
            <th scope="col" className="px-2 py-2">{t("invite.role")}</th>
            <th scope="col" className="px-2 py-2">{t("invite.team")}</th>
            <th scope="col" className="px-2 py-2">{t("invite.language")}</th>
            <th scope="col" className="px-2 py-2">{t("board.status")}</th>
            <th scope="col" className="px-2 py-2">{t("invitePage.sent")}</th>
            <th scope="col" className="px-2 py-2">{t("invitePage.expires")}</th>
            {actions ? <th scope="col" className="px-2 py-2">{t("invitePage.actions")}</th> : null}
          </tr>
        </thead>
        <tbody>
          {rows.map((i) => (
            <tr key={i.id} className="border-b border-line last:border-0">
              <td className="px-2 py-2 break-all">{i.email}</td>
              <td className="px-2 py-2">{i.name ?? ""}</td>
              <td className="px-2 py-2">{(INVITE_ROLES as readonly string[]).includes(i.role) ? t(`role.${i.role as InviteRole}`) : i.role}</td>
              <td className="px-2 py-2">{i.team ?? t("noTeam")}</td>
              <td className="px-2 py-2">{isLocale(i.language) ? <span lang={i.language}>{LANGUAGE_NAMES[i.language]}</span> : i.language}</td>
              <td className="px-2 py-2">{t(`inviteStatus.${i.status}`)}{i.assignOnAccept?.length ? ` · ${t("invitePage.toAssign", { count: i.assignOnAccept.length })}` : ""}</td>
              <td className="px-2 py-2 font-mono">{day(i.lastSentAt ?? i.createdAt)}{i.sendCount > 1 ? ` (${t("invitePage.times", { count: i.sendCount })})` : ""}</td>
              <td className="px-2 py-2 font-mono">{day(i.expiresAt)}</td>
              {actions ? (
                <td className="px-2 py-2">
                  <span className="flex flex-wrap gap-2">
                    <ActionButton url={`/api/team/invites/${i.id}/resend${q}`} label={t("invitePage.resend")} busyLabel={t("invite.sending")} ariaLabel={t("invitePage.resendLabel", { email: i.email })} />
                    {i.status === "pending" ? (
                      <ActionButton url={`/api/team/invites/${i.id}/revoke${q}`} label={t("invitePage.revoke")} busyLabel={t("invitePage.revoking")} danger ariaLabel={t("invitePage.revokeLabel", { email: i.email })} confirm={t("invitePage.revokeConfirm", { email: i.email })} />
                    ) : null}
                  </span>
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
