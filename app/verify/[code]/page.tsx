import type { Metadata } from "next";
import Link from "next/link";
import { headers } from "next/headers";
import { getFormatter, getLocale, getTranslations } from "next-intl/server";
import { notFound } from "next/navigation";
import { StatusBadge } from "@/components/certificates/status-badge";
import { verificationByCode } from "@/lib/certificates";
import { formatHours } from "@/lib/certificates";
import { hitVerifyLimit, ipFromHeaders, parseVerifyInput } from "@/lib/certificates";
import { localeOf } from "@/lib/i18n/browser";
import { credentialUrl } from "@/lib/credentials/browser";
import { env } from "@/lib/env";

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations("verify"))("checkTitle"), robots: { index: false, follow: false } };
}

/** Public check of one certificate: only what a verifier needs, nothing else about the holder. */
export default async function VerifyCodePage({ params }: { params: Promise<{ code: string }> }) {
  const { code } = await params;
  const limit = await hitVerifyLimit(ipFromHeaders(await headers()));
  const [t, tc, format, locale] = await Promise.all([getTranslations("verify"), getTranslations("certificates"), getFormatter(), getLocale()]);
  const formatCertificateDate = (d: Date) => format.dateTime(d, { year: "numeric", month: "long", day: "numeric" });
  if (!limit.allowed) {
    return (
      <div className="max-w-prose">
        <h1 className="text-3xl">{t("wait")}</h1>
        <p className="mt-3" role="alert">
          {t("tooMany", { seconds: limit.retryAfterSeconds })}
        </p>
      </div>
    );
  }
  const record = await verificationByCode(code, new Date(), localeOf(locale));
  if (!record) notFound();
  const lookup = parseVerifyInput(code);
  const now = new Date();
  const expiresAt = new Date(record.expiresAt);
  const borders = { valid: "border-l-pass", expired: "border-l-muted", revoked: "border-l-caution" } as const;

  return (
    <div className="max-w-3xl">
      <p className="font-mono text-sm uppercase tracking-wider text-copper">{t("kicker")}</p>
      <h1 className="mt-1 text-3xl">{record.title}</h1>
      <section aria-labelledby="result" className={`mt-5 rounded border border-l-8 border-line bg-panel p-5 ${borders[record.status]}`}>
        <div className="flex flex-wrap items-center gap-3">
          <StatusBadge status={record.status} size="lg" />
          <p id="result" className="font-bold" data-testid="verify-summary">
            {t(`summary.${record.status}`)}
          </p>
        </div>
        <dl className="mt-5 grid gap-x-8 gap-y-4 sm:grid-cols-2">
          <div>
            <dt className="text-sm text-muted">{t("holder")}</dt>
            <dd className="text-2xl font-bold" data-testid="verify-holder">
              {record.holderName}
            </dd>
          </div>
          <div>
            <dt className="text-sm text-muted">{t("completed")}</dt>
            <dd className="text-lg font-bold">
              {tc(`kind.${record.kind}`)}: {record.title}
            </dd>
          </div>
          <div>
            <dt className="text-sm text-muted">{t("hours")}</dt>
            <dd className="font-mono text-lg">{formatHours(record.ceHours)}</dd>
          </div>
          <div>
            <dt className="text-sm text-muted">{tc("serial")}</dt>
            <dd className="font-mono text-lg">{record.serial}</dd>
          </div>
          <div>
            <dt className="text-sm text-muted">{tc("issued")}</dt>
            <dd className="text-lg">{formatCertificateDate(new Date(record.issuedAt))}</dd>
          </div>
          <div>
            <dt className="text-sm text-muted">{record.status === "expired" ? tc("expired") : tc("validUntil")}</dt>
            <dd className="text-lg">{formatCertificateDate(expiresAt)}</dd>
          </div>
        </dl>
        <p className="mt-5 text-sm text-muted">
          {t("checked", { date: formatCertificateDate(now), time: now.toISOString().slice(11, 16) })}
        </p>
      </section>
      {lookup?.kind === "code" ? (
        <p className="mt-5 max-w-prose text-sm" data-testid="verify-credential">
          {t("credential")}{" "}
          <a href={credentialUrl(env.APP_URL, lookup.code, "json")}>{t("credentialJson")}</a> ·{" "}
          <a href={credentialUrl(env.APP_URL, lookup.code, "jwt")}>{tc("jwt")}</a> ·{" "}
          <a href="/.well-known/jwks.json">{t("publicKeys")}</a>
        </p>
      ) : null}
      <p className="mt-5 max-w-prose text-sm text-muted">
        {t("hoursNote")}
      </p>
      <p className="mt-3">
        <Link href="/verify">{t("another")}</Link>
      </p>
    </div>
  );
}
