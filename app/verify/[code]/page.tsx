import type { Metadata } from "next";
import Link from "next/link";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { StatusBadge } from "@/components/certificates/status-badge";
import { verificationByCode } from "@/lib/certificates";
import { formatCertificateDate, formatHours, KIND_LABEL } from "@/lib/certificates";
import { hitVerifyLimit, ipFromHeaders, parseVerifyInput, tooManyLookupsMessage } from "@/lib/certificates";
import { credentialUrl } from "@/lib/credentials/browser";
import { env } from "@/lib/env";

export const metadata: Metadata = { title: "Certificate check", robots: { index: false, follow: false } };

const SUMMARY = {
  valid: "This certificate is genuine and valid today.",
  expired: "This certificate is genuine, but it has expired. The holder can renew it by completing the training again.",
  revoked: "This certificate was revoked by the holder's organization or by Riser. It is not valid.",
} as const;

/** Public check of one certificate: only what a verifier needs, nothing else about the holder. */
export default async function VerifyCodePage({ params }: { params: Promise<{ code: string }> }) {
  const { code } = await params;
  const limit = await hitVerifyLimit(ipFromHeaders(await headers()));
  if (!limit.allowed) {
    return (
      <div className="max-w-prose">
        <h1 className="text-3xl">Please wait a moment</h1>
        <p className="mt-3" role="alert">
          {tooManyLookupsMessage(limit.retryAfterSeconds)}
        </p>
      </div>
    );
  }
  const record = await verificationByCode(code);
  if (!record) notFound();
  const lookup = parseVerifyInput(code);
  const now = new Date();
  const expiresAt = new Date(record.expiresAt);
  const borders = { valid: "border-l-pass", expired: "border-l-muted", revoked: "border-l-caution" } as const;

  return (
    <div className="max-w-3xl">
      <p className="font-mono text-sm uppercase tracking-wider text-copper">Riser certificate check</p>
      <h1 className="mt-1 text-3xl">{record.title}</h1>
      <section aria-labelledby="result" className={`mt-5 rounded border border-l-8 border-line bg-panel p-5 ${borders[record.status]}`}>
        <div className="flex flex-wrap items-center gap-3">
          <StatusBadge status={record.status} size="lg" />
          <p id="result" className="font-bold" data-testid="verify-summary">
            {SUMMARY[record.status]}
          </p>
        </div>
        <dl className="mt-5 grid gap-x-8 gap-y-4 sm:grid-cols-2">
          <div>
            <dt className="text-sm text-muted">Holder</dt>
            <dd className="text-2xl font-bold" data-testid="verify-holder">
              {record.holderName}
            </dd>
          </div>
          <div>
            <dt className="text-sm text-muted">Completed</dt>
            <dd className="text-lg font-bold">
              {KIND_LABEL[record.kind]}: {record.title}
            </dd>
          </div>
          <div>
            <dt className="text-sm text-muted">Continuing-education hours</dt>
            <dd className="font-mono text-lg">{formatHours(record.ceHours)}</dd>
          </div>
          <div>
            <dt className="text-sm text-muted">Serial</dt>
            <dd className="font-mono text-lg">{record.serial}</dd>
          </div>
          <div>
            <dt className="text-sm text-muted">Issued</dt>
            <dd className="text-lg">{formatCertificateDate(new Date(record.issuedAt))}</dd>
          </div>
          <div>
            <dt className="text-sm text-muted">{record.status === "expired" ? "Expired" : "Valid until"}</dt>
            <dd className="text-lg">{formatCertificateDate(expiresAt)}</dd>
          </div>
        </dl>
        <p className="mt-5 text-sm text-muted">
          Checked {formatCertificateDate(now)} at {now.toISOString().slice(11, 16)} UTC. This page is the current record; a printed
          copy cannot show a later expiry or revocation.
        </p>
      </section>
      {lookup?.kind === "code" ? (
        <p className="mt-5 max-w-prose text-sm" data-testid="verify-credential">
          The same certificate as a signed Open Badges 3.0 credential, which a digital wallet or licensing body can check on its own
          (revocation through the published status list, expiry in the credential):{" "}
          <a href={credentialUrl(env.APP_URL, lookup.code, "json")}>credential (JSON)</a> ·{" "}
          <a href={credentialUrl(env.APP_URL, lookup.code, "jwt")}>signed (JWT)</a> ·{" "}
          <a href="/.well-known/jwks.json">public keys</a>
        </p>
      ) : null}
      <p className="mt-5 max-w-prose text-sm text-muted">
        The hours are Riser&apos;s estimate of the study time for this material. Whether they count toward a licence or registration
        is for the licensing body or authority having jurisdiction to decide.
      </p>
      <p className="mt-3">
        <Link href="/verify">Check another certificate</Link>
      </p>
    </div>
  );
}
