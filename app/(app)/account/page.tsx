import type { Metadata } from "next";
import { EmailForm, NameForm } from "@/components/account/profile-forms";
import { PasswordForm } from "@/components/account/password-form";
import { TwoFactorForm } from "@/components/account/two-factor-form";
import { Section } from "@/components/account/section";
import { SessionsList } from "@/components/account/sessions-list";
import { asJson } from "@/components/ui/server-first";
import { listOwnSessions } from "@/lib/account";
import { FormError, FormNotice } from "@/components/ui/field";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("signed-in", "/account");
  const params = await searchParams;
  const emailChanged = params.email === "changed" && !params.error;
  const linkError = typeof params.error === "string" ? params.error : null;
  return (
    <>
      <PageTitle title="Account" lead="Your name and e-mail, your password, where you are signed in, and a copy of your training records." />
      <div className="flex flex-col gap-8">
        {emailChanged ? <FormNotice message={`Your e-mail address is now ${viewer.email}.`} /> : null}
        {linkError ? <FormError message="That confirmation link has expired or was already used. Ask for a new one below." /> : null}
        <Section id="details-h" title="Your details">
          <div className="grid gap-8 lg:grid-cols-2">
            <NameForm name={viewer.name} />
            <div className="flex flex-col gap-3">
              <h3 className="text-lg">E-mail address</h3>
              <EmailForm email={viewer.email} />
            </div>
          </div>
        </Section>
        <Section id="password-h" title="Password" lead="Enter your current password to choose a new one. Forgot it? Sign out and use “Forgot your password?” on the sign-in page.">
          <PasswordForm />
        </Section>
        <Section
          id="two-factor-h"
          title="Two-step sign-in"
          lead="After your password, Riser also asks for a 6-digit code from an authenticator app on your phone, so a stolen password alone does not open your account."
        >
          <TwoFactorForm enabled={viewer.twoFactorEnabled} required={viewer.role === "admin" || viewer.secondFactorMissing} />
        </Section>
        <Section id="sessions-h" title="Where you are signed in" lead="Each browser or device you signed in with. Sign out the others if you used a shared computer or lost a phone.">
          <SessionsList initial={asJson({ sessions: await listOwnSessions(viewer.id, viewer.sessionId) })} />
        </Section>
        <Section
          id="records-h"
          title="Download my records"
          lead="A copy of your own training records on Riser: lessons done, quiz attempts and scores, module completions, certificates and practical sign-offs."
        >
          <ul className="flex flex-wrap gap-3">
            <li>
              <a href="/api/account/records?format=csv" download className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 font-bold text-ink no-underline hover:bg-paper">
                Download as CSV (spreadsheet)
              </a>
            </li>
            <li>
              <a href="/api/account/records?format=json" download className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 font-bold text-ink no-underline hover:bg-paper">
                Download as JSON
              </a>
            </li>
          </ul>
        </Section>
      </div>
    </>
  );
}
