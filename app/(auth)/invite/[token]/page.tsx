import type { Metadata } from "next";
import Link from "next/link";
import { getFormatter, getTranslations } from "next-intl/server";
import { AcceptInviteForm } from "@/components/team/accept-invite-form";
import { PageTitle } from "@/components/ui/page-title";
import { INVITE_DAYS, lookupInvite } from "@/lib/team";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("auth"))("inviteMeta"), robots: { index: false } };
}

const ROLES = ["learner", "sales", "manager"] as const;

export default async function AcceptInvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const [found, t, format] = await Promise.all([lookupInvite(token), getTranslations("auth"), getFormatter()]);
  if (found.state !== "ok") {
    const state = found.state === "used" || found.state === "revoked" || found.state === "expired" ? found.state : "invalid";
    const expiresAt = "expiresAt" in found && found.expiresAt instanceof Date ? found.expiresAt : null;
    const values = { date: expiresAt ? format.dateTime(expiresAt, { year: "numeric", month: "long", day: "numeric" }) : "", days: INVITE_DAYS };
    return (
      <div className="max-w-prose" data-invite-state={found.state}>
        <PageTitle title={t(`invite.${state}.title`)} />
        <p role="alert" className="mb-4 rounded border border-caution bg-caution-light px-3 py-2 text-caution">
          {t(`invite.${state}.message`, values)}
        </p>
        <p>
          <Link href="/sign-in">{t("signIn")}</Link> · <Link href="/">{t("home")}</Link>
        </p>
      </div>
    );
  }
  const inv = found.invite;
  const role = (ROLES as readonly string[]).includes(inv.role) ? t(`role.${inv.role as (typeof ROLES)[number]}`) : inv.role;
  return (
    <>
      <PageTitle
        title={t("joinTitle", { org: found.orgName })}
        lead={found.teamName ? t("invitedAsIn", { role, team: found.teamName }) : t("invitedAs", { role })}
      />
      <AcceptInviteForm token={token} email={inv.email} name={inv.name ?? ""} />
    </>
  );
}
