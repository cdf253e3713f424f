import Link from "next/link";
import { useFormatter, useTranslations } from "next-intl";
import { ShareLink } from "@/components/certificates/share-link";
import { StatusBadge } from "@/components/certificates/status-badge";
import { buttonLinkClass } from "@/components/ui/button";
import type { HolderCertificate } from "@/lib/certificates";
import { daysUntil, formatHours, verificationUrl } from "@/lib/certificates/browser";
import { credentialUrl } from "@/lib/credentials/browser";
import { env } from "@/lib/env";

/** One of the holder's certificates: status, dates, hours, share link, PDF and renewal. */
export function CertificateCard({ c, now }: { c: HolderCertificate; now: Date }) {
  const t = useTranslations("certificates");
  const format = useFormatter();
  const formatCertificateDate = (d: Date) => format.dateTime(d, { year: "numeric", month: "long", day: "numeric" });
  const url = verificationUrl(env.APP_URL, c.verificationCode);
  const days = daysUntil(c.expiresAt, now);
  return (
    <li className="flex flex-col gap-3 rounded border border-line bg-panel p-4" data-testid={`certificate-${c.serial}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-mono text-xs uppercase text-muted">{t(`kind.${c.kind}`)}</p>
        <StatusBadge status={c.status} expiringSoon={c.expiringSoon} />
      </div>
      <h3 className="text-xl">
        <Link href={c.kind === "module" ? `/modules/${c.subjectSlug}` : `/modules?path=${c.subjectSlug}`}>{c.subjectTitle}</Link>
      </h3>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-4 lg:grid-cols-2">
        <div>
          <dt className="text-muted">{t("serial")}</dt>
          <dd className="whitespace-nowrap font-mono">{c.serial}</dd>
        </div>
        <div>
          <dt className="text-muted">{t("ceHours")}</dt>
          <dd className="font-mono">{formatHours(c.ceHours)}</dd>
        </div>
        <div>
          <dt className="text-muted">{t("issued")}</dt>
          <dd>{formatCertificateDate(c.issuedAt)}</dd>
        </div>
        <div>
          <dt className="text-muted">{c.status === "expired" ? t("expired") : t("validUntil")}</dt>
          <dd>{formatCertificateDate(c.expiresAt)}</dd>
        </div>
      </dl>
      {c.status === "revoked" && c.revokedAt ? (
        <p className="text-sm text-caution">{t("revokedOn", { date: formatCertificateDate(c.revokedAt) })}</p>
      ) : null}
      {c.expiringSoon && !c.renewedBySerial ? (
        <p className="text-sm font-bold text-caution">
          {t("expiresIn", { days })}{" "}
          {c.kind === "module" ? t.rich("renewModule", { link: (x) => <Link href={`/modules/${c.subjectSlug}`}>{x}</Link> }) : t("renewPath")}
        </p>
      ) : null}
      {c.status === "expired" && c.kind === "module" && !c.renewedBySerial ? (
        <p className="text-sm">
          {t.rich("earnNew", { link: (x) => <Link href={`/modules/${c.subjectSlug}`}>{x}</Link> })}
        </p>
      ) : null}
      {c.renewsSerial || c.renewedBySerial ? (
        <p className="text-sm text-muted">
          {c.renewsSerial ? `${t("renews", { serial: c.renewsSerial })} ` : ""}
          {c.renewedBySerial ? t("renewedBy", { serial: c.renewedBySerial }) : ""}
        </p>
      ) : null}
      <div className="flex flex-col gap-3 border-t border-line pt-3">
        <p>
          <a href={`/api/certificates/${c.id}/pdf`} className={buttonLinkClass} download>
            {t("downloadPdf")}<span className="sr-only">{` ${t("ofSerial", { serial: c.serial })}`}</span>
          </a>
        </p>
        <p className="text-sm" data-testid={`credential-links-${c.serial}`}>
          {t("openBadges")}{" "}
          <a href={credentialUrl(env.APP_URL, c.verificationCode, "json")} download>
            {t("json")}<span className="sr-only">{` ${t("ofSerial", { serial: c.serial })}`}</span>
          </a>{" "}
          ·{" "}
          <a href={credentialUrl(env.APP_URL, c.verificationCode, "jwt")} download>
            {t("jwt")}<span className="sr-only">{` ${t("ofSerial", { serial: c.serial })}`}</span>
          </a>
        </p>
        {c.status === "valid" ? <ShareLink url={url} serial={c.serial} /> : <p className="text-sm">{t.rich("publicCheck", { link: (x) => <a href={url}>{x}</a> })}</p>}
      </div>
    </li>
  );
}
