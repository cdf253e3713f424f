import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInviteForm } from "@/components/team/accept-invite-form";
import { PageTitle } from "@/components/ui/page-title";
import { lookupInvite, refusalText } from "@/lib/team";
import { ROLE_LABELS, type InviteRole } from "@/lib/team";

export const metadata: Metadata = { title: "Your invitation", robots: { index: false } };

export default async function AcceptInvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const found = await lookupInvite(token);
  if (found.state !== "ok") {
    const r = refusalText(found);
    return (
      <div className="max-w-prose" data-invite-state={found.state}>
        <PageTitle title={r.title} />
        <p role="alert" className="mb-4 rounded border border-caution bg-caution-light px-3 py-2 text-caution">
          {r.message}
        </p>
        <p>
          <Link href="/sign-in">Sign in</Link> · <Link href="/">Riser home</Link>
        </p>
      </div>
    );
  }
  const inv = found.invite;
  return (
    <>
      <PageTitle
        title={`Join ${found.orgName} on Riser`}
        lead={`You are invited as ${ROLE_LABELS[inv.role as InviteRole]?.toLowerCase() ?? inv.role}${found.teamName ? ` in ${found.teamName}` : ""}. Choose your password to start training.`}
      />
      <AcceptInviteForm token={token} email={inv.email} name={inv.name ?? ""} />
    </>
  );
}
