import type { Metadata } from "next";
import Link from "next/link";
import { getFormatter, getLocale, getTranslations } from "next-intl/server";
import { RevokeForm } from "@/components/certificates/revoke-form";
import { StatusBadge } from "@/components/certificates/status-badge";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { certificatesOfHolder } from "@/lib/certificates";
import { revocableCertificates } from "@/lib/certificates";
import { CertificateCard } from "@/components/certificates/certificate-card";
import { formatHours } from "@/lib/certificates";
import { localeOf } from "@/lib/i18n/browser";
import { ReportingPeriodForm } from "@/components/credentials/reporting-period-form";
import { buttonLinkClass } from "@/components/ui/button";
import { periodSettingOf } from "@/lib/credentials";
import { describePeriod } from "@/components/credentials/describe-period";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("certificates"))("title") };
}

export default async function CertificatesPage() {
  const viewer = await requireViewer("signed-in", "/certificates");
  const now = new Date();
  const [t, format] = await Promise.all([getTranslations("certificates"), getFormatter()]);
  const longDate = (d: Date) => format.dateTime(d, { year: "numeric", month: "long", day: "numeric" });
  const locale = localeOf(await getLocale());
  const [held, revocable, period] = await Promise.all([
    certificatesOfHolder(viewer.id, now, locale),
    revocableCertificates(viewer, now),
    periodSettingOf(viewer.organizationId ?? null),
  ]);
  // each module or path is named in the reader's language (certificatesOfHolder, by slug)
  const mine = held;
  const current = mine.filter((c) => c.status === "valid");
  const past = mine.filter((c) => c.status !== "valid");
  // one certificate per module counts (a renewal and the one it renews may both be valid for a while)
  const perModule = new Map(current.filter((c) => c.kind === "module").map((c) => [c.subjectSlug, c.ceHours]));
  const hours = [...perModule.values()].reduce((n, h) => n + h, 0);

  return (
    <>
      <PageTitle
        title={t("title")}
        lead={t("lead")}
      />
      {mine.length === 0 ? (
        <div className="max-w-prose rounded border border-line bg-panel p-4" data-testid="certificates-empty">
          <p className="font-bold">{t("none")}</p>
          <p className="mt-2">{t.rich("noneHow", { link: (c) => <Link href="/modules">{c}</Link> })}</p>
        </div>
      ) : (
        <>
          <section aria-labelledby="current-heading">
            <h2 id="current-heading" className="text-2xl">
              {t("validNow")}
            </h2>
            <p className="mt-1 text-muted" data-testid="certificates-summary">
              {t("summary", { count: current.length, hours: Number(formatHours(hours)) })}
            </p>
            {current.length === 0 ? <p className="mt-3">{t("noneValid")}</p> : null}
            <ul className="mt-4 grid gap-4 lg:grid-cols-2">
              {current.map((c) => (
                <CertificateCard key={c.id} c={c} now={now} />
              ))}
            </ul>
          </section>
          {past.length ? (
            <section aria-labelledby="past-heading" className="mt-10">
              <h2 id="past-heading" className="text-2xl">
                {t("expiredRevoked")}
              </h2>
              <ul className="mt-4 grid gap-4 lg:grid-cols-2">
                {past.map((c) => (
                  <CertificateCard key={c.id} c={c} now={now} />
                ))}
              </ul>
            </section>
          ) : null}
        </>
      )}
      <section aria-labelledby="history-heading" className="mt-10">
        <h2 id="history-heading" className="text-2xl">
          {t("history")}
        </h2>
        <p className="mt-1 max-w-prose text-muted">
          {t("historyLead", { period: describePeriod(period, t, format) })}
        </p>
        <p className="mt-3 flex flex-wrap gap-3">
          <a href="/api/account/training-history?format=pdf" className={buttonLinkClass} download>
            {t("historyPdf")}
          </a>
          <a href="/api/account/training-history?format=csv" className={buttonLinkClass} download>
            {t("historyCsv")}
          </a>
        </p>
      </section>
      <p className="mt-8 max-w-prose text-sm text-muted">
        {t("hoursNote")}
      </p>

      {viewer.role === "manager" || viewer.role === "admin" ? (
        <section aria-labelledby="revoke-heading" className="mt-10">
          <h2 id="revoke-heading" className="text-2xl">
            {viewer.role === "admin" ? t("allOrgs") : t("yourOrg")}
          </h2>
          <p className="mt-1 max-w-prose text-muted">
            {t("revokeLead")}
          </p>
          {viewer.role === "manager" && viewer.organizationId ? (
            <div className="mt-4">
              <h3 className="mb-2 text-xl">{t("reportingPeriod")}</h3>
              <ReportingPeriodForm current={period} text={describePeriod(period, t, format)} />
            </div>
          ) : null}
          {revocable.length === 0 ? <p className="mt-3">{t("noneToShow")}</p> : null}
          <ul className="mt-4 flex flex-col gap-3">
            {revocable.map((c) => (
              <li key={c.id} className="flex flex-wrap items-start justify-between gap-3 rounded border border-line bg-panel p-3" data-testid={`org-certificate-${c.serial}`}>
                <div>
                  <p className="font-bold">
                    {c.holderName} · {c.subjectTitle}
                  </p>
                  <p className="text-sm text-muted">
                    <span className="font-mono">{c.serial}</span> · {viewer.role === "admin" && c.organizationName ? `${c.organizationName} · ` : ""}{c.status === "expired" ? t("expiredLower") : t("validUntilLower")}{" "}
                    {longDate(c.expiresAt)}
                  </p>
                </div>
                <div className="flex flex-wrap items-start gap-2">
                  <StatusBadge status={c.status} expiringSoon={c.expiringSoon} />
                  <RevokeForm id={c.id} serial={c.serial} holderName={c.holderName} />
                </div>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </>
  );
}
