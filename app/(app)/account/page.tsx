import type { Metadata } from "next";
import { getLocale, getTranslations } from "next-intl/server";
import { LanguageForm } from "@/components/account/language-form";
import { localeOf } from "@/lib/i18n/browser";
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

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("account"))("title") };
}

export default async function AccountPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const viewer = await requireViewer("signed-in", "/account");
  const params = await searchParams;
  const [t, locale] = await Promise.all([getTranslations("account"), getLocale()]);
  const emailChanged = params.email === "changed" && !params.error;
  const linkError = typeof params.error === "string" ? params.error : null;
  return (
    <>
      <PageTitle title={t("title")} lead={t("lead")} />
      <div className="flex flex-col gap-8">
        {emailChanged ? <FormNotice message={t("emailNow", { email: viewer.email })} /> : null}
        {linkError ? <FormError message={t("linkUsed")} /> : null}
        <Section id="details-h" title={t("details")}>
          <div className="grid gap-8 lg:grid-cols-2">
            <NameForm name={viewer.name} />
            <div className="flex flex-col gap-3">
              <h3 className="text-lg">{t("emailAddress")}</h3>
              <EmailForm email={viewer.email} />
            </div>
          </div>
        </Section>
        <Section id="language-h" title={t("language")} lead={t("languageLead")}>
          <LanguageForm current={localeOf(locale)} />
        </Section>
        <Section id="password-h" title={t("password")} lead={t("passwordLead")}>
          <PasswordForm hasSecondFactor={viewer.twoFactorEnabled} />
        </Section>
        <Section
          id="two-factor-h"
          title={t("twoStep")}
          lead={t("twoStepLead")}
        >
          <TwoFactorForm enabled={viewer.twoFactorEnabled} required={viewer.role === "admin" || viewer.secondFactorMissing} />
        </Section>
        <Section id="sessions-h" title={t("sessions")} lead={t("sessionsLead")}>
          <SessionsList initial={asJson({ sessions: await listOwnSessions(viewer.id, viewer.sessionId) })} />
        </Section>
        <Section
          id="records-h"
          title={t("records")}
          lead={t("recordsLead")}
        >
          <ul className="flex flex-wrap gap-3">
            <li>
              <a href="/api/account/records?format=csv" download className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 font-bold text-ink no-underline hover:bg-paper">
                {t("recordsCsv")}
              </a>
            </li>
            <li>
              <a href="/api/account/records?format=json" download className="inline-flex min-h-11 items-center rounded border border-ink/40 bg-panel px-4 font-bold text-ink no-underline hover:bg-paper">
                {t("recordsJson")}
              </a>
            </li>
          </ul>
        </Section>
      </div>
    </>
  );
}
