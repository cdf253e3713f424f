import Link from "next/link";
import { ShareLink } from "@/components/certificates/share-link";
import { StatusBadge } from "@/components/certificates/status-badge";
import { buttonLinkClass } from "@/components/ui/button";
import type { HolderCertificate } from "@/lib/certificates";
import { daysUntil, formatCertificateDate, formatHours, KIND_LABEL, verificationUrl } from "@/lib/certificates/browser";
import { credentialUrl } from "@/lib/credentials/browser";
import { env } from "@/lib/env";

/** One of the holder's certificates: status, dates, hours, share link, PDF and renewal. */
export function CertificateCard({ c, now }: { c: HolderCertificate; now: Date }) {
  const url = verificationUrl(env.APP_URL, c.verificationCode);
  const days = daysUntil(c.expiresAt, now);
  return (
    <li className="flex flex-col gap-3 rounded border border-line bg-panel p-4" data-testid={`certificate-${c.serial}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-mono text-xs uppercase text-muted">{KIND_LABEL[c.kind]}</p>
        <StatusBadge status={c.status} expiringSoon={c.expiringSoon} />
      </div>
      <h3 className="text-xl">
        <Link href={c.kind === "module" ? `/modules/${c.subjectSlug}` : `/modules?path=${c.subjectSlug}`}>{c.subjectTitle}</Link>
      </h3>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-4 lg:grid-cols-2">
        <div>
          <dt className="text-muted">Serial</dt>
          <dd className="whitespace-nowrap font-mono">{c.serial}</dd>
        </div>
        <div>
          <dt className="text-muted">CE hours</dt>
          <dd className="font-mono">{formatHours(c.ceHours)}</dd>
        </div>
        <div>
          <dt className="text-muted">Issued</dt>
          <dd>{formatCertificateDate(c.issuedAt)}</dd>
        </div>
        <div>
          <dt className="text-muted">{c.status === "expired" ? "Expired" : "Valid until"}</dt>
          <dd>{formatCertificateDate(c.expiresAt)}</dd>
        </div>
      </dl>
      {c.status === "revoked" && c.revokedAt ? (
        <p className="text-sm text-caution">Revoked on {formatCertificateDate(c.revokedAt)}. Ask your training manager if you think this is a mistake.</p>
      ) : null}
      {c.expiringSoon && !c.renewedBySerial ? (
        <p className="text-sm font-bold text-caution">
          Expires in {days} day{days === 1 ? "" : "s"}.{" "}
          {c.kind === "module" ? (
            <>
              <Link href={`/modules/${c.subjectSlug}`}>Pass the module again</Link> to renew it.
            </>
          ) : (
            "Renew its modules to earn a new path certificate."
          )}
        </p>
      ) : null}
      {c.status === "expired" && c.kind === "module" && !c.renewedBySerial ? (
        <p className="text-sm">
          <Link href={`/modules/${c.subjectSlug}`}>Pass the module again</Link> to earn a new certificate.
        </p>
      ) : null}
      {c.renewsSerial || c.renewedBySerial ? (
        <p className="text-sm text-muted">
          {c.renewsSerial ? `Renews ${c.renewsSerial}. ` : ""}
          {c.renewedBySerial ? `Renewed by ${c.renewedBySerial}.` : ""}
        </p>
      ) : null}
      <div className="flex flex-col gap-3 border-t border-line pt-3">
        <p>
          <a href={`/api/certificates/${c.id}/pdf`} className={buttonLinkClass} download>
            Download PDF<span className="sr-only"> of {c.serial}</span>
          </a>
        </p>
        <p className="text-sm" data-testid={`credential-links-${c.serial}`}>
          Open Badges credential (for digital wallets and licensing bodies):{" "}
          <a href={credentialUrl(env.APP_URL, c.verificationCode, "json")} download>
            JSON<span className="sr-only"> of {c.serial}</span>
          </a>{" "}
          ·{" "}
          <a href={credentialUrl(env.APP_URL, c.verificationCode, "jwt")} download>
            signed (JWT)<span className="sr-only"> of {c.serial}</span>
          </a>
        </p>
        {c.status === "valid" ? <ShareLink url={url} serial={c.serial} /> : <p className="text-sm"><a href={url}>Public check page</a> (shows the status above)</p>}
      </div>
    </li>
  );
}
