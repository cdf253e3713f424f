import type { Metadata } from "next";
import { getLocale } from "next-intl/server";
import { localeOf } from "@/lib/i18n/config";
import Link from "next/link";
import { RevokeForm } from "@/components/certificates/revoke-form";
import { StatusBadge } from "@/components/certificates/status-badge";
import { PageTitle } from "@/components/ui/page-title";
import { requireViewer } from "@/lib/access";
import { certificatesOfHolder } from "@/lib/certificates";
import { revocableCertificates } from "@/lib/certificates";
import { CertificateCard } from "@/components/certificates/certificate-card";
import { formatCertificateDate, formatHours } from "@/lib/certificates";
import { plural, pluralNoun } from "@/lib/plural";
import { ReportingPeriodForm } from "@/components/credentials/reporting-period-form";
import { buttonLinkClass } from "@/components/ui/button";
import { describeSetting, periodSettingOf } from "@/lib/credentials";

export const metadata: Metadata = { title: "Certificates" };

export default async function CertificatesPage() {
  const viewer = await requireViewer("signed-in", "/certificates");
  const now = new Date();
  const [mine, revocable, period] = await Promise.all([
    certificatesOfHolder(viewer.id, now, localeOf(await getLocale())),
    revocableCertificates(viewer, now),
    periodSettingOf(viewer.organizationId ?? null),
  ]);
  const current = mine.filter((c) => c.status === "valid");
  const past = mine.filter((c) => c.status !== "valid");
  // one certificate per module counts (a renewal and the one it renews may both be valid for a while)
  const perModule = new Map(current.filter((c) => c.kind === "module").map((c) => [c.subjectSlug, c.ceHours]));
  const hours = [...perModule.values()].reduce((n, h) => n + h, 0);

  return (
    <>
      <PageTitle
        title="Certificates"
        lead="Every module you complete earns a certificate with its continuing-education hours; finishing all modules of a learning path earns one for the path. Share the link so that anyone can check it."
      />
      {mine.length === 0 ? (
        <div className="max-w-prose rounded border border-line bg-panel p-4" data-testid="certificates-empty">
          <p className="font-bold">No certificates yet.</p>
          <p className="mt-2">
            Finish a module&apos;s lessons and pass its quiz to earn the first one. <Link href="/modules">Browse the modules</Link>
          </p>
        </div>
      ) : (
        <>
          <section aria-labelledby="current-heading">
            <h2 id="current-heading" className="text-2xl">
              Valid now
            </h2>
            <p className="mt-1 text-muted" data-testid="certificates-summary">
              {plural(current.length, "valid certificate")} · {formatHours(hours)} {pluralNoun(hours, "CE hour")} from modules
            </p>
            {current.length === 0 ? <p className="mt-3">None of your certificates is valid today.</p> : null}
            <ul className="mt-4 grid gap-4 lg:grid-cols-2">
              {current.map((c) => (
                <CertificateCard key={c.id} c={c} now={now} />
              ))}
            </ul>
          </section>
          {past.length ? (
            <section aria-labelledby="past-heading" className="mt-10">
              <h2 id="past-heading" className="text-2xl">
                Expired and revoked
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
          Training history
        </h2>
        <p className="mt-1 max-w-prose text-muted">
          One document with every certificate and module completion, its status and verification code, and your CE hours totalled by{" "}
          {describeSetting(period)}.
        </p>
        <p className="mt-3 flex flex-wrap gap-3">
          <a href="/api/account/training-history?format=pdf" className={buttonLinkClass} download>
            Training history (PDF)
          </a>
          <a href="/api/account/training-history?format=csv" className={buttonLinkClass} download>
            Training history (CSV)
          </a>
        </p>
      </section>
      <p className="mt-8 max-w-prose text-sm text-muted">
        Hours are Riser&apos;s estimate of the study time for each module. Whether they count toward a licence or registration is for
        your licensing body or the authority having jurisdiction to decide.
      </p>

      {viewer.role === "manager" || viewer.role === "admin" ? (
        <section aria-labelledby="revoke-heading" className="mt-10">
          <h2 id="revoke-heading" className="text-2xl">
            {viewer.role === "admin" ? "Certificates in all organizations" : "Certificates in your organization"}
          </h2>
          <p className="mt-1 max-w-prose text-muted">
            Revoke a certificate that was earned improperly or issued in error. The reason is required and is kept in the audit log; the
            public check then shows the certificate as revoked.
          </p>
          {viewer.role === "manager" && viewer.organizationId ? (
            <div className="mt-4">
              <h3 className="mb-2 text-xl">Reporting period for CE hours</h3>
              <ReportingPeriodForm current={period} text={describeSetting(period)} />
            </div>
          ) : null}
          {revocable.length === 0 ? <p className="mt-3">No certificates to show.</p> : null}
          <ul className="mt-4 flex flex-col gap-3">
            {revocable.map((c) => (
              <li key={c.id} className="flex flex-wrap items-start justify-between gap-3 rounded border border-line bg-panel p-3" data-testid={`org-certificate-${c.serial}`}>
                <div>
                  <p className="font-bold">
                    {c.holderName} · {c.subjectTitle}
                  </p>
                  <p className="text-sm text-muted">
                    <span className="font-mono">{c.serial}</span> · {viewer.role === "admin" && c.organizationName ? `${c.organizationName} · ` : ""}{c.status === "expired" ? "expired" : "valid until"}{" "}
                    {formatCertificateDate(c.expiresAt)}
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
